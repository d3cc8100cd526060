#pragma once
/// Finite-volume metrics of a structured block: cell areas and centroids, face area vectors.
///
/// Layout (i fastest): cells ni x nj; i-faces (ni+1) x nj, face (fi, j) lies between cells (fi-1,
/// j) and (fi, j); j-faces ni x (nj+1), face (i, fj) lies between cells (i, fj-1) and (i, fj).
#include <vector>

#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"

namespace veer {

struct GridMetrics {
    int ni = 0;
    int nj = 0;
    std::vector<double> volume;       ///< cell areas (chord^2), ni * nj
    std::vector<Vec2> centroid;       ///< cell centroids, ni * nj
    std::vector<Vec2> area_i;         ///< i-face normal * length, pointing towards +i, (ni+1) * nj
    std::vector<Vec2> area_j;         ///< j-face normal * length, pointing towards +j, ni * (nj+1)
    std::vector<Vec2> face_center_i;  ///< i-face midpoints, (ni+1) * nj
    std::vector<Vec2> face_center_j;  ///< j-face midpoints, ni * (nj+1)

    std::size_t cell(int i, int j) const { return static_cast<std::size_t>(j * ni + i); }
    std::size_t face_i(int fi, int j) const { return static_cast<std::size_t>(j * (ni + 1) + fi); }
    std::size_t face_j(int i, int fj) const { return static_cast<std::size_t>(fj * ni + i); }
};

/// Metrics of any structured block (cell areas by the shoelace formula, centroids of the quads).
GridMetrics compute_metrics(const StructuredGrid& grid);

}  // namespace veer
