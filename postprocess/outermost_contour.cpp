#include "postprocess/outermost_contour.hpp"

#include "mesh/errors.hpp"
#include "postprocess/circulation.hpp"
#include "postprocess/control_volume.hpp"

namespace veer {

GridContour outermost_contour(const StructuredGrid& grid) {
    VEER_VERIFY(grid.c_layout().has_value(), "the outermost contour needs a C-grid or O-grid");
    const int cut_i = grid.c_layout()->closed() ? 0 : 1;
    return contour_on_lines(grid, grid.nj() - 1, cut_i);
}

RouteComparison outermost_route(const StructuredGrid& grid, const GridMetrics& metrics,
                                const FlowFields& fields, const FlowConditions& conditions,
                                const SurfaceForces& surface) {
    const std::vector<GridContour> contour = {outermost_contour(grid)};
    const auto momentum = contour_forces(grid, metrics, fields, conditions, contour);
    const auto circulation = contour_circulation(grid, metrics, fields, contour);
    return compare_routes(surface, momentum, circulation).front();
}

}  // namespace veer
