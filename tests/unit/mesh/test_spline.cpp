// The parametric cubic spline: interpolation, natural ends, derivatives and curvature on shapes
// whose exact values are known (a line, a circle), and its observed order of accuracy.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <numbers>

#include "mesh/spline.hpp"

namespace veer {
namespace {

std::vector<Vec2> circle_arc(int n, double radius, double sweep) {
    std::vector<Vec2> p;
    for (int k = 0; k <= n; ++k) {
        const double a = sweep * k / n;
        p.push_back({radius * std::cos(a), radius * std::sin(a)});
    }
    return p;
}

/// Largest distance from the circle of the spline between knots, over the middle half of the arc
/// (away from the natural ends, whose zero second derivative is not a circle's).
double middle_error(int n) {
    const std::vector<Vec2> p = circle_arc(n, 1.0, 1.5 * std::numbers::pi);
    const ParametricSpline spline(p);
    double worst = 0.0;
    for (int k = n / 4; k < 3 * n / 4; ++k) {
        const double s = 0.5 * (spline.knots()[static_cast<std::size_t>(k)] +
                                spline.knots()[static_cast<std::size_t>(k) + 1]);
        worst = std::max(worst, std::abs(norm(spline.position(s)) - 1.0));
    }
    return worst;
}

TEST(Spline, PassesThroughItsPointsExactly) {
    const std::vector<Vec2> p = circle_arc(17, 2.0, 2.0);
    const ParametricSpline spline(p);
    ASSERT_EQ(spline.knots().size(), p.size());
    EXPECT_EQ(spline.knots().front(), 0.0);
    for (std::size_t k = 0; k < p.size(); ++k) {
        // a knot starts its own piece (t = 0), so the value is the stored point; the last knot
        // ends the last piece, exact up to round-off of the cubic
        const Vec2 q = spline.position(spline.knots()[k]);
        EXPECT_NEAR(q.x, p[k].x, k + 1 < p.size() ? 0.0 : 1e-14);
        EXPECT_NEAR(q.y, p[k].y, k + 1 < p.size() ? 0.0 : 1e-14);
    }
    // cumulative chord length
    double length = 0.0;
    for (std::size_t k = 1; k < p.size(); ++k) length += norm(p[k] - p[k - 1]);
    EXPECT_NEAR(spline.length(), length, 1e-14);
}

TEST(Spline, StraightLineHasUnitTangentAndNoCurvature) {
    // unevenly spaced points on a line: every cubic piece is the line itself (round-off only)
    const std::vector<Vec2> p = {{0, 0}, {0.1, 0.05}, {0.5, 0.25}, {0.6, 0.3}, {2, 1}};
    const ParametricSpline spline(p);
    const Vec2 unit = {2.0 / std::sqrt(5.0), 1.0 / std::sqrt(5.0)};
    for (double s = 0.0; s <= spline.length(); s += 0.07) {
        EXPECT_NEAR(spline.first_derivative(s).x, unit.x, 1e-13);
        EXPECT_NEAR(spline.first_derivative(s).y, unit.y, 1e-13);
        EXPECT_NEAR(spline.curvature(s), 0.0, 1e-11);
    }
}

TEST(Spline, NaturalEndsHaveZeroSecondDerivative) {
    const ParametricSpline spline(circle_arc(12, 1.0, 3.0));
    EXPECT_NEAR(norm(spline.second_derivative(0.0)), 0.0, 1e-12);
    EXPECT_NEAR(norm(spline.second_derivative(spline.length())), 0.0, 1e-12);
}

TEST(Spline, CircleCurvatureAndDirection) {
    // 64 pieces on a 3/4 circle of radius 2 (counter-clockwise): curvature +1/2 and a tangent of
    // unit speed in the middle, up to the chord-length parameter, shorter than the arc by a
    // factor 1 - a^2/24 for a piece subtending a = 0.074 rad: 2.3e-4 (measured 2.26e-4);
    // tolerance 5e-4
    const int n = 64;
    const ParametricSpline ccw(circle_arc(n, 2.0, 1.5 * std::numbers::pi));
    const double mid = 0.5 * ccw.length();
    EXPECT_NEAR(ccw.curvature(mid), 0.5, 5e-4);
    EXPECT_NEAR(norm(ccw.first_derivative(mid)), 1.0, 5e-4);
    // the same arc traversed clockwise turns the other way
    std::vector<Vec2> backwards = circle_arc(n, 2.0, 1.5 * std::numbers::pi);
    std::reverse(backwards.begin(), backwards.end());
    const ParametricSpline cw(backwards);
    EXPECT_NEAR(cw.curvature(0.5 * cw.length()), -0.5, 5e-4);
}

TEST(Spline, ObservedOrderOnACircle) {
    // interior error of an interpolating cubic spline falls as h^4; three refinements, the
    // observed order must exceed 3.5 (a second-order error would mean wrong second derivatives)
    const double e1 = middle_error(32), e2 = middle_error(64), e3 = middle_error(128);
    EXPECT_GT(std::log2(e1 / e2), 3.5) << e1 << " " << e2;
    EXPECT_GT(std::log2(e2 / e3), 3.5) << e2 << " " << e3;
}

TEST(Spline, NearestParameterFindsTheFootOfTheNormal) {
    const ParametricSpline spline(circle_arc(90, 1.0, 1.5 * std::numbers::pi));
    for (double angle : {0.3, 1.0, 2.2, 4.0}) {
        // a point 0.05 outside the circle at this angle: the foot is the circle point there
        // (up to the spline's own distance from the circle, under 1e-7 with 90 pieces)
        const Vec2 outside = {1.05 * std::cos(angle), 1.05 * std::sin(angle)};
        const Vec2 foot = spline.position(spline.nearest_parameter(outside));
        EXPECT_NEAR(foot.x, std::cos(angle), 1e-6) << angle;
        EXPECT_NEAR(foot.y, std::sin(angle), 1e-6) << angle;
    }
    // a point on the spline is its own nearest point
    const Vec2 on = spline.position(1.234);
    EXPECT_NEAR(spline.nearest_parameter(on), 1.234, 1e-9);
}

}  // namespace
}  // namespace veer
