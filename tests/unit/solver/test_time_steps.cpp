// The backward-differentiation coefficients of the stepper: exact derivatives and extrapolations
// of the polynomials their order promises, with fixed and with changing steps (the defining
// property of variable-step BDF; Hairer & Wanner 1996, Solving ODEs II, section III.5).
#include <gtest/gtest.h>

#include "solver/time_steps.hpp"

namespace veer {
namespace {

/// q(t) = 0.7 - 1.3 t + 2.1 t^2 and its derivative.
double q(double t) { return 0.7 - 1.3 * t + 2.1 * t * t; }
double dq(double t) { return -1.3 + 4.2 * t; }

TEST(BdfCoefficients, SecondOrderIsExactForQuadraticsWithChangingSteps) {
    for (const double w : {1.0, 0.5, 1.7, 3.0}) {  // dt / dt_previous
        const double dt_previous = 0.2, dt = w * dt_previous;
        const double t1 = 1.0, t0 = t1 - dt, tm = t0 - dt_previous;  // t^{n+1}, t^n, t^{n-1}
        const BdfCoefficients c = bdf_coefficients(true, dt, dt_previous);
        // sum alpha_k = 0 (constants) and the derivative of the quadratic through three points:
        // round-off tolerances.
        EXPECT_NEAR(c.alpha0 + c.alpha1 + c.alpha2, 0.0, 1e-14) << "w " << w;
        EXPECT_NEAR((c.alpha0 * q(t1) + c.alpha1 * q(t0) + c.alpha2 * q(tm)) / dt, dq(t1), 1e-12)
            << "w " << w;
        // The lagged terms' extrapolation is exact for straight lines.
        const auto line = [](double t) { return 0.4 + 0.9 * t; };
        EXPECT_NEAR(c.extrap0 * line(t0) + c.extrap1 * line(tm), line(t1), 1e-14) << "w " << w;
    }
    // The fixed-step form 3/2, -2, 1/2.
    const BdfCoefficients fixed = bdf_coefficients(true, 0.1, 0.1);
    EXPECT_DOUBLE_EQ(fixed.alpha0, 1.5);
    EXPECT_DOUBLE_EQ(fixed.alpha1, -2.0);
    EXPECT_DOUBLE_EQ(fixed.alpha2, 0.5);
}

TEST(BdfCoefficients, FirstOrderIsExactForStraightLines) {
    const BdfCoefficients c = bdf_coefficients(false, 0.3, 0.1);
    const auto line = [](double t) { return 0.4 + 0.9 * t; };
    EXPECT_NEAR((c.alpha0 * line(1.0) + c.alpha1 * line(0.7) + c.alpha2 * line(0.6)) / 0.3, 0.9,
                1e-14);
    EXPECT_EQ(c.alpha2, 0.0);
    EXPECT_EQ(c.extrap0, 1.0);
    EXPECT_EQ(c.extrap1, 0.0);
}

}  // namespace
}  // namespace veer
