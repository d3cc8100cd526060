// Wake profiles: exact integrals of linear fields, convergence on a vortex flow, turning sign.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

#include "analytic_flows.hpp"
#include "mesh/grid_metrics.hpp"
#include "postprocess/wake_profiles.hpp"
#include "test_cgrid.hpp"

namespace veer {
namespace {

struct Case {
    StructuredGrid grid;
    GridMetrics metrics;
};

Case ellipse_case(int level) {
    test::TestCGridShape shape;
    shape.wake = 16 << level;
    shape.nj = 16 << level;
    Case c;
    c.grid = test::make_test_cgrid(test::ellipse_surface(32 << level, 0.1), shape);
    c.metrics = compute_metrics(c.grid);
    return c;
}

TEST(WakeProfiles, LinearVerticalVelocityIntegratesExactly) {
    const Case c = ellipse_case(1);
    const double a = -0.05, b = 0.02, s = 0.03;
    FlowFields f = test::sample_potential_flow(c.metrics, [&](Vec2 p) {
        return Vec2{1.0, a + b * p.x + s * p.y};
    });
    const WakeProfileOptions options{{0.25, 1.0, 3.0}, 0.8};
    const auto profiles = wake_profiles(c.grid, c.metrics, f, {1000.0, 2.0}, options);
    ASSERT_EQ(profiles.size(), 3u);
    for (const WakeProfile& p : profiles) {
        // Along-row interpolation and the trapezoid rule are exact for fields linear in x and y
        // (u = 1 makes u v linear): round-off tolerances. The wake line is y = 0.
        const double v_mid = a + b * p.x;
        EXPECT_NEAR(p.x, 1.0 + p.station, 1e-14);
        EXPECT_NEAR(p.samples.front().y, -0.8, 1e-14);
        EXPECT_NEAR(p.samples.back().y, 0.8, 1e-14);
        EXPECT_NEAR(p.vertical_momentum_flux, 1.6 * v_mid, 1e-13);
        // Normal to the free stream at 2 degrees: -int u (v cos a - u sin a) dy.
        const double a_rad = 2.0 * std::numbers::pi / 180.0;
        EXPECT_NEAR(p.downward_momentum_flux, -1.6 * (v_mid * std::cos(a_rad) - std::sin(a_rad)),
                    1e-13);
        EXPECT_NEAR(p.mass_flux, 1.6, 1e-13);
        const double angle = std::atan2(1.6 * v_mid, 1.6) * 180.0 / std::numbers::pi;
        EXPECT_NEAR(p.mean_flow_angle_deg, angle, 1e-11);
        EXPECT_NEAR(p.turning_deg, angle - 2.0, 1e-11);
        for (const WakeSample& w : p.samples) {
            EXPECT_NEAR(w.v, a + b * p.x + s * w.y, 1e-13);
            EXPECT_NEAR(w.flow_angle_deg, std::atan2(w.v, 1.0) * 180.0 / std::numbers::pi, 1e-11);
        }
        EXPECT_GE(p.samples.size(), 10u);  // one sample per centroid row inside the band
    }
}

/// int u v dy on x = X, |y| <= h for the uniform stream plus a clockwise vortex at (0.25, 0):
/// composite Simpson with 20000 intervals (error far below the grid's).
double vortex_flux(double gamma, double x_line, double h) {
    const auto flow = test::uniform_plus_vortex(0.0, gamma, {0.25, 0.0});
    const int n = 20000;
    double sum = 0.0;
    for (int k = 0; k <= n; ++k) {
        const double y = -h + 2.0 * h * k / n;
        const Vec2 u = flow({x_line, y});
        const double w = (k == 0 || k == n) ? 1.0 : (k % 2 ? 4.0 : 2.0);
        sum += w * u.x * u.y;
    }
    return sum * (2.0 * h / n) / 3.0;
}

TEST(WakeProfiles, VortexFlowFluxConvergesAtSecondOrderAndPointsDown) {
    const double gamma = 0.3;
    // The station sits on a wake node of the coarsest grid, hence of every grid: the line then
    // cuts each row at the same relative place between two centroids on every level, so the
    // interpolation error falls cleanly by 4 (elsewhere its factor depends on that place).
    const test::TestCGridShape shape;
    const double station = shape.wake_length * test::stretch(0.5, shape.wake_stretch);
    const WakeProfileOptions options{{station}, 1.0};
    const double exact = vortex_flux(gamma, 1.0 + station, 1.0);
    double error[3];
    for (int level = 0; level < 3; ++level) {
        const Case c = ellipse_case(level);
        const FlowFields f = test::sample_potential_flow(
            c.metrics, test::uniform_plus_vortex(0.0, gamma, {0.25, 0.0}));
        const WakeProfile p = wake_profiles(c.grid, c.metrics, f, {1000.0, 0.0}, options).front();
        error[level] = std::abs(p.vertical_momentum_flux - exact);
        EXPECT_GT(p.downward_momentum_flux, 0.0);  // a lifting vortex turns the stream down
        EXPECT_GT(p.downwash_deg, 0.0);
    }
    // Linear interpolation along rows and the trapezoid rule are both second order; measured
    // errors 1.26e-4, 3.15e-5, 7.89e-6 (orders 2.00, 2.00), so 1.8 leaves room only for a small
    // higher-order remainder.
    EXPECT_GT(std::log2(error[0] / error[1]), 1.8) << error[0] << " " << error[1];
    EXPECT_GT(std::log2(error[1] / error[2]), 1.8) << error[1] << " " << error[2];
}

TEST(WakeProfiles, RejectsStationsOffTheGrid) {
    const Case c = ellipse_case(0);
    const FlowFields f = test::sample_potential_flow(c.metrics, [](Vec2) { return Vec2{1, 0}; });
    EXPECT_THROW(wake_profiles(c.grid, c.metrics, f, {1000.0, 0.0}, {{-1.0}, 1.0}), InputError);
    EXPECT_THROW(wake_profiles(c.grid, c.metrics, f, {1000.0, 0.0}, {{1.0}, 0.0}), InputError);
    EXPECT_THROW(wake_profiles(c.grid, c.metrics, f, {1000.0, 0.0}, {{50.0}, 1.0}), InputError);
}

}  // namespace
}  // namespace veer
