// Finite-volume metrics of shapes with known answers.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

#include "mesh/cgrid.hpp"
#include "mesh/grid_metrics.hpp"
#include "tests/unit/mesh/cgrid_test_support.hpp"

namespace veer {
namespace {

StructuredGrid unit_square(int n) {
    StructuredGrid g(n, n);
    for (int j = 0; j <= n; ++j)
        for (int i = 0; i <= n; ++i)
            g.node(i, j) = {static_cast<double>(i) / n, static_cast<double>(j) / n};
    return g;
}

/// Quarter annulus 1 <= r <= 2, 0 <= theta <= pi/2; i along theta, j along r (right-handed).
StructuredGrid annulus_sector(int ni, int nj) {
    StructuredGrid g(ni, nj);
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i) {
            const double r = 2.0 - static_cast<double>(j) / nj;
            const double t = 0.5 * std::numbers::pi * i / ni;
            g.node(i, j) = {r * std::cos(t), r * std::sin(t)};
        }
    return g;
}

TEST(GridMetrics, UnitSquareCells) {
    const int n = 8;
    const GridMetrics m = compute_metrics(unit_square(n));
    const double h = 1.0 / n;
    for (int j = 0; j < n; ++j)
        for (int i = 0; i < n; ++i) {
            // Exact in binary: h = 1/8.
            EXPECT_DOUBLE_EQ(m.volume[m.cell(i, j)], h * h);
            EXPECT_DOUBLE_EQ(m.centroid[m.cell(i, j)].x, (i + 0.5) * h);
            EXPECT_DOUBLE_EQ(m.centroid[m.cell(i, j)].y, (j + 0.5) * h);
        }
    for (int j = 0; j < n; ++j)
        for (int fi = 0; fi <= n; ++fi) {
            EXPECT_DOUBLE_EQ(m.area_i[m.face_i(fi, j)].x, h);  // towards +i = +x
            EXPECT_DOUBLE_EQ(m.area_i[m.face_i(fi, j)].y, 0.0);
        }
    for (int fj = 0; fj <= n; ++fj)
        for (int i = 0; i < n; ++i) {
            EXPECT_DOUBLE_EQ(m.area_j[m.face_j(i, fj)].x, 0.0);
            EXPECT_DOUBLE_EQ(m.area_j[m.face_j(i, fj)].y, h);  // towards +j = +y
            EXPECT_DOUBLE_EQ(m.face_center_j[m.face_j(i, fj)].x, (i + 0.5) * h);
        }
}

TEST(GridMetrics, AnnulusSectorAreaConverges) {
    const double exact = 0.25 * std::numbers::pi * (4.0 - 1.0);
    double previous_error = 0.0;
    for (int n : {8, 16, 32}) {
        const StructuredGrid g = annulus_sector(n, n / 2);
        const GridMetrics m = compute_metrics(g);
        double total = 0.0;
        for (double v : m.volume) {
            ASSERT_GT(v, 0.0);
            total += v;
        }
        // Straight-edged cells: the sum is the inscribed polygon's area, below the exact one
        // by a second-order chord error.
        const double error = exact - total;
        EXPECT_GT(error, 0.0);
        if (previous_error > 0.0) {
            EXPECT_NEAR(previous_error / error, 4.0, 0.05);
        }
        previous_error = error;
    }
}

/// Sum of outward face area vectors of every cell: zero for any closed quadrilateral.
void expect_cells_closed(const StructuredGrid& g, double scale) {
    const GridMetrics m = compute_metrics(g);
    for (int j = 0; j < g.nj(); ++j)
        for (int i = 0; i < g.ni(); ++i) {
            const Vec2 sum = (m.area_i[m.face_i(i + 1, j)] - m.area_i[m.face_i(i, j)]) +
                             (m.area_j[m.face_j(i, j + 1)] - m.area_j[m.face_j(i, j)]);
            // Round-off of differences of node coordinates of size `scale`.
            ASSERT_NEAR(sum.x, 0.0, 1e-14 * scale) << i << "," << j;
            ASSERT_NEAR(sum.y, 0.0, 1e-14 * scale) << i << "," << j;
        }
}

TEST(GridMetrics, FaceAreasCloseEveryCell) {
    expect_cells_closed(annulus_sector(16, 8), 2.0);
    CGridSpec spec;
    spec.around = 128;
    spec.normal = 32;
    spec.wake = 24;
    spec.far_field = 30.0;
    spec.first_cell = 2e-4;
    expect_cells_closed(generate_cgrid(test::naca_surface("4412", 128), spec), 31.0);
}

TEST(GridMetrics, CentroidOfAKnownQuad) {
    // Trapezoid (0,0), (2,0), (1,1), (0,1): area 1.5, centroid (7/9, 4/9) by the polygon formula.
    StructuredGrid g(1, 1);
    g.node(0, 0) = {0, 0};
    g.node(1, 0) = {2, 0};
    g.node(1, 1) = {1, 1};
    g.node(0, 1) = {0, 1};
    const GridMetrics m = compute_metrics(g);
    EXPECT_DOUBLE_EQ(m.volume[0], 1.5);
    EXPECT_NEAR(m.centroid[0].x, 7.0 / 9.0, 1e-15);
    EXPECT_NEAR(m.centroid[0].y, 4.0 / 9.0, 1e-15);
}

}  // namespace
}  // namespace veer
