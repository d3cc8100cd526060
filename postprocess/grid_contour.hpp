#pragma once
/// Closed contours around the section on grid lines of a C-grid, for the control-volume and
/// circulation routes.
///
/// A contour is the j-face line fj = line_j from i = cut_i to ni - cut_i, closed by the two i-face
/// lines fi = cut_i (lower side) and fi = ni - cut_i (upper side) from j = 0 to line_j; those two
/// meet on the wake cut, where node (cut_i, 0) and node (ni - cut_i, 0) coincide:
///
///        upper i-line fi = ni-cut_i    j-line fj = line_j (around the section)
///   cut  ==========x======================================= x  (node on the wake cut)
///        lower i-line fi = cut_i
///
/// The cells inside are j < line_j, cut_i <= i < ni - cut_i. Faces are listed along the contour
/// clockwise (the way i runs on the wall), each with its area vector pointing out of the contour.
///
/// On an O-grid (CGridLayout::closed) a contour is the whole j-face line fj = line_j, closed on
/// itself across the seam; cut_i = 0 and the cells inside are all cells j < line_j.
#include <cstddef>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// Where a contour lies, in grid indices and in chords.
struct GridContour {
    int line_j = 1;              ///< j-face line of the part around the section, 1 .. nj-1
    int cut_i = 1;               ///< i-face line of the lower wake crossing, 1 .. wake (O: 0)
    double distance = 0.0;       ///< least distance of the j line's nodes from their wall nodes
    double wake_crossing = 0.0;  ///< distance along the wake cut (O: the seam) from the wall
    double requested = 0.0;      ///< the distance asked for (0 when chosen by indices)
};

/// The default contour distances from the section, chords.
inline std::vector<double> default_contour_distances() { return {0.5, 1.0, 2.0, 4.0}; }

/// The contour on given grid lines; throws InputError when they are outside 1 .. nj-1 and
/// 1 .. wake. Needs a C-grid layout.
GridContour contour_on_lines(const StructuredGrid& grid, int line_j, int cut_i);

/// The contour whose j line and wake crossing lie nearest to `distance` chords from the section
/// (clamped to the grid's interior lines). Throws InputError for a distance that is not positive.
GridContour contour_at_distance(const StructuredGrid& grid, double distance);

/// One contour per requested distance, in the given order.
std::vector<GridContour> contours_at_distances(const StructuredGrid& grid,
                                               const std::vector<double>& distances);

/// One face of a contour and the two cells it separates; face values blend the two cells'
/// reconstructions as (1 - weight) * in + weight * out.
struct ContourFace {
    Vec2 center;               ///< face midpoint
    Vec2 area_out;             ///< face normal * length, pointing out of the contour
    std::size_t cell_in = 0;   ///< the adjacent cell inside the contour
    std::size_t cell_out = 0;  ///< the adjacent cell outside
    double weight = 0.5;       ///< projection of the face centre on the centroid-to-centroid line
    /// Step along the contour (clockwise), the area vector rotated by -90 degrees.
    Vec2 step() const { return {area_out.y, -area_out.x}; }
};

/// The faces of a contour in clockwise order: lower i line upwards in j, the j line along +i, the
/// upper i line back down to the cut.
std::vector<ContourFace> contour_faces(const GridMetrics& metrics, const StructuredGrid& grid,
                                       const GridContour& contour);

/// Cells inside a contour (for the rate of change of momentum).
std::vector<std::size_t> contour_cells(const GridMetrics& metrics, const StructuredGrid& grid,
                                       const GridContour& contour);

}  // namespace veer
