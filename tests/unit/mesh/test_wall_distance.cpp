// Wall distance against brute force over every wall face, and on a flat wall.
#include <gtest/gtest.h>

#include <chrono>
#include <cmath>

#include "mesh/cgrid.hpp"
#include "mesh/grid_metrics.hpp"
#include "mesh/wall_distance.hpp"
#include "tests/unit/mesh/cgrid_test_support.hpp"

namespace veer {
namespace {

std::vector<double> brute_force(const StructuredGrid& g, const GridMetrics& m, int first_face,
                                int end_face) {
    std::vector<double> d(m.centroid.size(), 1e300);
    for (std::size_t c = 0; c < d.size(); ++c)
        for (int i = first_face; i < end_face; ++i)
            d[c] = std::min(d[c],
                            point_segment_distance(m.centroid[c], g.node(i, 0), g.node(i + 1, 0)));
    return d;
}

TEST(WallDistance, MatchesBruteForceOnCGrids) {
    for (const char* digits : {"0012", "4412"}) {
        CGridSpec spec;
        spec.around = 128;
        spec.normal = 32;
        spec.wake = 24;
        spec.far_field = 30.0;
        spec.first_cell = 2e-4;
        const StructuredGrid g = generate_cgrid(test::naca_surface(digits, 128), spec);
        const GridMetrics m = compute_metrics(g);
        const std::vector<double> d = wall_distance(g, m);
        const std::vector<double> ref = brute_force(g, m, spec.wake, spec.wake + spec.around);
        ASSERT_EQ(d.size(), ref.size());
        // The index only skips faces that cannot be nearer: the same minimum, bit for bit.
        for (std::size_t c = 0; c < d.size(); ++c) ASSERT_EQ(d[c], ref[c]) << "cell " << c;
        // Near-wall cells: the centroid of the first cell is about half its height off the wall.
        const double first = d[m.cell(spec.wake + 40, 0)];
        EXPECT_NEAR(first, 0.5 * spec.first_cell, 0.05 * spec.first_cell);
    }
}

TEST(WallDistance, FlatWallGivesTheHeight) {
    StructuredGrid g(10, 5);
    for (int j = 0; j <= 5; ++j)
        for (int i = 0; i <= 10; ++i) g.node(i, j) = {0.1 * i, 0.1 * j * j};
    g.segments() = {{Side::j_min, 2, 8, SegmentKind::wall, "wall"}};
    const GridMetrics m = compute_metrics(g);
    const std::vector<double> d = wall_distance(g, m);
    for (int j = 0; j < 5; ++j)
        for (int i = 2; i < 8; ++i) {
            // Above the wall the distance is the centroid height (round-off only).
            EXPECT_NEAR(d[m.cell(i, j)], m.centroid[m.cell(i, j)].y, 1e-15);
        }
    // Beyond the wall's end the nearest point is the end node (0.8, 0).
    const Vec2 c = m.centroid[m.cell(9, 2)];
    EXPECT_NEAR(d[m.cell(9, 2)], norm(c - Vec2{0.8, 0.0}), 1e-15);
}

TEST(WallDistance, HundredThousandCellsIsFast) {
    CGridSpec spec;
    spec.around = 512;
    spec.normal = 144;
    spec.wake = 96;
    spec.far_field = 30.0;
    spec.first_cell = 2e-4;
    const StructuredGrid g = generate_cgrid(test::naca_surface("0012", 512), spec);
    const GridMetrics m = compute_metrics(g);
    const auto start = std::chrono::steady_clock::now();
    const std::vector<double> d = wall_distance(g, m);
    const double seconds =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    EXPECT_GE(d.size(), 100000u);
    // Requirement: well under a second for 1e5 cells; measured in the tens of milliseconds.
    EXPECT_LT(seconds, 1.0);
}

TEST(WallDistance, NeedsAWall) {
    StructuredGrid g(4, 4);
    EXPECT_THROW((void)wall_distance(g, compute_metrics(g)), InputError);
}

}  // namespace
}  // namespace veer
