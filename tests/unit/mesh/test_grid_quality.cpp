// Grid quality figures on generated grids and on grids spoiled on purpose.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

#include "mesh/cgrid.hpp"
#include "mesh/grid_quality.hpp"
#include "tests/unit/mesh/cgrid_test_support.hpp"

namespace veer {
namespace {

CGridSpec spec_for(int around, int normal) {
    CGridSpec spec;
    spec.around = around;
    spec.normal = normal;
    spec.wake = 3 * around / 16;
    spec.far_field = 30.0;
    spec.first_cell = 2e-4;
    return spec;
}

TEST(GridQuality, FiguresOfAGeneratedGrid) {
    const CGridSpec spec = spec_for(256, 64);
    const StructuredGrid g = generate_cgrid(test::naca_surface("4412", 256), spec);
    const GridQuality q = assess_quality(g, 1.2);
    EXPECT_EQ(q.ni, 256 + 2 * 48);
    EXPECT_EQ(q.nj, 64);
    EXPECT_EQ(q.cell_count, q.ni * q.nj);
    EXPECT_GT(q.min_cell_area, 0.0);
    // Heights and steps are set exactly by the generator: round-off only.
    EXPECT_NEAR(q.first_cell_min, 2e-4, 1e-12);
    EXPECT_NEAR(q.first_cell_median, 2e-4, 1e-12);
    EXPECT_NEAR(q.first_cell_max, 2e-4, 1e-12);
    EXPECT_NEAR(q.max_growth_ratio, normal_growth_ratio(spec), 1e-9);
    EXPECT_LT(q.wall_non_orthogonality, 1e-6);  // exact normals on the first layer
    // The trailing-edge lines bisect the corner: perpendicular to the chord across it.
    EXPECT_LT(q.trailing_edge_non_orthogonality, 1e-6);
    EXPECT_GT(q.max_aspect_ratio, 1.0);
    EXPECT_GT(q.far_field_distance, 0.8 * spec.far_field);
    EXPECT_LE(q.far_field_distance, spec.far_field + 1e-9);
    EXPECT_TRUE(q.warnings.empty());  // r = 1.172 is below the cap 1.2
}

TEST(GridQuality, GrowthAboveTheCapIsWarnedWithTheNormalThatKeepsIt) {
    const CGridSpec spec = spec_for(128, 32);
    const StructuredGrid g = generate_cgrid(test::naca_surface("0012", 128), spec);
    const GridQuality q = assess_quality(g, 1.25);
    ASSERT_EQ(q.warnings.size(), 1u);
    const int keep = normal_cells_for_growth(q.first_cell_median, q.far_field_distance, 1.25);
    EXPECT_NE(q.warnings[0].find("normal = " + std::to_string(keep)), std::string::npos)
        << q.warnings[0];
    EXPECT_NE(q.warnings[0].find("max_growth"), std::string::npos);
}

TEST(GridQuality, TiltedFirstLineIsMeasured) {
    const CGridSpec spec = spec_for(128, 64);
    StructuredGrid g = generate_cgrid(test::naca_surface("0012", 128), spec);
    // Tilt the first j line at a mid-chord wall node by 10 degrees about the wall node.
    const int i = spec.wake + 32;
    const Vec2 base = g.node(i, 0), line = g.node(i, 1) - base;
    const double a = 10.0 * std::numbers::pi / 180.0;
    g.node(i, 1) = base + Vec2{std::cos(a) * line.x - std::sin(a) * line.y,
                               std::sin(a) * line.x + std::cos(a) * line.y};
    const GridQuality q = assess_quality(g);
    // The node was exactly normal before; the rotation is exact to round-off.
    EXPECT_NEAR(q.wall_non_orthogonality, 10.0, 1e-9);
}

TEST(GridQuality, FoldedGridIsWarned) {
    const CGridSpec spec = spec_for(128, 64);
    StructuredGrid g = generate_cgrid(test::naca_surface("0012", 128), spec);
    std::swap(g.node(100, 30), g.node(101, 30));  // two nodes exchanged: cells turn inside out
    const GridQuality q = assess_quality(g);
    EXPECT_LT(q.min_cell_area, 0.0);
    ASSERT_FALSE(q.warnings.empty());
    EXPECT_NE(q.warnings[0].find("folded"), std::string::npos);
}

TEST(GridQuality, NeedsACGrid) {
    StructuredGrid g(4, 4);
    EXPECT_THROW((void)assess_quality(g), InputError);
}

}  // namespace
}  // namespace veer
