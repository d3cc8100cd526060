// Green-Gauss vorticity: exact cases on affine grids, the wall, and the wake cut as connectivity.
#include <gtest/gtest.h>

#include <cmath>

#include "mesh/grid_metrics.hpp"
#include "postprocess/vorticity.hpp"

namespace veer {
namespace {

// Stretched rectilinear grid mapped by a shear (an affine map): face centres lie on the segment
// joining neighbouring centroids, so linear interpolation, and Green-Gauss, are exact for linear
// velocity fields.
StructuredGrid sheared_grid(int ni, int nj) {
    StructuredGrid g(ni, nj);
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i) {
            const double x = std::pow(static_cast<double>(i) / ni, 1.4);
            const double y = 0.5 * std::pow(static_cast<double>(j) / nj, 1.8);
            g.node(i, j) = {x + 0.3 * y, y - 0.1 * x};
        }
    return g;
}

// u = -omega/2 y, v = omega/2 x (solid-body rotation, vorticity omega) plus a uniform stream.
FlowFields rotation(const GridMetrics& m, double omega) {
    FlowFields f;
    f.ni = m.ni;
    f.nj = m.nj;
    for (const Vec2& c : m.centroid) {
        f.u.push_back(1.0 - 0.5 * omega * c.y);
        f.v.push_back(0.25 + 0.5 * omega * c.x);
    }
    return f;
}

TEST(Vorticity, SolidBodyRotationIsExactAwayFromBoundaries) {
    const StructuredGrid g = sheared_grid(12, 9);
    const GridMetrics m = compute_metrics(g);
    const auto w = compute_vorticity(g, m, rotation(m, 3.0));
    // Exact in exact arithmetic; 1e-11 leaves room for round-off of O(1) sums over cells of
    // area ~1e-3.
    for (int j = 1; j < 8; ++j)
        for (int i = 1; i < 11; ++i) EXPECT_NEAR(w[m.cell(i, j)], 3.0, 1e-11) << i << "," << j;
}

TEST(Vorticity, WallShearLayerGivesMinusTheShearRate) {
    StructuredGrid g(6, 5);
    for (int j = 0; j <= 5; ++j)
        for (int i = 0; i <= 6; ++i) g.node(i, j) = {0.2 * i, 0.01 * j * j};
    g.segments().push_back({Side::j_min, 0, 6, SegmentKind::wall, "wall"});
    const GridMetrics m = compute_metrics(g);
    FlowFields f;
    f.ni = 6;
    f.nj = 5;
    for (const Vec2& c : m.centroid) {
        f.u.push_back(2.5 * c.y);  // u = a y: vorticity -a, and u = 0 on the wall itself
        f.v.push_back(0.0);
    }
    const auto w = compute_vorticity(g, m, f);
    // u is linear and vanishes on the wall, so the no-slip face value is exact: round-off only.
    // The top row meets the far field (zero-gradient face value), which is first order: skipped.
    for (int j = 0; j < 4; ++j)
        for (int i = 0; i < 6; ++i) EXPECT_NEAR(w[m.cell(i, j)], -2.5, 1e-12) << i << "," << j;
}

// A C-shaped block whose whole j = 0 line is a wake cut: z = zeta^2 folds the lower half-plane
// edge eta = 0 onto the positive x axis, so cell i at j = 0 faces cell ni-1-i across the cut.
StructuredGrid folded_grid(int ni, int nj, SegmentKind j0_kind) {
    StructuredGrid g(ni, nj);
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i) {
            const double xi = -1.0 + 2.0 * i / ni, eta = 0.05 + 1.0 * j / nj;
            g.node(i, j) = {xi * xi - eta * eta + 0.05 * 0.05, 2.0 * xi * (eta - 0.05)};
        }
    g.segments().push_back({Side::j_min, 0, ni, j0_kind, "cut"});
    return g;
}

double max_error_in_row(const std::vector<double>& w, const GridMetrics& m, int j, double exact) {
    double e = 0.0;
    for (int i = 2; i < m.ni - 2; ++i) e = std::max(e, std::abs(w[m.cell(i, j)] - exact));
    return e;
}

TEST(Vorticity, WakeCutIsConnectivityNotABoundary) {
    const StructuredGrid cut = folded_grid(40, 20, SegmentKind::wake_cut);
    const GridMetrics m = compute_metrics(cut);
    const FlowFields f = rotation(m, 1.0);
    const auto w = compute_vorticity(cut, m, f);
    const double at_cut = max_error_in_row(w, m, 0, 1.0);
    const double inside = max_error_in_row(w, m, 1, 1.0);
    // Across the cut the stencil is the interior one, so the first row is as accurate as the
    // second (same second-order truncation on this curved grid; factor 2 for the row-to-row change
    // in cell shape).
    EXPECT_LT(at_cut, 2.0 * inside + 1e-12) << at_cut << " vs " << inside;
    // Treated as an open boundary the same row is far worse: this shows the mirror is used.
    const StructuredGrid open = folded_grid(40, 20, SegmentKind::far_field);
    const auto w_open = compute_vorticity(open, m, f);
    EXPECT_GT(max_error_in_row(w_open, m, 0, 1.0), 10.0 * at_cut);
}

}  // namespace
}  // namespace veer
