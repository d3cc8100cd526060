#include "mesh/grid_quality.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numbers>
#include <sstream>

#include "mesh/cgrid.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

double quad_area(const StructuredGrid& g, int i, int j) {
    const Vec2 a = g.node(i, j), b = g.node(i + 1, j), c = g.node(i + 1, j + 1),
               d = g.node(i, j + 1);
    return 0.5 * (cross(b - a, c - a) + cross(c - a, d - a));
}

/// Angle (degrees) between `line` and the normal to `chord`.
double non_orthogonality(Vec2 chord, Vec2 line) {
    const double c = std::abs(dot(chord, line)) / (norm(chord) * norm(line));
    return std::asin(std::min(1.0, c)) * 180.0 / std::numbers::pi;
}

double median(std::vector<double> v) {
    std::sort(v.begin(), v.end());
    const std::size_t n = v.size();
    return n % 2 == 1 ? v[n / 2] : 0.5 * (v[n / 2 - 1] + v[n / 2]);
}

void measure_cells(const StructuredGrid& g, GridQuality& q) {
    q.min_cell_area = std::numeric_limits<double>::infinity();
    for (int j = 0; j < g.nj(); ++j)
        for (int i = 0; i < g.ni(); ++i) {
            q.min_cell_area = std::min(q.min_cell_area, quad_area(g, i, j));
            const double along_i = 0.5 * (norm(g.node(i + 1, j) - g.node(i, j)) +
                                          norm(g.node(i + 1, j + 1) - g.node(i, j + 1)));
            const double along_j = 0.5 * (norm(g.node(i, j + 1) - g.node(i, j)) +
                                          norm(g.node(i + 1, j + 1) - g.node(i + 1, j)));
            const double ar = std::max(along_i, along_j) / std::min(along_i, along_j);
            q.max_aspect_ratio = std::max(q.max_aspect_ratio, ar);
        }
    for (int i = 0; i <= g.ni(); ++i)
        for (int j = 1; j < g.nj(); ++j) {
            const double below = norm(g.node(i, j) - g.node(i, j - 1));
            const double above = norm(g.node(i, j + 1) - g.node(i, j));
            q.max_growth_ratio = std::max(q.max_growth_ratio, above / below);
        }
}

/// The central chord of wall node i; on an O-grid it wraps across the seam (nodes 0 and ni are
/// one node).
Vec2 wall_chord(const StructuredGrid& g, const CGridLayout& c, int i) {
    const int ni = g.ni();
    if (c.closed() && (i == 0 || i == ni)) return g.node(1, 0) - g.node(ni - 1, 0);
    return g.node(i + 1, 0) - g.node(i - 1, 0);
}

void measure_wall(const StructuredGrid& g, const CGridLayout& c, GridQuality& q) {
    const int te_lower = c.wake, te_upper = c.wake + c.around;
    std::vector<double> heights;
    for (int i = te_lower; i <= te_upper; ++i) {
        const Vec2 line = g.node(i, 1) - g.node(i, 0);
        heights.push_back(norm(line));
        const double angle = non_orthogonality(wall_chord(g, c, i), line);
        if (!c.closed() && (i == te_lower || i == te_upper))
            q.trailing_edge_non_orthogonality = std::max(q.trailing_edge_non_orthogonality, angle);
        else
            q.wall_non_orthogonality = std::max(q.wall_non_orthogonality, angle);
    }
    q.first_cell_min = *std::min_element(heights.begin(), heights.end());
    q.first_cell_max = *std::max_element(heights.begin(), heights.end());
    q.first_cell_median = median(heights);
    q.far_field_distance = std::numeric_limits<double>::infinity();
    for (int i = 0; i <= g.ni(); ++i)
        for (int k = te_lower; k <= te_upper; ++k)
            q.far_field_distance =
                std::min(q.far_field_distance, norm(g.node(i, g.nj()) - g.node(k, 0)));
}

void add_warnings(double max_growth, GridQuality& q) {
    if (q.min_cell_area <= 0.0) {
        std::ostringstream w;
        w << "a cell has non-positive area " << q.min_cell_area << ": the grid is folded";
        q.warnings.push_back(w.str());
    }
    if (q.max_growth_ratio > max_growth * (1.0 + 1e-9)) {
        std::ostringstream w;
        w << "wall-normal growth ratio " << q.max_growth_ratio << " exceeds max_growth "
          << max_growth << "; normal = "
          << normal_cells_for_growth(q.first_cell_median, q.far_field_distance, max_growth)
          << " would keep the cap for first_cell " << q.first_cell_median << " and far_field "
          << q.far_field_distance;
        q.warnings.push_back(w.str());
    }
}

}  // namespace

GridQuality assess_quality(const StructuredGrid& grid, double max_growth) {
    if (!grid.c_layout()) throw InputError("mesh: grid quality needs a C-grid (no C layout set)");
    GridQuality q;
    q.ni = grid.ni();
    q.nj = grid.nj();
    q.cell_count = grid.cell_count();
    measure_cells(grid, q);
    measure_wall(grid, *grid.c_layout(), q);
    add_warnings(max_growth, q);
    return q;
}

}  // namespace veer
