#include "postprocess/cell_gradients.hpp"

#include <array>

namespace veer {

namespace {

/// True where cell (i, 0) faces the wake cut rather than the wall.
bool on_wake_cut(const StructuredGrid& grid, int i) {
    if (!grid.c_layout()) return false;
    const CGridLayout& c = *grid.c_layout();
    return i < c.wake || i >= c.wake + c.around;
}

}  // namespace

Vec2 least_squares_gradient(const StructuredGrid& grid, const GridMetrics& m,
                            const std::vector<double>& q, int i, int j) {
    const int ni = grid.ni(), nj = grid.nj();
    std::array<std::size_t, 4> nb{};
    int count = 0;
    // An O-grid is closed across its seam: cell 0 and cell ni - 1 are neighbours.
    const bool closed = grid.c_layout() && grid.c_layout()->closed();
    if (i > 0 || closed) nb[static_cast<std::size_t>(count++)] = m.cell(i > 0 ? i - 1 : ni - 1, j);
    if (i < ni - 1 || closed)
        nb[static_cast<std::size_t>(count++)] = m.cell(i < ni - 1 ? i + 1 : 0, j);
    if (j < nj - 1) nb[static_cast<std::size_t>(count++)] = m.cell(i, j + 1);
    if (j > 0)
        nb[static_cast<std::size_t>(count++)] = m.cell(i, j - 1);
    else if (on_wake_cut(grid, i))
        nb[static_cast<std::size_t>(count++)] = m.cell(ni - 1 - i, 0);
    const std::size_t c = m.cell(i, j);
    double axx = 0.0, axy = 0.0, ayy = 0.0, bx = 0.0, by = 0.0;
    for (int k = 0; k < count; ++k) {
        const std::size_t n = nb[static_cast<std::size_t>(k)];
        const Vec2 d = m.centroid[n] - m.centroid[c];
        const double w = 1.0 / dot(d, d), dq = q[n] - q[c];
        axx += w * d.x * d.x;
        axy += w * d.x * d.y;
        ayy += w * d.y * d.y;
        bx += w * d.x * dq;
        by += w * d.y * dq;
    }
    const double det = axx * ayy - axy * axy;
    VEER_VERIFY(det > 0.0, "least-squares gradient: neighbours are collinear");
    return {(ayy * bx - axy * by) / det, (axx * by - axy * bx) / det};
}

}  // namespace veer
