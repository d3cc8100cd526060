/// SA-AFT2017b on the zero-pressure-gradient flat plate (the plate of the SA checks,
/// tests/verification/sa_plate_run.hpp: Re 5e6 per unit length, plate 2 long, 24 + 96 x 80
/// cells, first cell 5e-6), free-stream turbulence 0.07 % (N_crit 9.0 by Mack's relation):
/// - ahead of transition Cf within 5 % of Blasius 0.664 / sqrt(Re_x)
///   (tests/reference/blasius1908_flat_plate.csv, Blasius 1908 [P]);
/// - well behind it Cf within 5 % of the fully turbulent SA plate on the same grid (the SA
///   result validated against the NASA TMR in SaFlatPlate) at the same momentum-thickness
///   Reynolds number Re_theta = Re integral(Cf / 2) dx (the zero-pressure-gradient momentum
///   integral). Compared at the same x instead, the tripped-late layer is thinner than one
///   turbulent from the leading edge (its virtual origin lies downstream; common practice) and
///   its Cf higher: measured 15 % at x 1.5 and 11 % at x 1.9, printed, not gated;
/// - the transition Re_x (where Cf leaves its laminar minimum) is printed beside the band the
///   project's transition reference recalls (Schubauer & Skramstad 1947: about 2.8e6; e^N with
///   N = 9: about 3e6 — both (memory), so reported, not gated), and gated against what the
///   model itself predicts on the exact Blasius layer (blasius_amplification.hpp [D]): SA-AFT2017b
///   as transcribed reaches n~ = 9 only at Re_x 4.5e6, so the late transition is the model's,
///   not veer's (solver/README.md, "Transition models").
/// Cost: two plate runs (about 1-3 minutes each on a loaded 2-core machine).
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>

#include "../reference_table.hpp"
#include "../verification/sa_plate_run.hpp"
#include "blasius_amplification.hpp"
#include "solver/transition_options.hpp"

namespace veer {
namespace {

constexpr double re = test::sa_plate_reynolds;

/// Re_theta at each wall face: Re times the integral of Cf / 2 from the leading edge (x = 0).
std::vector<double> momentum_reynolds(const test::SaPlateResult& r) {
    std::vector<double> out(r.x.size(), 0.0);
    double theta = 0.0, x_prev = 0.0, cf_prev = r.cf.empty() ? 0.0 : r.cf.front();
    for (std::size_t k = 0; k < r.x.size(); ++k) {
        theta += 0.25 * (cf_prev + r.cf[k]) * (r.x[k] - x_prev);
        x_prev = r.x[k];
        cf_prev = r.cf[k];
        out[k] = re * theta;
    }
    return out;
}

/// Cf of `r` where its Re_theta reaches `target` (linear between faces); NaN past its end.
double cf_at_momentum_reynolds(const test::SaPlateResult& r, double target) {
    const std::vector<double> rt = momentum_reynolds(r);
    for (std::size_t k = 1; k < rt.size(); ++k)
        if (rt[k] >= target) {
            const double t = (target - rt[k - 1]) / (rt[k] - rt[k - 1]);
            return (1.0 - t) * r.cf[k - 1] + t * r.cf[k];
        }
    return std::nan("");
}

TEST(TransitionFlatPlate, LaminarAheadTurbulentBehind) {
    const test::ReferenceTable blasius =
        test::ReferenceTable::read("blasius1908_flat_plate.csv", 3);
    const double laminar_coefficient = blasius.value("local_cf_coefficient");
    const test::PlateGridSpec grid = test::sa_plate_spec(24, 96, 80, 5e-6);
    const test::SaPlateResult aft =
        test::run_sa_plate(grid, 4000, ModelOptions{{turbulence_key, 0.07}});
    const test::SaPlateResult sa = test::run_sa_plate(grid, 4000);
    ASSERT_TRUE(aft.converged) << aft.steps << " steps";
    ASSERT_TRUE(sa.converged) << sa.steps << " steps";
    ASSERT_GT(aft.x.size(), 50u);
    // Transition: the laminar minimum of Cf, then the first face past it with Cf twice that.
    std::size_t lowest = 0;
    for (std::size_t k = 1; k < aft.x.size() && aft.x[k] < 1.9; ++k)
        if (aft.x[k] > 0.02 && aft.cf[k] < aft.cf[lowest]) lowest = k;
    std::size_t rise = lowest;
    while (rise + 1 < aft.x.size() && aft.cf[rise] < 2.0 * aft.cf[lowest]) ++rise;
    const double x_min = aft.x[lowest], x_rise = aft.x[rise];
    std::cout << "SA-AFT2017b plate, Tu 0.07 %: Cf minimum at Re_x " << x_min * re
              << ", doubled by Re_x " << x_rise * re
              << " (memory: about 2.8e6-3e6, Schubauer & Skramstad 1947 / e^N N = 9; reported, "
                 "not gated); "
              << aft.steps << " steps (fully turbulent SA " << sa.steps << ")\n";
    // The model's own prediction on the exact Blasius layer (blasius_amplification.hpp): where
    // its n~ reaches N_crit 9. veer's Cf leaves its minimum a little behind that (the intermittency
    // and then nu~ must grow after onset: measured 10 % in Re_x on this grid, 18:50 UTC); before
    // it would mean n~ grows faster than the model, far behind it that veer's transport or
    // coupling delays it. 0.95 allows for the discrete Cf minimum; 1.25 is our bound.
    const double model_onset =
        test::blasius_amplification_onset(blasius.value("wall_curvature_f2"), 9.0);
    std::cout << "  the model on the exact Blasius layer: n~ reaches 9 at Re_x " << model_onset
              << "; veer's Cf minimum at " << x_min * re / model_onset << " times that\n";
    EXPECT_GT(x_min * re, 0.95 * model_onset);
    EXPECT_LT(x_min * re, 1.25 * model_onset);
    ASSERT_GT(x_min, 0.1) << "transition too close to the leading edge to test the laminar part";
    ASSERT_LT(x_rise, 1.3) << "no transition well ahead of the plate's end";
    int laminar = 0, turbulent = 0;
    for (double x : {0.25 * x_min, 0.5 * x_min, 0.75 * x_min}) {
        const double blasius_cf = laminar_coefficient / std::sqrt(x * re);
        std::cout << "  x " << x << ": Cf " << aft.cf_at(x) << ", Blasius " << blasius_cf << "\n";
        EXPECT_NEAR(aft.cf_at(x), blasius_cf, 0.05 * blasius_cf) << x;
        ++laminar;
    }
    const std::vector<double> rt = momentum_reynolds(aft);
    for (std::size_t k = 0; k < aft.x.size(); ++k) {
        const double x = aft.x[k];
        if (x < x_rise + 0.4 * (1.9 - x_rise) || x > 1.9) continue;
        const double sa_same = cf_at_momentum_reynolds(sa, rt[k]);
        if (turbulent % 3 == 0)
            std::cout << "  x " << x << ", Re_theta " << rt[k] << ": Cf " << aft.cf[k]
                      << ", fully turbulent SA at that Re_theta " << sa_same << " (at that x "
                      << sa.cf_at(x) << ")\n";
        EXPECT_NEAR(aft.cf[k], sa_same, 0.05 * sa_same) << x;
        ++turbulent;
    }
    EXPECT_GE(turbulent, 2);
    EXPECT_EQ(laminar, 3);
}

}  // namespace
}  // namespace veer
