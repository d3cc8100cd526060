#pragma once
/// Cell-centred gradients for post-processing (viscous stresses on contours): weighted least
/// squares over the face neighbours of a cell, with the C-grid wake cut as connectivity (cell
/// (i, 0) neighbours (ni-1-i, 0) across j = 0 in the wake) and the O-grid seam too (cell 0
/// neighbours cell ni - 1). Exact for linear fields on any grid;
/// boundary sides simply have one neighbour fewer. Weights 1/|dx|^2 (common practice).
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// Gradient (per chord) of cell field q (ni * nj, i fastest) at cell (i, j).
Vec2 least_squares_gradient(const StructuredGrid& grid, const GridMetrics& metrics,
                            const std::vector<double>& q, int i, int j);

}  // namespace veer
