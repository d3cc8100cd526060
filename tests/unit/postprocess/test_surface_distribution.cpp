// Cp, Cf and y+ along the surfaces: sides, ordering and the sign of Cf.
#include <gtest/gtest.h>

#include <cmath>

#include "analytic_flows.hpp"
#include "mesh/grid_metrics.hpp"
#include "postprocess/surface_distribution.hpp"
#include "test_cgrid.hpp"

namespace veer {
namespace {

struct EllipseCase {
    StructuredGrid grid;
    GridMetrics metrics;
};

EllipseCase ellipse_case() {
    test::TestCGridShape shape;
    EllipseCase c;
    c.grid = test::make_test_cgrid(test::ellipse_surface(64, 0.1), shape);
    c.metrics = compute_metrics(c.grid);
    return c;
}

TEST(SurfaceDistribution, SidesAreSplitAtTheLeadingEdgeAndRunAft) {
    const EllipseCase c = ellipse_case();
    const FlowFields f = test::sample_potential_flow(c.metrics, [](Vec2) { return Vec2{1, 0}; });
    const SurfaceDistribution d = surface_distribution(c.grid, c.metrics, f, {1000.0, 0.0});
    ASSERT_EQ(d.upper.size(), 32u);
    ASSERT_EQ(d.lower.size(), 32u);
    const int le = leading_edge_node(c.grid);
    for (std::size_t k = 0; k < 32; ++k) {
        EXPECT_GE(d.upper[k].i, le);
        EXPECT_LT(d.lower[k].i, le);
        EXPECT_GT(d.upper[k].y, 0.0);
        EXPECT_LT(d.lower[k].y, 0.0);
        if (k > 0) {
            EXPECT_GT(d.upper[k].arc, d.upper[k - 1].arc);
            EXPECT_GT(d.lower[k].arc, d.lower[k - 1].arc);
            EXPECT_GT(d.upper[k].x, d.upper[k - 1].x);
        }
    }
    // Half the perimeter of the inscribed polygon on each side (round-off).
    EXPECT_NEAR(d.upper_length, d.lower_length, 1e-13);
    EXPECT_GT(d.upper_length, 1.0);
}

TEST(SurfaceDistribution, CfIsPositiveForFlowRunningAftOnBothSides) {
    const EllipseCase c = ellipse_case();
    const FlowConditions conditions{1000.0, 0.0};
    const FlowFields aft = test::sample_potential_flow(c.metrics, [](Vec2) { return Vec2{1, 0}; });
    const FlowFields fwd = test::sample_potential_flow(c.metrics, [](Vec2) { return Vec2{-1, 0}; });
    const SurfaceDistribution a = surface_distribution(c.grid, c.metrics, aft, conditions);
    const SurfaceDistribution b = surface_distribution(c.grid, c.metrics, fwd, conditions);
    for (std::size_t k = 1; k < a.upper.size(); ++k) {  // k = 0 sits at the leading edge
        EXPECT_GT(a.upper[k].cf, 0.0);
        EXPECT_GT(a.lower[k].cf, 0.0);
        EXPECT_LT(b.upper[k].cf, 0.0);
        EXPECT_LT(b.lower[k].cf, 0.0);
        // Bernoulli pressure of the uniform stream is zero: Cp = 0 to round-off.
        EXPECT_NEAR(a.upper[k].cp, 0.0, 1e-14);
    }
}

TEST(SurfaceDistribution, LinearWallProfileGivesItsYPlus) {
    const EllipseCase c = ellipse_case();
    FlowFields f = test::sample_potential_flow(c.metrics, [](Vec2) { return Vec2{0, 0}; });
    const double slope = 40.0, re = 2000.0;
    const WallRange wall = find_wall_faces(c.grid);
    for (int i = wall.begin; i < wall.end; ++i) {
        const Vec2 a = c.metrics.area_j[c.metrics.face_j(i, 0)];
        const Vec2 n = (1.0 / norm(a)) * a, t{n.y, -n.x};
        for (int j = 0; j < 2; ++j) {
            const std::size_t cell = c.metrics.cell(i, j);
            const double d =
                dot(c.metrics.centroid[cell] - c.metrics.face_center_j[c.metrics.face_j(i, 0)], n);
            f.u[cell] = slope * d * t.x;
            f.v[cell] = slope * d * t.y;
        }
    }
    const auto faces =
        evaluate_wall_faces(c.grid, c.metrics, f, {re, 0.0}, WallPressure::first_cell);
    const SurfaceDistribution d = surface_distribution(c.grid, faces, {re, 0.0});
    // u_t = slope d: tau_w = slope / Re, Cf = 2 tau_w with the sign of the +i shear (negative on
    // the lower surface, where +i runs forward), y+ = d1 sqrt(tau_w) Re. Round-off tolerances.
    ASSERT_FALSE(d.upper.empty());
    ASSERT_FALSE(d.lower.empty());
    EXPECT_EQ(d.upper.size() + d.lower.size(), faces.size());
    for (const SurfacePoint& p : d.upper) {
        EXPECT_NEAR(p.cf, 2.0 * slope / re, 1e-12);
        const double d1 = faces[static_cast<std::size_t>(p.i - wall.begin)].first_cell_distance;
        EXPECT_NEAR(p.y_plus, d1 * std::sqrt(slope / re) * re, 1e-9);
    }
    for (const SurfacePoint& p : d.lower) EXPECT_NEAR(p.cf, -2.0 * slope / re, 1e-12);
}

}  // namespace
}  // namespace veer
