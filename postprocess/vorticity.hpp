#pragma once
/// Cell-centred vorticity of the planar flow, for field output and wake diagnostics.
///
/// Green-Gauss over each cell: omega_z = (1 / A) * sum over faces of (S_x v_f - S_y u_f), with S
/// the outward face area vector and (u_f, v_f) the face velocity. Interior faces interpolate
/// linearly between the two cell centroids; boundary faces take, by segment kind on that side:
///   wall          u_f = 0                         (no slip, stationary wall)
///   wake_cut      interpolate with the mirrored cell (i <-> ni-1-i, j = 0): the cut is
///   connectivity periodic      interpolate with the cell on the opposite side far_field,    u_f =
///   the cell's own value      (zero normal gradient) outflow, none
/// Second-order accurate on smooth grids; exact for solid-body rotation on parallelogram grids.
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// Vorticity dv/dx - du/dy per cell (units U_inf / chord), ni * nj, i fastest. A grid without
/// segments but with a C-grid layout gets its wall and wake cut from the layout.
std::vector<double> compute_vorticity(const StructuredGrid& grid, const GridMetrics& metrics,
                                      const FlowFields& flow);

}  // namespace veer
