/// Spalart-Allmaras point terms: constants and closure functions against values worked out by
/// hand from the formulas of the NASA Turbulence Modeling Resource "SA" / "SA-neg" pages
/// (Spalart & Allmaras 1994; Allmaras, Johnson & Spalart 2012), the log-layer balance the
/// constant c_w1 is built for, and the negative branch.
#include <gtest/gtest.h>

#include <cmath>

#include "solver/spalart_allmaras_terms.hpp"

namespace veer {
namespace {

using C = SpalartAllmarasConstants;

// Hand values carry 12+ significant digits; 1e-12 relative is round-off of a few operations.
constexpr double tight = 1e-12;

TEST(SpalartAllmarasTerms, PublishedConstants) {
    // Spalart & Allmaras 1994 via the NASA TMR "SA" page; c_v2, c_v3, c_n1 from Allmaras,
    // Johnson & Spalart 2012 (ICCFD7-1902).
    EXPECT_EQ(C::cb1, 0.1355);
    EXPECT_EQ(C::cb2, 0.622);
    EXPECT_EQ(C::kappa, 0.41);
    EXPECT_EQ(C::cw2, 0.3);
    EXPECT_EQ(C::cw3, 2.0);
    EXPECT_EQ(C::cv1, 7.1);
    EXPECT_EQ(C::ct3, 1.2);
    EXPECT_EQ(C::ct4, 0.5);
    EXPECT_EQ(C::cv2, 0.7);
    EXPECT_EQ(C::cv3, 0.9);
    EXPECT_EQ(C::cn1, 16.0);
    EXPECT_DOUBLE_EQ(C::sigma, 2.0 / 3.0);
    // c_w1 = c_b1 / kappa^2 + (1 + c_b2) / sigma = 0.1355 / 0.1681 + 1.622 * 1.5.
    EXPECT_NEAR(C::cw1, 3.2390678167757287, tight);
}

TEST(SpalartAllmarasTerms, ClosureFunctionsAgainstHandValues) {
    // f_v1(chi) = chi^3 / (chi^3 + 357.911): chi = 1 -> 1 / 358.911; chi = 10 -> 1000 / 1357.911;
    // chi = c_v1 -> 1/2 exactly.
    EXPECT_NEAR(sa_fv1(1.0), 1.0 / 358.911, tight);
    EXPECT_NEAR(sa_fv1(10.0), 1000.0 / 1357.911, tight);
    EXPECT_NEAR(sa_fv1(7.1), 0.5, tight);
    // f_v2 = 1 - chi / (1 + chi f_v1): chi = 1 -> 1 - 1 / (1 + 1/358.911); chi = 10 -> negative.
    EXPECT_NEAR(sa_fv2(1.0), 1.0 - 1.0 / (1.0 + 1.0 / 358.911), tight);
    EXPECT_NEAR(sa_fv2(10.0), 1.0 - 10.0 / (1.0 + 10000.0 / 1357.911), tight);
    EXPECT_LT(sa_fv2(10.0), 0.0);
    // f_t2 = 1.2 exp(-0.5 chi^2).
    EXPECT_NEAR(sa_ft2(0.0), 1.2, tight);
    EXPECT_NEAR(sa_ft2(1.0), 1.2 * std::exp(-0.5), tight);
    // f_w: r = 1 gives g = 1 and f_w = 1 (the log-layer value); r = 0 gives 0; r = 0.5 gives
    // g = 0.5 + 0.3 (0.5^6 - 0.5) = 0.3546875, f_w = g (65 / (g^6 + 64))^(1/6); large r
    // saturates at 65^(1/6).
    EXPECT_NEAR(sa_fw(1.0), 1.0, tight);
    EXPECT_EQ(sa_fw(0.0), 0.0);
    const double g = 0.3546875;
    EXPECT_NEAR(sa_fw(0.5), g * std::pow(65.0 / (std::pow(g, 6) + 64.0), 1.0 / 6.0), tight);
    EXPECT_NEAR(sa_fw(10.0), std::pow(65.0, 1.0 / 6.0), 1e-6);  // 1 - g^-6 ~ 1e-32 short
    // f_n = (16 + chi^3) / (16 - chi^3) for chi < 0: chi = -1 -> 15/17, chi = -2 -> 8/24.
    EXPECT_NEAR(sa_fn(-1.0), 15.0 / 17.0, tight);
    EXPECT_NEAR(sa_fn(-2.0), 1.0 / 3.0, tight);
    EXPECT_EQ(sa_fn(0.5), 1.0);
}

TEST(SpalartAllmarasTerms, ModifiedVorticityLimiterIsContinuousAndPositive) {
    const double omega = 2.0;
    // At S_bar = -c_v2 Omega both branches give (1 - c_v2) Omega = 0.3 Omega.
    EXPECT_NEAR(sa_s_tilde(omega, -0.7 * omega), 0.3 * omega, tight);
    EXPECT_NEAR(sa_s_tilde(omega, -0.7 * omega - 1e-9), 0.3 * omega, 1e-8);
    // Far below, S~ tends to (1 - c_v3) Omega = 0.1 Omega from above, never below it.
    for (double s_bar : {-1.5, -10.0, -1e3, -1e8}) {  // all below -c_v2 Omega = -1.4
        EXPECT_GE(sa_s_tilde(omega, s_bar), 0.1 * omega);
        EXPECT_LE(sa_s_tilde(omega, s_bar), 0.3 * omega);
    }
    EXPECT_NEAR(sa_s_tilde(omega, 0.5), 2.5, tight);  // unlimited branch: Omega + S_bar
}

TEST(SpalartAllmarasTerms, LogLayerBalance) {
    // In the log layer nu~ = kappa u_tau y and Omega = u_tau / (kappa y); with chi >> 1 the
    // source is c_b1 nu~^2 / (kappa y)^2 - c_w1 nu~^2 / y^2 = -(1 + c_b2) / sigma (kappa u_tau)^2,
    // which cancels the diffusion (1 + c_b2) / sigma (kappa u_tau)^2: the reason for c_w1's
    // value. chi = 4e5 leaves f_v2 ~ 2.5e-6 (so r = 1 - 2.5e-6, f_w = 1 - 6e-6) and f_t2 = 0:
    // about 1e-5 relative, checked to 1e-4.
    const double nu = 1e-10, u_tau = 0.04, y = 0.025;
    const double nut = C::kappa * u_tau * y;
    ASSERT_GT(nut / nu, 1e5);
    const SaSourceSplit s = sa_source(nut, u_tau / (C::kappa * y), y, nu);
    const double expected = -(1.0 + C::cb2) / C::sigma * C::kappa * C::kappa * u_tau * u_tau;
    EXPECT_NEAR((s.production - s.destruction) / expected, 1.0, 1e-4);
    // The split gives the same net source at the current value.
    EXPECT_NEAR((s.explicit_part - s.implicit_coefficient * nut) / expected, 1.0, 1e-4);
    EXPECT_GE(s.explicit_part, 0.0);
    EXPECT_GE(s.implicit_coefficient, 0.0);
}

TEST(SpalartAllmarasTerms, EddyViscosityAndDiffusivity) {
    const double nu = 1e-6;
    EXPECT_NEAR(sa_eddy_viscosity(7.1 * nu, nu), 0.5 * 7.1 * nu, tight * nu);
    EXPECT_EQ(sa_eddy_viscosity(-3.0 * nu, nu), 0.0);
    EXPECT_EQ(sa_eddy_viscosity(0.0, nu), 0.0);
    // (nu + nu~ f_n) / sigma stays positive for every negative nu~ (its smallest value, near
    // chi = -1.4, is about 1% of nu / sigma); for chi >= 0 it is (nu + nu~) / sigma.
    double smallest = 1e300;
    for (double chi = -100.0; chi <= 100.0; chi += 0.001)
        smallest = std::min(smallest, sa_diffusivity(chi * nu, nu));
    EXPECT_GT(smallest, 0.0);
    EXPECT_NEAR(sa_diffusivity(2.0 * nu, nu), 3.0 * nu * 1.5, tight * nu);
}

TEST(SpalartAllmarasTerms, NegativeBranchIsAnImplicitDecay) {
    // SA-neg: for nu~ < 0 both terms are gains towards zero, so the split puts everything on
    // the diagonal and leaves no explicit part; a point-implicit step q' = q / (1 + dt a) then
    // moves q towards 0 without crossing it, for any step size.
    const double nu = 1e-6, omega = 50.0, d = 1e-3;
    for (double chi : {-0.01, -1.0, -30.0}) {
        const double q = chi * nu;
        const SaSourceSplit s = sa_source(q, omega, d, nu);
        EXPECT_EQ(s.explicit_part, 0.0);
        EXPECT_GT(s.implicit_coefficient, 0.0);
        EXPECT_GT(s.production - s.destruction, 0.0) << "a gain where nu~ < 0";
        EXPECT_NEAR(s.production, C::cb1 * (1.0 - C::ct3) * omega * q, 1e-12 * std::abs(q));
        EXPECT_NEAR(s.destruction, -C::cw1 * q * q / (d * d), 1e-12 * q * q / (d * d));
        double value = q;
        for (int n = 0; n < 50; ++n) {
            const SaSourceSplit t = sa_source(value, omega, d, nu);
            const double next = value / (1.0 + 1e3 * t.implicit_coefficient);
            EXPECT_LE(value, next);
            EXPECT_LE(next, 0.0);
            value = next;
        }
    }
}

TEST(SpalartAllmarasTerms, PositiveBranchSplitStaysPositive) {
    // Near the wall f_t2 > 1 makes production negative for small chi; the split must then move
    // it to the diagonal so that an implicit step cannot produce a negative value.
    const double nu = 1e-6;
    for (double chi : {1e-3, 0.1, 1.0, 3.0, 50.0, 1e3})
        for (double omega : {0.0, 1.0, 1e4})
            for (double d : {1e-6, 1e-3, 1.0}) {
                const SaSourceSplit s = sa_source(chi * nu, omega, d, nu);
                EXPECT_GE(s.explicit_part, 0.0);
                EXPECT_GE(s.implicit_coefficient, 0.0);
                EXPECT_TRUE(std::isfinite(s.explicit_part + s.implicit_coefficient));
                const double net = s.explicit_part - s.implicit_coefficient * chi * nu;
                EXPECT_NEAR(net, s.production - s.destruction,
                            1e-12 * (std::abs(s.production) + std::abs(s.destruction)));
            }
    // The linearised split: same net source, a coefficient at least Picard's (so the same
    // positivity), and at least the loss rate -dS/dnu~ (checked by a central difference).
    for (double chi : {-20.0, -0.5, 0.05, 0.7, 2.0, 40.0}) {
        const double q = chi * nu, omega = 30.0, d = 2e-3;
        const SaSourceSplit p = sa_source(q, omega, d, nu);
        const SaSourceSplit l = sa_source_linearised(q, omega, d, nu);
        const double net = p.production - p.destruction;
        EXPECT_NEAR(l.explicit_part - l.implicit_coefficient * q, net, 1e-10 * std::abs(net));
        EXPECT_GE(l.implicit_coefficient, p.implicit_coefficient);
        if (q > 0.0) {
            EXPECT_GE(l.explicit_part, 0.0);
        }
        const double h = 1e-4 * std::abs(q);
        const SaSourceSplit a = sa_source(q + h, omega, d, nu), b = sa_source(q - h, omega, d, nu);
        const double rate =
            -((a.production - a.destruction) - (b.production - b.destruction)) / (2.0 * h);
        // One-sided against central difference: agreement to 1e-3 of the rate's scale.
        EXPECT_GE(l.implicit_coefficient, rate - 1e-3 * std::abs(rate)) << "chi " << chi;
    }
    const SaSourceSplit zero = sa_source(0.0, 10.0, 1e-3, nu);
    EXPECT_EQ(zero.production - zero.destruction, 0.0);  // nu~ = 0 is a fixed point
}

}  // namespace
}  // namespace veer
