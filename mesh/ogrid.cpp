#include "mesh/ogrid.hpp"

#include <sstream>

#include "mesh/cgrid.hpp"
#include "mesh/errors.hpp"
#include "mesh/geometric_stretching.hpp"

namespace veer {
namespace {

/// Unit normal into the fluid at each wall node: +90 degrees from the central chord, the chord
/// wrapping across the seam. Mirror-symmetric nodes give mirror-symmetric normals to the bit
/// (the chord of the mirrored node is the mirrored chord, negated; negation and swapping are
/// exact).
std::vector<Vec2> wall_normals(const std::vector<Vec2>& surface) {
    const std::size_t n = surface.size() - 1;
    std::vector<Vec2> normals(n + 1);
    for (std::size_t k = 0; k < n; ++k) {
        const Vec2 next = surface[k + 1], prev = surface[k == 0 ? n - 1 : k - 1];
        const Vec2 d = rotate_ccw(next - prev);
        normals[k] = (1.0 / norm(d)) * d;
    }
    normals[n] = normals[0];
    return normals;
}

double quad_area(Vec2 a, Vec2 b, Vec2 c, Vec2 d) {
    return 0.5 * (cross(b - a, c - a) + cross(c - a, d - a));
}

void check_folds(const StructuredGrid& g) {
    for (int j = 0; j < g.nj(); ++j)
        for (int i = 0; i < g.ni(); ++i)
            if (quad_area(g.node(i, j), g.node(i + 1, j), g.node(i + 1, j + 1), g.node(i, j + 1)) <=
                0.0) {
                std::ostringstream out;
                out << "mesh: the O-grid folds at cell (" << i << ", " << j << ") near ("
                    << g.node(i, j).x << ", " << g.node(i, j).y
                    << "); an O-grid is made only around a convex section such as the circle";
                throw InputError(out.str());
            }
}

}  // namespace

StructuredGrid generate_ogrid(const std::vector<Vec2>& surface, const CGridSpec& spec) {
    CGridSpec checked = spec;
    checked.wake = 2;  // no wake on an O-grid; every other key is checked as for a C-grid
    validate_cgrid_spec(checked);
    check_wall_nodes(surface, spec.around);
    const std::vector<double> steps = geometric_steps(spec.first_cell, spec.far_field, spec.normal);
    const std::vector<Vec2> normals = wall_normals(surface);
    StructuredGrid grid(spec.around, spec.normal);
    for (int i = 0; i <= grid.ni(); ++i) {
        const auto k = static_cast<std::size_t>(i);
        double distance = 0.0;
        grid.node(i, 0) = surface[k];
        for (int j = 1; j <= grid.nj(); ++j) {
            distance += steps[static_cast<std::size_t>(j - 1)];
            grid.node(i, j) = surface[k] + distance * normals[k];
        }
    }
    check_folds(grid);
    grid.segments() = {
        {Side::j_min, 0, grid.ni(), SegmentKind::wall, "wall"},
        {Side::i_min, 0, grid.nj(), SegmentKind::periodic, "seam_lower"},
        {Side::i_max, 0, grid.nj(), SegmentKind::periodic, "seam_upper"},
        {Side::j_max, 0, grid.ni(), SegmentKind::far_field, "far_field"},
    };
    grid.c_layout() = CGridLayout{0, spec.around};
    return grid;
}

}  // namespace veer
