/// SA-AFT2017b on NACA 0012 against Sheldahl & Klimas 1981 (SAND80-2114; free-transition drag,
/// tests/reference/sheldahl1981_naca0012_drag.csv [T], a synthesised table to be read as a band)
/// and against fully turbulent Spalart-Allmaras on the same grid (transition_runs.hpp: 320 x 112,
/// y+ 1, far field 60). N_crit 9 (critical_amplification = 9; Mack's relation gives 9.0 at
/// Tu 0.07 %). Cost: fourteen runs of about 300-450 steps, 40-130 s each under a load average
/// of 8-13, except alpha 6 at Re 1e6 (6000 steps, 12 minutes: it does not converge).
/// Measured 18:25-18:45 UTC with `veer run` on the same case texts (Cd, Sheldahl & Klimas, error):
///   Re 1e6:   alpha 0 0.00517 / 0.0065 -20.4 %; 2 0.00553 / 0.0068 -18.7 %;
///             4 0.00681 / 0.0078 -12.7 %; 6 0.00928 / 0.0101 -8.1 % (not converged, 6000 steps);
///   Re 3.6e5: alpha 0 0.00702 / 0.0079 -11.1 %; 2 0.00779 / 0.0084 -7.3 %; 4 0.00931 / 0.0098 -5.0
///   %.
/// So DragAtRe1e6WithinFifteenPercentOfSheldahlKlimas fails at alpha 0 and 2 (and on convergence
/// at 6); its band is the and is left as it is. The cause is the model's late transition
/// on a Blasius-like layer, not a slip in veer (solver/README.md, "Transition models";
/// test_transition_flat_plate.cpp compares veer's plate with the model's own prediction).
/// Grid family at Re 1e6, alpha 0 (DragGridConvergedWithinThreePercentAtRe1e6): Cd 0.005241,
/// 0.005173, 0.005148 on 240 x 84, 320 x 112, 426 x 150; observed order 3.5, outside [1, 3], so
/// the conservative band: GCI_fine 1.85 %, the checks' grid 1.1 % from the extrapolated value.
/// Cautions: 2D, incompressible; the correlations behind the model are fits to laminar-layer
/// stability; results are no substitute for testing and licensed engineering review.
#include <gtest/gtest.h>

#include <array>
#include <cmath>
#include <iostream>

#include "postprocess/grid_convergence.hpp"
#include "tests/reference_table.hpp"
#include "transition_runs.hpp"

namespace veer {
namespace {

/// The table's alpha column as written there ("0", "2", ...).
std::string fmt_alpha(double alpha) { return std::to_string(static_cast<int>(alpha)); }

const std::string free_transition = "critical_amplification = 9\n";

test::SectionRun free_run(double reynolds, double alpha) {
    std::ostringstream name;
    name << "aft_naca0012_re" << reynolds << "_alpha" << alpha;
    return test::section_run(name.str(),
                             test::naca0012_case(reynolds, alpha, "sa-aft", free_transition));
}

test::SectionRun turbulent_run(double reynolds, double alpha) {
    std::ostringstream name;
    name << "sa_naca0012_re" << reynolds << "_alpha" << alpha;
    return test::section_run(name.str(),
                             test::naca0012_case(reynolds, alpha, "spalart-allmaras", ""));
}

/// Cd within `band` of the table's column at each of `alphas`.
void expect_drag_band(const std::string& column, double reynolds, const std::vector<double>& alphas,
                      double band) {
    const test::ReferenceTable t = test::ReferenceTable::read("sheldahl1981_naca0012_drag.csv", 6);
    ASSERT_FALSE(alphas.empty());
    for (double alpha : alphas) {
        const double published = t.number(t.row_where("alpha_deg", fmt_alpha(alpha)), column);
        const test::SectionRun r = free_run(reynolds, alpha);
        std::cout << "NACA 0012 Re " << reynolds << " alpha " << alpha
                  << ", SA-AFT2017b N_crit 9: " << r.iterations << " steps, Cl " << r.cl << ", Cd "
                  << r.cd << " (Sheldahl & Klimas 1981: " << published << ", "
                  << 100.0 * (r.cd / published - 1.0) << " %), transition x/c upper "
                  << r.transition_upper.value_or(std::nan("")) << ", lower "
                  << r.transition_lower.value_or(std::nan("")) << "\n";
        EXPECT_TRUE(r.converged) << alpha;
        EXPECT_NEAR(r.cd, published, band * published) << "Re " << reynolds << " alpha " << alpha;
    }
}

TEST(TransitionNaca0012, DragAtRe1e6WithinFifteenPercentOfSheldahlKlimas) {
    expect_drag_band("cd_re1m", 1e6, {0.0, 2.0, 4.0, 6.0}, 0.15);
}

TEST(TransitionNaca0012, DragAtRe360kWithinTwentyPercentOfSheldahlKlimas) {
    expect_drag_band("cd_re360k", 3.6e5, {0.0, 2.0, 4.0}, 0.20);
}

/// The grid family of the Cd checks at Re 1e6, alpha 0: 240 x 84, 320 x 112 (the checks' grid,
/// first cell from y+ 1: 2.3108e-5 chords at Re 1e6), 426 x 150, each dimension and the first cell
/// refined by about 4/3 (426 / 320 = 1.331, 150 / 112 = 1.339), far field 60 on all three.
TEST(TransitionNaca0012, DragGridConvergedWithinThreePercentAtRe1e6) {
    struct Level {
        int around, normal;
        std::string wall;
    };
    const Level levels[] = {{426, 150, "first_cell = 1.7331e-05"},
                            {320, 112, "y_plus = 1.0"},
                            {240, 84, "first_cell = 3.0811e-05"}};
    std::array<double, 3> h{}, cd{};
    std::cout << "NACA 0012 Re 1e6 alpha 0, SA-AFT2017b N_crit 9, grid family (Celik et al. 2008)\n"
              << "| grid | h = 1/sqrt(N) | steps | Cd | transition x/c upper, lower "
                 "|\n|---|---|---|---|---|\n";
    for (std::size_t k = 0; k < 3; ++k) {
        const Level& l = levels[k];
        const test::SectionRun r =
            k == 1 ? free_run(1e6, 0.0)  // the very run of the Cd checks, shared
                   : test::section_run("aft_naca0012_re1e6_alpha0_" + std::to_string(l.around),
                                       test::naca0012_case(1e6, 0.0, "sa-aft", free_transition,
                                                           l.around, l.normal, l.wall));
        EXPECT_TRUE(r.converged) << l.around;
        // The same domain on each grid: h from the cell count, ni = around + 2 wake (case_file:
        // wake = 3 around / 16), nj = normal; its constant factor cancels in the ratios.
        const int ni = l.around + 2 * (3 * l.around / 16);
        h[k] = 1.0 / std::sqrt(static_cast<double>(ni) * l.normal);
        cd[k] = r.cd;
        std::cout << "| " << l.around << " x " << l.normal << " | " << h[k] << " | " << r.iterations
                  << " | " << r.cd << " | " << r.transition_upper.value_or(std::nan("")) << ", "
                  << r.transition_lower.value_or(std::nan("")) << " |\n";
    }
    const GridConvergence g = grid_convergence(h, cd);
    std::cout << "Cd: " << verdict_text(g) << ", extrapolated " << g.extrapolated << ", GCI_fine "
              << 100.0 * g.gci_fine << " % (band " << g.band << ")\n";
    // The acceptance: Cd converged to within 3 % on the grid of the checks. The GCI above
    // is the finest grid's; the checks' grid (320 x 112) is the middle one, so its own distance
    // from the extrapolated value is gated too (without a valid extrapolation: its distance from
    // the finest grid plus the finest grid's band).
    EXPECT_LT(g.gci_fine, 0.03);
    const double middle_error =
        g.extrapolated_valid ? std::abs(cd[1] - g.extrapolated) : std::abs(cd[1] - cd[0]) + g.band;
    std::cout << "checks' grid (320 x 112): " << 100.0 * middle_error / cd[1]
              << " % from the converged value\n";
    EXPECT_LT(middle_error, 0.03 * cd[1]);
}

TEST(TransitionNaca0012, FreeTransitionDragWellBelowFullyTurbulent) {
    const test::SectionRun free = free_run(1e6, 0.0), turbulent = turbulent_run(1e6, 0.0);
    std::cout << "NACA 0012 Re 1e6 alpha 0: Cd " << free.cd << " free transition, " << turbulent.cd
              << " fully turbulent (" << 100.0 * (1.0 - free.cd / turbulent.cd) << " % lower)\n";
    EXPECT_TRUE(free.converged);
    EXPECT_TRUE(turbulent.converged);
    EXPECT_LE(free.cd, 0.75 * turbulent.cd);
}

TEST(TransitionNaca0012, TripAtOnePercentReproducesFullyTurbulentSa) {
    // Re 6e6, alpha 4: both surfaces tripped at x/c 0.01 with the transition model against
    // fully turbulent SA; within 2 % in Cl and Cd.
    const double alpha = 4.0;
    const test::SectionRun tripped = test::section_run(
        "aft_naca0012_trip001_re6e6",
        test::naca0012_case(6e6, alpha, "sa-aft",
                            free_transition + "trip_upper = 0.01\ntrip_lower = 0.01\n"));
    const test::SectionRun turbulent = turbulent_run(6e6, alpha);
    std::cout << "NACA 0012 Re 6e6 alpha 4: tripped at 0.01 Cl " << tripped.cl << " Cd "
              << tripped.cd << " (" << tripped.iterations << " steps); fully turbulent Cl "
              << turbulent.cl << " Cd " << turbulent.cd << " (" << turbulent.iterations
              << " steps)\n";
    EXPECT_TRUE(tripped.converged);
    EXPECT_TRUE(turbulent.converged);
    EXPECT_NEAR(tripped.cl, turbulent.cl, 0.02 * std::abs(turbulent.cl));
    EXPECT_NEAR(tripped.cd, turbulent.cd, 0.02 * turbulent.cd);
}

}  // namespace
}  // namespace veer
