/// The point functions of SA-AFT2017b and SA-BCM (solver/transition_correlations.hpp) against
/// values computed independently from the formulas as the NASA TMR pages give them
/// (N_crit: tests/reference/mack1977_critical_amplification.csv): each expected number below was
/// evaluated separately in Python 3 (math module) from the transcribed formula, not from this code.
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>

#include "../../reference_table.hpp"
#include "solver/transition_correlations.hpp"

namespace veer {
namespace {

TEST(TransitionCorrelations, MackCriticalAmplificationMatchesTheTable) {
    // tests/reference/mack1977_critical_amplification.csv [D]: the formula's values in full and
    // as the project's transition reference rounds them (Tu 0.07 % -> 9.0 ... 1 % -> 2.7).
    const test::ReferenceTable t =
        test::ReferenceTable::read("mack1977_critical_amplification.csv", 5);
    for (std::size_t r = 0; r < t.rows(); ++r) {
        const double tu = t.number(r, "tu_percent");
        EXPECT_NEAR(mack_critical_amplification(tu), t.number(r, "n_crit"), 1e-12) << tu;
        EXPECT_NEAR(mack_critical_amplification(tu), t.number(r, "n_crit_rounded"), 0.051) << tu;
    }
    std::cout << "compared " << t.rows() << " N_crit values with the reference file\n";
}

TEST(TransitionCorrelations, ShapeFactorFromTheLocalEstimate) {
    EXPECT_NEAR(aft_shape_factor(0.0), 2.3150334899617837, 1e-13);
    EXPECT_NEAR(aft_shape_factor(0.745), 2.589809049177984, 1e-13);
    EXPECT_NEAR(aft_shape_factor(5.0), 3.7549734555510086, 1e-13);
    // Outside the band the correlations are used in: held at its ends (our limiter).
    EXPECT_EQ(aft_shape_factor(-2.3), AftConstants::h12_lowest);
    EXPECT_EQ(aft_shape_factor(-50.0), AftConstants::h12_lowest);
    EXPECT_EQ(aft_shape_factor(1e9), AftConstants::h12_highest);
}

TEST(TransitionCorrelations, StabilityCorrelationsOfTheShapeFactor) {
    struct Row {
        double h12, re_theta0, k_v, growth, rate;
    };
    const Row rows[] = {
        {2.3, 3043.2989233127137, 0.98494045, 0.37903925130033583, 0.008400668754170365},
        {2.59, 237.0633554627834, 1.2929102275, 0.6208987385198557, 0.010274443055426678},
        {3.0, 61.010605876950734, 1.798968, 0.7694698517005594, 0.03149850039518519},
        {4.0, 29.77941805572696, 3.380362, 0.8213880427641402, 0.07640067578669077},
    };
    for (const Row& r : rows) {
        EXPECT_NEAR(aft_re_theta0(r.h12), r.re_theta0, 1e-10 * r.re_theta0) << r.h12;
        EXPECT_NEAR(aft_k_v(r.h12), r.k_v, 1e-12) << r.h12;
        EXPECT_NEAR(aft_growth(r.h12), r.growth, 1e-12) << r.h12;
        EXPECT_NEAR(aft_amplification_rate(r.h12), r.rate, 1e-14) << r.h12;
    }
}

TEST(TransitionCorrelations, OnsetAndTurbulenceFunctions) {
    EXPECT_EQ(aft_onset(4.5, 9.0, 0.0), 0.0);            // 0.5 - 1 < 0
    EXPECT_NEAR(aft_onset(13.5, 9.0, 0.0), 0.5, 1e-15);  // 1.5 - 1
    EXPECT_NEAR(aft_onset(27.0, 9.0, 0.0), 1.0, 1e-15);  // min(3, 2) - 1
    EXPECT_NEAR(aft_onset(4.5, 9.0, 3.5), 0.5, 1e-15);   // 0.5 - max(1 - 1, 0)
    EXPECT_EQ(aft_onset(4.5, 9.0, 1.75), 0.0);           // 0.5 - (1 - 1/8) < 0
    EXPECT_NEAR(aft_turbulent(2.0), std::exp(-1.0), 1e-15);
    EXPECT_NEAR(aft_turbulent(0.0), 1.0, 0.0);
    EXPECT_NEAR(aft_ft2(0.0), 0.0, 0.0);
    EXPECT_NEAR(aft_ft2(std::log(0.25)), 1.2 * 0.75, 1e-15);
}

TEST(TransitionCorrelations, AmplificationSourceWithItsCriticalSwitch) {
    // H_L 0.745 -> H12 2.5898; Re_V = S d^2 / nu = 500 * 0.002^2 / 1e-6 = 2000 > Re_V0 = 306.96.
    AftCell c{500.0, 500.0, 0.002, 1e-6, 0.0, 0.745};
    EXPECT_NEAR(aft_amplification_source(c), 3.186936724955818, 1e-12);
    c.d = 0.0007;  // Re_V = 245 < Re_V0: F_crit = 0
    EXPECT_EQ(aft_amplification_source(c), 0.0);
    c.d = 0.002;
    c.nu_t = 9e-6;  // Re_V = 2000 / 10 = 200 < Re_V0
    EXPECT_EQ(aft_amplification_source(c), 0.0);
}

TEST(TransitionCorrelations, IntermittencySourceIsANewtonLinearisation) {
    for (double g : {-5.0, -3.9, -1.0, -0.01, 0.0})
        for (double onset : {0.0, 0.3, 1.0})
            for (double turb : {0.0, 0.7, 1.0}) {
                const double S = 800.0, W = 900.0;
                const TransitionSourceSplit s = aft_intermittency_source(g, S, W, onset, turb);
                const auto value = [&](double x) {
                    return 100.0 * S * onset * (1.0 - std::exp(x)) -
                           0.06 * W * turb * (50.0 * std::exp(x) - 1.0);
                };
                EXPECT_NEAR(s.value, value(g), 1e-9 * (1.0 + std::abs(value(g))));
                EXPECT_GE(s.implicit_coefficient, 0.0);
                EXPECT_NEAR(s.explicit_part - s.implicit_coefficient * g, s.value,
                            1e-9 * (1.0 + std::abs(s.value)));
                const double h = 1e-6;
                const double slope = (value(g + h) - value(g - h)) / (2.0 * h);
                EXPECT_NEAR(s.implicit_coefficient, -slope, 1e-5 * (1.0 + std::abs(slope)));
            }
}

TEST(TransitionCorrelations, BcmCriticalReynoldsAndIntermittency) {
    const double re_c = bcm_critical_re_theta(0.1);
    EXPECT_NEAR(re_c, 1148.0101829584203, 1e-9);
    // Laminar and far above Re_theta_c (8208): gamma_BC = 1 to round-off.
    EXPECT_NEAR(bcm_intermittency(2000.0, 0.003, 1e-6, 0.0, re_c), 1.0, 1e-15);
    // Below Re_theta_c (9.1) with nu_t / nu = 0.03: only Term2 = 1.5 acts.
    EXPECT_NEAR(bcm_intermittency(2000.0, 1e-4, 1e-6, 3e-8, re_c), 0.7061673441219269, 1e-14);
    EXPECT_EQ(bcm_intermittency(2000.0, 1e-4, 1e-6, 0.0, re_c), 0.0);
}

}  // namespace
}  // namespace veer
