#pragma once
/// Distance from cell centroids to the discretised wall (the Spalart-Allmaras length scale).
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/segment_distance.hpp"
#include "mesh/structured_grid.hpp"

namespace veer {

/// Exact distance (chords) from each cell centroid to the polyline of wall faces: the j = 0 faces
/// of every segment of kind wall on side j_min. Cell-centred, ni * nj, indexed like
/// GridMetrics::cell. Wall faces are grouped in runs of consecutive faces with bounding boxes,
/// and a run is opened only when its box is nearer than the best distance so far, so the cost is
/// close to linear in the cell count. Throws InputError when the grid has no wall segment.
std::vector<double> wall_distance(const StructuredGrid& grid, const GridMetrics& metrics);

}  // namespace veer
