// The Spalart–Allmaras turbulence index on the wall and the transition position found from it.
#include <gtest/gtest.h>

#include <cmath>
#include <limits>

#include "analytic_flows.hpp"
#include "mesh/grid_metrics.hpp"
#include "postprocess/transition_locator.hpp"
#include "solver/spalart_allmaras_terms.hpp"
#include "test_cgrid.hpp"

namespace veer {
namespace {

constexpr double kappa = SpalartAllmarasConstants::kappa;

/// A smooth step in x from 0 to 1, through 1/2 at x0.
double step(double x, double x0) { return 0.5 * (1.0 + std::tanh((x - x0) / 0.05)); }

/// On an ellipse C-grid, the first two cells off each wall face carry u_t = a d + b d^2 and
/// nu~ = kappa sqrt(nu a) g(x) d + e d^2, with g the step through 1/2 at x 0.4 (upper surface)
/// and x 0.6 (lower surface): the index is g(x) at the wall, exactly for these quadratics.
struct PrescribedWall {
    StructuredGrid grid;
    GridMetrics metrics;
    FlowFields fields;
    std::vector<double> nu_tilde;
    double reynolds = 2.0e5, a = 300.0, b = -900.0, e = 0.7;
    double expected_index(Vec2 x, bool upper) const { return step(x.x, upper ? 0.4 : 0.6); }
};

PrescribedWall prescribed_wall() {
    PrescribedWall w;
    w.grid = test::make_test_cgrid(test::ellipse_surface(256, 0.06), test::TestCGridShape{});
    w.metrics = compute_metrics(w.grid);
    w.fields = test::sample_potential_flow(w.metrics, [](Vec2) { return Vec2{0, 0}; });
    w.nu_tilde.assign(w.fields.u.size(), 0.0);
    const double nu = 1.0 / w.reynolds;
    const WallRange wall = find_wall_faces(w.grid);
    const int le = leading_edge_node(w.grid);
    for (int i = wall.begin; i < wall.end; ++i) {
        const std::size_t face = w.metrics.face_j(i, 0);
        const Vec2 area = w.metrics.area_j[face];
        const Vec2 n = (1.0 / norm(area)) * area, t{n.y, -n.x};
        const Vec2 xf = w.metrics.face_center_j[face];
        for (int j = 0; j < 2; ++j) {
            const std::size_t cell = w.metrics.cell(i, j);
            const double d = dot(w.metrics.centroid[cell] - xf, n);
            const double ut = w.a * d + w.b * d * d;
            w.fields.u[cell] = ut * t.x;
            w.fields.v[cell] = ut * t.y;
            const double g = w.expected_index(xf, i >= le);
            w.nu_tilde[cell] = kappa * std::sqrt(nu * w.a) * g * d + w.e * d * d;
        }
    }
    return w;
}

TEST(TransitionLocator, IndexIsTheWallSlopeOfNuTildeOverKappaUTau) {
    const PrescribedWall w = prescribed_wall();
    const FlowConditions conditions{w.reynolds, 0.0};
    const auto faces =
        evaluate_wall_faces(w.grid, w.metrics, w.fields, conditions, WallPressure::extrapolated);
    const WallTurbulenceIndex index = turbulence_index(w.grid, w.metrics, w.nu_tilde, faces);
    ASSERT_EQ(index.values.size(), faces.size());
    ASSERT_GT(faces.size(), 200u);
    const int le = leading_edge_node(w.grid);
    for (const WallFaceState& f : faces)  // the stencil is exact for quadratics: round-off only
        EXPECT_NEAR(index.at(f.i), w.expected_index(f.center, f.i >= le), 1e-9) << "face " << f.i;
}

TEST(TransitionLocator, FindsTheCrossingOnEachSurface) {
    const PrescribedWall w = prescribed_wall();
    const FlowConditions conditions{w.reynolds, 0.0};
    const auto faces =
        evaluate_wall_faces(w.grid, w.metrics, w.fields, conditions, WallPressure::extrapolated);
    const SurfaceDistribution d = surface_distribution(w.grid, faces, conditions);
    const WallTurbulenceIndex index = turbulence_index(w.grid, w.metrics, w.nu_tilde, faces);
    const TransitionReport r = find_transition(d, index, SurfaceLocation{SurfaceSide::upper, 0.0});
    ASSERT_TRUE(r.upper.has_value());
    ASSERT_TRUE(r.lower.has_value());
    EXPECT_EQ(r.upper->side, SurfaceSide::upper);
    EXPECT_EQ(r.lower->side, SurfaceSide::lower);
    // Linear interpolation of i_t = g between faces about 0.006 chords apart: g'' vanishes at the
    // crossing, so the error is of order h^3 g''' / g', well below 1e-4; 1e-3 leaves a margin.
    EXPECT_NEAR(r.upper->x, 0.4, 1e-3);
    EXPECT_NEAR(r.lower->x, 0.6, 1e-3);
    EXPECT_GT(r.upper->y, 0.0);
    EXPECT_LT(r.lower->y, 0.0);
}

/// n points of arc s = x = (k + 1/2)/n on one surface, face index i = k, with index values f(s).
struct SyntheticSide {
    std::vector<SurfacePoint> points;
    WallTurbulenceIndex index;
};

template <class F>
SyntheticSide synthetic_side(int n, F f) {
    SyntheticSide s;
    for (int k = 0; k < n; ++k) {
        SurfacePoint p;
        p.i = k;
        p.arc = p.x = (k + 0.5) / n;
        p.side = SurfaceSide::upper;
        s.points.push_back(p);
        s.index.values.push_back(f(p.arc));
    }
    return s;
}

TEST(TransitionLocator, SkipsAShortSpikeWhereTheShearVanishes) {
    // A spike over 0.005 chords at a separation (x 0.2), the true rise at 0.5 (linear 0.3 -> 0.9
    // between the faces on either side of it).
    const auto s = synthetic_side(1000, [](double x) {
        if (std::abs(x - 0.2) < 0.0025) return 5.0;
        return x < 0.5 ? 0.1 : 0.9;
    });
    const auto t = find_surface_transition(s.points, s.index, 0.0);
    ASSERT_TRUE(t.has_value());
    // Between the faces at 0.4995 (0.1) and 0.5005 (0.9): 0.1 + 0.8 t = 0.5 at t = 1/2.
    EXPECT_NEAR(t->arc, 0.5, 1e-12);
}

TEST(TransitionLocator, LaminarToTheTrailingEdgeHasNoTransition) {
    const auto s = synthetic_side(200, [](double x) { return 0.3 * x; });
    EXPECT_FALSE(find_surface_transition(s.points, s.index, 0.0).has_value());
}

TEST(TransitionLocator, TurbulentFromTheStartIsTheFirstPointAfterTheStagnationPoint) {
    const auto s = synthetic_side(200, [](double x) { return x < 0.1 ? 0.0 : 1.0; });
    // Starting at 0.3: the first point considered (arc 0.3025) is already turbulent.
    const auto t = find_surface_transition(s.points, s.index, 0.3);
    ASSERT_TRUE(t.has_value());
    EXPECT_DOUBLE_EQ(t->arc, 0.3025);
}

TEST(TransitionLocator, ASurfaceWithNoLaminarPartIsTurbulentFromTheLeadingEdge) {
    // Upper: turbulent from its first face, which lies a little ahead of x = 0 (a cambered nose);
    // lower: a crossing at 0.5, not from the leading edge.
    auto upper = synthetic_side(200, [](double) { return 1.0; });
    auto lower = synthetic_side(200, [](double x) { return x < 0.5 ? 0.0 : 1.0; });
    upper.points.front().x = -0.0002;
    SurfaceDistribution d;
    d.upper = upper.points;
    d.lower = lower.points;
    for (SurfacePoint& p : d.lower) p.i += 200, p.side = SurfaceSide::lower;
    WallTurbulenceIndex index = upper.index;
    index.values.insert(index.values.end(), lower.index.values.begin(), lower.index.values.end());
    const TransitionReport r = find_transition(d, index, SurfaceLocation{SurfaceSide::upper, 0.0});
    ASSERT_TRUE(r.upper && r.lower);
    EXPECT_TRUE(r.upper_from_leading_edge);
    EXPECT_FALSE(r.lower_from_leading_edge);
    EXPECT_EQ(reported_transition_x(*r.upper), 0.0);  // never ahead of the leading edge
    EXPECT_NEAR(reported_transition_x(*r.lower), 0.5, 1e-12);
}

TEST(TransitionLocator, ZeroShearFacesNeverCountAsTurbulent) {
    // NaN (zero wall shear) inside the hold after the rise at 0.5 moves the transition to after it.
    const auto s = synthetic_side(1000, [](double x) {
        if (std::abs(x - 0.51) < 0.0006) return std::numeric_limits<double>::quiet_NaN();
        return x < 0.5 ? 0.0 : 1.0;
    });
    const auto t = find_surface_transition(s.points, s.index, 0.0);
    ASSERT_TRUE(t.has_value());
    EXPECT_GT(t->arc, 0.51);
    EXPECT_LT(t->arc, 0.512);
}

}  // namespace
}  // namespace veer
