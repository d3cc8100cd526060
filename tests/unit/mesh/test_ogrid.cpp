// The circle as a section and its O-grid, against measures computed here from the nodes (not
// by the code under test): closure across the seam, the C-grid's wall-spacing rule, symmetry,
// the quality report and the errors.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>
#include <string>

#include "mesh/cgrid.hpp"
#include "mesh/circle.hpp"
#include "mesh/errors.hpp"
#include "mesh/grid_metrics.hpp"
#include "mesh/grid_quality.hpp"
#include "mesh/ogrid.hpp"

namespace veer {
namespace {

CGridSpec circle_spec(int around, int normal) {
    CGridSpec spec;
    spec.around = around;
    spec.normal = normal;
    spec.far_field = 60.0;
    spec.first_cell = 5e-3;
    return spec;
}

TEST(CircleSurface, NodesOnTheCircleOrderedAsASection) {
    const int around = 64;
    const std::vector<Vec2> s = circle_surface(around);
    ASSERT_EQ(s.size(), 65u);
    EXPECT_EQ(s.front().x, 1.0);
    EXPECT_EQ(s.front().y, 0.0);
    EXPECT_EQ(s.back().x, 1.0);
    EXPECT_EQ(s[32].x, 0.0);  // the front point is node around / 2
    EXPECT_EQ(s[32].y, 0.0);
    for (int k = 0; k <= around; ++k) {
        const Vec2 p = s[static_cast<std::size_t>(k)];
        EXPECT_NEAR(std::hypot(p.x - 0.5, p.y), 0.5, 1e-15) << k;
        // Clockwise from the rear: the lower half first, the upper half its exact mirror.
        if (k > 0 && k < around / 2) {
            EXPECT_LT(p.y, 0.0) << k;
        }
        const Vec2 m = s[static_cast<std::size_t>(around - k)];
        EXPECT_EQ(m.x, p.x) << k;
        EXPECT_EQ(m.y, -p.y) << k;
    }
    // Equal angles: every chord has the same length.
    const double chord = std::hypot(s[1].x - s[0].x, s[1].y - s[0].y);
    for (int k = 0; k < around; ++k)
        EXPECT_NEAR(
            std::hypot(s[static_cast<std::size_t>(k + 1)].x - s[static_cast<std::size_t>(k)].x,
                       s[static_cast<std::size_t>(k + 1)].y - s[static_cast<std::size_t>(k)].y),
            chord, 1e-14);
    EXPECT_THROW(circle_surface(63), InputError);
    EXPECT_THROW(circle_surface(8), InputError);
}

TEST(CircleSurface, AnglesFromTheRearPoint) {
    EXPECT_NEAR(angle_from_rear_deg({1.0, 0.0}), 0.0, 1e-12);
    EXPECT_NEAR(angle_from_rear_deg({0.0, 0.0}), 180.0, 1e-12);
    EXPECT_NEAR(angle_from_rear_deg({0.5, 0.5}), 90.0, 1e-12);
    EXPECT_NEAR(angle_from_rear_deg({0.5, -0.5}), 90.0, 1e-12);  // both halves alike
    EXPECT_NEAR(angle_from_rear_deg({0.5 + 0.25, 0.25 * std::sqrt(3.0)}), 60.0, 1e-12);
}

TEST(OGrid, ClosedAcrossTheSeamWithTheWallSpacingRule) {
    const CGridSpec spec = circle_spec(64, 48);
    const StructuredGrid g = generate_ogrid(circle_surface(64), spec);
    ASSERT_EQ(g.ni(), 64);
    ASSERT_EQ(g.nj(), 48);
    ASSERT_TRUE(g.c_layout().has_value());
    EXPECT_TRUE(g.c_layout()->closed());
    EXPECT_EQ(g.c_layout()->around, 64);
    const double r = normal_growth_ratio(spec);
    for (int i = 0; i <= g.ni(); ++i) {
        // The seam: the last i line is the first one, node for node.
        for (int j = 0; j <= g.nj(); ++j) {
            EXPECT_EQ(g.node(g.ni(), j).x, g.node(0, j).x);
            EXPECT_EQ(g.node(g.ni(), j).y, g.node(0, j).y);
        }
        // Radial lines of the circle with steps first_cell r^j.
        double step = spec.first_cell;
        for (int j = 0; j < g.nj(); ++j) {
            const Vec2 a = g.node(i, j), b = g.node(i, j + 1);
            EXPECT_NEAR(std::hypot(b.x - a.x, b.y - a.y), step, 1e-12 * (1.0 + step)) << i << j;
            const double ra = std::hypot(a.x - 0.5, a.y), rb = std::hypot(b.x - 0.5, b.y);
            EXPECT_NEAR(rb - ra, step, 1e-11 * (1.0 + step)) << "not radial at " << i << ", " << j;
            step *= r;
        }
        const Vec2 far = g.node(i, g.nj());
        EXPECT_NEAR(std::hypot(far.x - 0.5, far.y), 0.5 + spec.far_field, 1e-9);
    }
    // Mirror symmetry to the last bit.
    for (int j = 0; j <= g.nj(); ++j)
        for (int i = 0; i <= g.ni(); ++i) {
            EXPECT_EQ(g.node(g.ni() - i, j).x, g.node(i, j).x);
            EXPECT_EQ(g.node(g.ni() - i, j).y, -g.node(i, j).y);
        }
    const GridMetrics m = compute_metrics(g);
    double total = 0.0;
    for (double v : m.volume) {
        ASSERT_GT(v, 0.0);
        total += v;
    }
    // The polygons' annulus: n/2 sin(2 pi/n) (R^2 - r^2), n = 64 sides.
    const double R = 0.5 + spec.far_field, polygon = 32.0 * std::sin(2.0 * std::numbers::pi / 64.0);
    EXPECT_NEAR(total, polygon * (R * R - 0.25), 1e-9 * total);
}

TEST(OGrid, SegmentsNameTheSeamAsPeriodic) {
    const StructuredGrid g = generate_ogrid(circle_surface(32), circle_spec(32, 16));
    int periodic = 0, wall = 0, far = 0;
    for (const BoundarySegment& s : g.segments()) {
        if (s.kind == SegmentKind::periodic) {
            ++periodic;
            EXPECT_TRUE(s.side == Side::i_min || s.side == Side::i_max);
            EXPECT_EQ(s.end - s.begin, 16);
        }
        if (s.kind == SegmentKind::wall) {
            ++wall;
            EXPECT_EQ(s.side, Side::j_min);
            EXPECT_EQ(s.end - s.begin, 32);
        }
        if (s.kind == SegmentKind::far_field) ++far;
        EXPECT_NE(s.kind, SegmentKind::wake_cut);
    }
    EXPECT_EQ(periodic, 2);
    EXPECT_EQ(wall, 1);
    EXPECT_EQ(far, 1);
}

TEST(OGrid, QualityReportLikeTheCGrids) {
    const CGridSpec spec = circle_spec(128, 96);
    const StructuredGrid g = generate_ogrid(circle_surface(128), spec);
    const GridQuality q = assess_quality(g, spec.max_growth);
    EXPECT_EQ(q.cell_count, 128 * 96);
    EXPECT_LT(q.wall_non_orthogonality, 1e-6);  // radial lines on a circle
    EXPECT_EQ(q.trailing_edge_non_orthogonality, 0.0);
    EXPECT_NEAR(q.first_cell_min, spec.first_cell, 1e-12);
    EXPECT_NEAR(q.first_cell_max, spec.first_cell, 1e-12);
    EXPECT_NEAR(q.max_growth_ratio, normal_growth_ratio(spec), 1e-9);
    EXPECT_NEAR(q.far_field_distance, spec.far_field, 1e-9);
    EXPECT_TRUE(q.warnings.empty());
    // Too few normal cells for the cap: the C-grid's warning, naming the normal that keeps it.
    const CGridSpec steep = circle_spec(128, 24);
    const GridQuality w = assess_quality(generate_ogrid(circle_surface(128), steep), 1.2);
    ASSERT_EQ(w.warnings.size(), 1u);
    EXPECT_NE(w.warnings[0].find("normal = "), std::string::npos) << w.warnings[0];
}

TEST(OGrid, BadInputNamesTheKeyOrTheFold) {
    CGridSpec spec = circle_spec(64, 32);
    spec.first_cell = 0.0;
    EXPECT_THROW(generate_ogrid(circle_surface(64), spec), InputError);
    spec = circle_spec(64, 32);
    EXPECT_THROW(generate_ogrid(circle_surface(32), spec), InputError);  // node count
    // A concave outline (a circle with a dent) folds: the lines off the dent cross.
    std::vector<Vec2> dented = circle_surface(64);
    for (int k = 12; k <= 20; ++k) {
        Vec2& p = dented[static_cast<std::size_t>(k)];
        p = {0.5 + 0.2 * (p.x - 0.5), 0.2 * p.y};
    }
    spec.first_cell = 0.05;
    try {
        generate_ogrid(dented, spec);
        FAIL() << "a folded O-grid was returned";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("folds"), std::string::npos) << e.what();
    }
}

}  // namespace
}  // namespace veer
