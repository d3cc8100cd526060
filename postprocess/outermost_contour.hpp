#pragma once
/// The far-boundary force check: the momentum balance (control_volume.hpp) on the largest contour
/// a grid holds, its last interior j-face line (nj - 1) closed across the wake cut at the i line
/// nearest the outlets (cut_i = 1; on an O-grid the whole line). Its faces lie one cell inside the
/// far boundary, so it reads the fields the far-field condition (with its point-vortex correction,
/// solver/far_field_vortex.hpp, when on) shapes; lift lost or gained there shows as its difference
/// from the surface route.
#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "postprocess/lift_routes.hpp"
#include "postprocess/surface_forces.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// The contour on the outermost interior grid lines (needs a C-grid or the circle's O-grid).
GridContour outermost_contour(const StructuredGrid& grid);

/// The momentum and circulation routes on the outermost contour against the surface route.
RouteComparison outermost_route(const StructuredGrid& grid, const GridMetrics& metrics,
                                const FlowFields& fields, const FlowConditions& conditions,
                                const SurfaceForces& surface);

}  // namespace veer
