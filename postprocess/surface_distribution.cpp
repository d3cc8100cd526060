#include "postprocess/surface_distribution.hpp"

#include <algorithm>
#include <cmath>

namespace veer {

int leading_edge_node(const StructuredGrid& grid) {
    VEER_VERIFY(grid.c_layout().has_value(), "the leading edge is found from the C-grid layout");
    const CGridLayout& c = *grid.c_layout();
    return c.wake + c.around / 2;
}

namespace {

/// Arc length along j = 0 from node 0 to every node (only differences are used).
std::vector<double> node_arc(const StructuredGrid& grid) {
    std::vector<double> s(static_cast<std::size_t>(grid.ni() + 1), 0.0);
    for (int k = 0; k < grid.ni(); ++k)
        s[static_cast<std::size_t>(k + 1)] =
            s[static_cast<std::size_t>(k)] + norm(grid.node(k + 1, 0) - grid.node(k, 0));
    return s;
}

}  // namespace

SurfaceDistribution surface_distribution(const StructuredGrid& grid,
                                         const std::vector<WallFaceState>& wall,
                                         const FlowConditions& conditions) {
    const int le = leading_edge_node(grid);
    const double nu = 1.0 / conditions.reynolds;
    const std::vector<double> s = node_arc(grid);
    const double s_le = s[static_cast<std::size_t>(le)];
    SurfaceDistribution out;
    for (const WallFaceState& f : wall) {
        SurfacePoint p;
        p.i = f.i;
        p.x = f.center.x;
        p.y = f.center.y;
        p.side = f.i < le ? SurfaceSide::lower : SurfaceSide::upper;
        const auto k = static_cast<std::size_t>(f.i);
        p.arc = std::abs(0.5 * (s[k] + s[k + 1]) - s_le);
        p.cp = 2.0 * f.pressure;
        // +i runs aft on the upper surface and forward on the lower one.
        p.cf = 2.0 * (p.side == SurfaceSide::upper ? f.shear : -f.shear);
        p.y_plus = f.first_cell_distance * std::sqrt(std::abs(f.shear)) / nu;
        (p.side == SurfaceSide::upper ? out.upper : out.lower).push_back(p);
    }
    std::reverse(out.lower.begin(), out.lower.end());  // leading edge first
    const CGridLayout& c = *grid.c_layout();
    out.upper_length = s[static_cast<std::size_t>(c.wake + c.around)] - s_le;
    out.lower_length = s_le - s[static_cast<std::size_t>(c.wake)];
    return out;
}

SurfaceDistribution surface_distribution(const StructuredGrid& grid, const GridMetrics& metrics,
                                         const FlowFields& fields, const FlowConditions& conditions,
                                         WallPressure wall_pressure) {
    return surface_distribution(
        grid, evaluate_wall_faces(grid, metrics, fields, conditions, wall_pressure), conditions);
}

}  // namespace veer
