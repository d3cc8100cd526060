#include "mesh/wake_spacing.hpp"

#include <algorithm>
#include <cmath>
#include <optional>
#include <vector>

#include "mesh/errors.hpp"
#include "mesh/geometric_stretching.hpp"

namespace veer {
namespace {

/// The first point of the polyline beyond `from` (which lies on segment `seg`) at straight-line
/// distance `step` from it; advances `seg`. None if the polyline ends first.
std::optional<Vec2> point_at_distance(const std::vector<Vec2>& pts, std::size_t& seg, Vec2 from,
                                      double step) {
    for (; seg + 1 < pts.size(); ++seg) {
        const Vec2 a = pts[seg], b = pts[seg + 1];
        if (norm(b - from) < step) continue;
        // |a + t (b - a) - from| = step for the largest t in [0, 1]: a quadratic in t.
        const Vec2 d = b - a, f = a - from;
        const double qa = dot(d, d), qb = 2.0 * dot(d, f), qc = dot(f, f) - step * step;
        const double t = (-qb + std::sqrt(std::max(0.0, qb * qb - 4.0 * qa * qc))) / (2.0 * qa);
        return a + std::clamp(t, 0.0, 1.0) * d;
    }
    return std::nullopt;
}

/// Walks nj - 1 chords first * r^k along the polyline from its start; returns the nodes and
/// whether the last chord to the polyline's end is longer than first * r^(nj-1).
struct Walk {
    std::vector<Vec2> nodes;
    bool short_of_end = false;
};

Walk walk_chords(const std::vector<Vec2>& pts, double first, double ratio) {
    const std::size_t nj = pts.size() - 1;
    Walk w;
    w.nodes.assign(pts.size(), pts.back());
    w.nodes[0] = pts[0];
    std::size_t seg = 0;
    double step = first;
    for (std::size_t j = 1; j < nj; ++j, step *= ratio) {
        const std::optional<Vec2> p = point_at_distance(pts, seg, w.nodes[j - 1], step);
        if (!p) return w;  // ran past the end: the ratio is too large
        w.nodes[j] = *p;
    }
    w.short_of_end = norm(pts.back() - w.nodes[nj - 1]) > step;
    return w;
}

/// Re-places the inner nodes of line i so that consecutive nodes are first, first r, first r^2,
/// ... apart in straight lines, each on the line's marched polyline, the last chord ending on the
/// far-field node: r is found by bisection. Chords rather than arc length because the marched
/// lines turn a little at every node, and arc-length spacing across those corners would make the
/// steps uneven.
void respace_line(StructuredGrid& grid, int i, double first) {
    const int nj = grid.nj();
    std::vector<Vec2> pts(static_cast<std::size_t>(nj + 1));
    double length = 0.0;
    for (int j = 0; j <= nj; ++j) pts[static_cast<std::size_t>(j)] = grid.node(i, j);
    for (int j = 0; j < nj; ++j)
        length += norm(pts[static_cast<std::size_t>(j + 1)] - pts[static_cast<std::size_t>(j)]);
    // Bracket: the arc-length ratio is too small for chords (chords are shorter); twice its log
    // is ample for the slight turning of marched lines.
    double lo = 0.0, hi = 2.0 * std::log(geometric_ratio(first, length, nj));
    VEER_VERIFY(walk_chords(pts, first, std::exp(lo)).short_of_end,
                "open_wake_spacing: the first step is too large for the line");
    for (int it = 0; it < 200 && hi - lo > 1e-15; ++it) {
        const double mid = 0.5 * (lo + hi);
        (walk_chords(pts, first, std::exp(mid)).short_of_end ? lo : hi) = mid;
    }
    const Walk w = walk_chords(pts, first, std::exp(lo));
    for (int j = 1; j < nj; ++j) grid.node(i, j) = w.nodes[static_cast<std::size_t>(j)];
}

double line_length(const StructuredGrid& grid, int i) {
    double length = 0.0;
    for (int j = 0; j < grid.nj(); ++j) length += norm(grid.node(i, j + 1) - grid.node(i, j));
    return length;
}

}  // namespace

void open_wake_spacing(StructuredGrid& grid, int wake, double first_cell, double max_aspect) {
    VEER_VERIFY(wake >= 1 && 2 * wake < grid.ni() && first_cell > 0.0 && max_aspect > 0.0,
                "open_wake_spacing needs a C-grid wake, a first cell and an aspect ratio");
    const int ni = grid.ni();
    for (int i = 0; i < wake; ++i) {
        // Streamwise spacing at the node: the mean of its two wake-cut neighbours (one at the
        // outlet).
        const double ahead = norm(grid.node(i + 1, 0) - grid.node(i, 0));
        const double behind = i > 0 ? norm(grid.node(i, 0) - grid.node(i - 1, 0)) : ahead;
        const double first = 0.5 * (ahead + behind) / max_aspect;
        if (first <= first_cell) continue;
        const double shorter = std::min(line_length(grid, i), line_length(grid, ni - i));
        if (first * grid.nj() >= shorter) continue;  // the cells must still grow outwards
        respace_line(grid, i, first);
        respace_line(grid, ni - i, first);
    }
}

}  // namespace veer
