/// The point-vortex far-field correction (Thomas & Salas 1986, AIAA J. 24(7), 1074-1080): the
/// induced velocity carries the circulation it is given, turns clockwise for positive lift and
/// decays as 1/r.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

#include "solver/far_field_vortex.hpp"

namespace veer {
namespace {

TEST(PointVortex, ClockwiseCirculationOnAnyCircleEqualsGamma) {
    const Vec2 c{0.25, 0.0};
    const double gamma = 0.37;
    for (double r : {1.0, 10.0}) {
        // Clockwise line integral of u . dl by the midpoint rule on 720 arcs (exact for this
        // integrand up to round-off, since |u| is constant on the circle).
        double circulation = 0.0;
        const int n = 720;
        for (int k = 0; k < n; ++k) {
            const double t = -2.0 * std::numbers::pi * (k + 0.5) / n;  // clockwise
            const Vec2 x{c.x + r * std::cos(t), c.y + r * std::sin(t)};
            const Vec2 dl{r * std::sin(t) * 2.0 * std::numbers::pi / n,
                          -r * std::cos(t) * 2.0 * std::numbers::pi / n};
            circulation += dot(point_vortex_velocity(x, c, gamma), dl);
        }
        EXPECT_NEAR(circulation, gamma, 1e-12) << "r = " << r;
    }
}

TEST(PointVortex, PositiveLiftSpeedsTheFlowAboveAndDecaysAsOneOverR) {
    const Vec2 c{0.25, 0.0};
    const Vec2 above = point_vortex_velocity({0.25, 2.0}, c, 1.0);
    EXPECT_GT(above.x, 0.0);  // faster over the upper side: lift up in a stream from the left
    EXPECT_NEAR(above.y, 0.0, 1e-15);
    const Vec2 far = point_vortex_velocity({0.25, 20.0}, c, 1.0);
    EXPECT_NEAR(far.x * 20.0, above.x * 2.0, 1e-14);
    EXPECT_NEAR(above.x, 1.0 / (2.0 * std::numbers::pi * 2.0), 1e-15);
}

TEST(PointVortex, NoVelocityAtTheCentre) {
    const Vec2 u = point_vortex_velocity({0.25, 0.0}, {0.25, 0.0}, 1.0);
    EXPECT_EQ(u.x, 0.0);
    EXPECT_EQ(u.y, 0.0);
}

}  // namespace
}  // namespace veer
