/// What SA-AFT2017b's growth term means, checked on exact laminar profiles: on the Falkner-Skan
/// similarity layers (Falkner & Skan 1931; Hartree 1937: f''' + f f'' + beta (1 - f'^2) = 0,
/// f(0) = f'(0) = 0, f'(inf) = 1, eta = y sqrt((m + 1) U / (2 nu x)), U = x^m, m = beta / (2 -
/// beta)), the point functions of solver/transition_correlations.hpp evaluated at y = delta*
/// reproduce the layer's own integral quantities [D], so the transcription drops no factor:
///   - H12 from the local estimate H_L = -y^2 (du/dx) / nu equals the profile's delta* / theta;
///   - k_V equals Re_V / Re_theta there (Re_V = y^2 (du/dy) / nu);
///   - the n~ source per unit length, Omega F_growth dn/dRe_theta / u (F_growth = D (1 + m) l / 2),
///     equals the envelope (e^N) rate dn/dRe_theta (H12) dRe_theta/dx, dRe_theta/dx exact for the
///     similarity layer: (m + 1) Re_theta / (2 x).
/// The Blasius layer (beta 0) is checked against its published f''(0) (Blasius 1908,
/// tests/reference/blasius1908_flat_plate.csv: 0.332057 in eta = y sqrt(U / (nu x)), so
/// sqrt(2) times that here). Measured: model / envelope per length 0.957 (beta 0) ... 0.997.
#include <gtest/gtest.h>

#include <array>
#include <cmath>
#include <iostream>
#include <vector>

#include "../../reference_table.hpp"
#include "../../similarity_rk4.hpp"
#include "../../validation/blasius_amplification.hpp"
#include "solver/transition_correlations.hpp"

namespace veer {
namespace {

constexpr double step = 0.002, eta_end = 10.0;

/// f, f', f'' on eta = 0, step, ... eta_end for wall curvature f''(0).
std::vector<std::array<double, 3>> falkner_skan(double beta, double wall_curvature) {
    const auto rhs = [beta](const std::array<double, 3>& y) {
        return std::array<double, 3>{y[1], y[2], -y[0] * y[2] - beta * (1.0 - y[1] * y[1])};
    };
    const auto count = static_cast<std::size_t>(std::lround(eta_end / step)) + 1;
    return test::similarity_rk4(rhs, {0.0, 0.0, wall_curvature}, step, count);
}

/// f''(0) with f'(eta_end) = 1, by bisection (f'(eta_end) rises with f''(0) near the solution).
double wall_curvature_of(double beta) {
    double lo = 0.0, hi = 2.0;
    for (int k = 0; k < 60; ++k) {
        const double mid = 0.5 * (lo + hi);
        (falkner_skan(beta, mid).back()[1] > 1.0 ? hi : lo) = mid;
    }
    return 0.5 * (lo + hi);
}

TEST(AftGrowthOnFalknerSkan, BlasiusWallCurvatureMatchesThePublishedValue) {
    const test::ReferenceTable blasius =
        test::ReferenceTable::read("blasius1908_flat_plate.csv", 3);
    EXPECT_NEAR(wall_curvature_of(0.0), std::sqrt(2.0) * blasius.value("wall_curvature_f2"), 2e-5);
}

TEST(AftGrowthOnFalknerSkan, CorrelationsAtTheDisplacementThicknessMatchTheProfile) {
    const double nu = 1e-8, x = 1.0;  // Re_theta of several thousand: F_crit on for every beta
    int checked = 0;
    for (double beta : {-0.14, -0.1, -0.05, 0.0, 0.1, 0.3, 0.5}) {
        const auto rows = falkner_skan(beta, wall_curvature_of(beta));
        ASSERT_NEAR(rows.back()[1], 1.0, 1e-6) << beta;  // the far condition is met
        double delta_eta = 0.0, theta_eta = 0.0;         // trapezoidal integrals
        for (std::size_t k = 1; k < rows.size(); ++k) {
            const double a = rows[k - 1][1], b = rows[k][1];
            delta_eta += 0.5 * step * ((1.0 - a) + (1.0 - b));
            theta_eta += 0.5 * step * (a * (1.0 - a) + b * (1.0 - b));
        }
        const double h12 = delta_eta / theta_eta, m = beta / (2.0 - beta), u_e = std::pow(x, m);
        const double g = std::sqrt(2.0 * nu * x / ((m + 1.0) * u_e));  // y = eta g
        const auto& r = rows[static_cast<std::size_t>(std::lround(delta_eta / step))];
        const double eta = std::round(delta_eta / step) * step, y = eta * g;
        const double u = u_e * r[1], dudy = u_e * r[2] / g;
        const double dudx = u_e / x * (m * r[1] - 0.5 * (1.0 - m) * eta * r[2]);
        const double h_l = -y * y * dudx / nu, re_theta = u_e * theta_eta * g / nu;
        EXPECT_NEAR(aft_shape_factor(h_l), h12, 0.01) << beta;  // measured <= 0.006
        const double re_v_ratio = y * y * dudy / nu / re_theta;
        EXPECT_NEAR(aft_k_v(h12), re_v_ratio, 0.015 * re_v_ratio) << beta;  // measured <= 0.6 %
        const double model = aft_amplification_source({dudy, dudy, y, nu, 0.0, h_l}) / u;
        const double envelope = aft_amplification_rate(h12) * (m + 1.0) * re_theta / (2.0 * x);
        ASSERT_GT(model, 0.0) << beta << ": F_crit off";
        std::cout << "beta " << beta << ": H12 " << h12 << " (model " << aft_shape_factor(h_l)
                  << "), n~ growth per length at delta*: model / envelope " << model / envelope
                  << "\n";
        // The fits' own scatter (Drela-Giles' (1 + m) l / 2 is 1.6 % under the exact
        // theta dRe_theta/dx at beta 0; D and H12(H_L) add up to 3 %): 0.94-1.03 is our band.
        EXPECT_GT(model / envelope, 0.94) << beta;
        EXPECT_LT(model / envelope, 1.03) << beta;
        ++checked;
    }
    EXPECT_EQ(checked, 7);
}

/// Why the model's n~ reaches N_crit on a plate later than the envelope reading of the same
/// correlations, although its growth per length at delta* is the envelope's (above): n~ is a
/// field, diffused (sigma_n (nu + nu_t), nu_t = 0 in the laminar layer) into the slow-growing
/// wall region and out to the free stream, where n~ = 0. Marched on the exact Blasius layer
/// (blasius_amplification.hpp), the onset moves with the diffusivity; the envelope (H12 fixed at
/// the Blasius value, n = dn/dRe_theta (Re_theta - Re_theta0)) lies ahead of the model.
TEST(AftGrowthOnFalknerSkan, PlateOnsetIsSetByTheAmplificationDiffusion) {
    const test::ReferenceTable blasius =
        test::ReferenceTable::read("blasius1908_flat_plate.csv", 3);
    const double f2 = blasius.value("wall_curvature_f2");
    // theta sqrt(Re_x) / x = 2 f''(0) = 0.664 (momentum integral, the file's [D] row).
    const double theta_coefficient = blasius.value("local_cf_coefficient");
    const auto rows = falkner_skan(0.0, wall_curvature_of(0.0));
    double delta_eta = 0.0, theta_eta = 0.0;
    for (std::size_t k = 1; k < rows.size(); ++k) {
        const double a = rows[k - 1][1], b = rows[k][1];
        delta_eta += 0.5 * step * ((1.0 - a) + (1.0 - b));
        theta_eta += 0.5 * step * (a * (1.0 - a) + b * (1.0 - b));
    }
    const double h12 = delta_eta / theta_eta;
    const double envelope_re_theta = aft_re_theta0(h12) + 9.0 / aft_amplification_rate(h12);
    const double envelope = std::pow(envelope_re_theta / theta_coefficient, 2.0);
    const double half = test::blasius_amplification_onset(f2, 9.0, 0.5);
    const double model = test::blasius_amplification_onset(f2, 9.0);
    const double twice = test::blasius_amplification_onset(f2, 9.0, 2.0);
    const double model_n7 = test::blasius_amplification_onset(f2, 7.0);
    std::cout << "Blasius H12 " << h12 << ": envelope N 9 at Re_x " << envelope
              << "; the model's n~ reaches 9 at " << model << " (diffusion halved " << half
              << ", doubled " << twice << "), 7 at " << model_n7 << "\n";
    ASSERT_TRUE(std::isfinite(twice));
    EXPECT_LT(envelope, model);
    EXPECT_LT(half, 0.9 * model);   // measured 0.77
    EXPECT_GT(twice, 1.1 * model);  // measured 1.35
}

}  // namespace
}  // namespace veer
