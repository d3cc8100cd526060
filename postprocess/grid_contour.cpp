#include "postprocess/grid_contour.hpp"

#include <cmath>
#include <limits>
#include <sstream>

namespace veer {

namespace {

const CGridLayout& layout_of(const StructuredGrid& grid) {
    VEER_VERIFY(grid.c_layout().has_value(), "contours need a C-grid layout");
    return *grid.c_layout();
}

/// Least distance of the nodes of j line fj from their wall nodes (same i), over the section.
double line_distance(const StructuredGrid& grid, int fj) {
    const CGridLayout& c = layout_of(grid);
    double least = std::numeric_limits<double>::max();
    for (int i = c.wake; i <= c.wake + c.around; ++i)
        least = std::min(least, norm(grid.node(i, fj) - grid.node(i, 0)));
    return least;
}

/// Distance along the wake cut from the trailing edge to node (i, 0), i <= wake.
double cut_distance(const StructuredGrid& grid, int i) {
    const CGridLayout& c = layout_of(grid);
    return norm(grid.node(i, 0) - grid.node(c.wake, 0));
}

/// On an O-grid the contour is the whole j line; it crosses the wake behind the rear point
/// (node (0, fj)) at the line's distance from it.
GridContour closed_contour(const StructuredGrid& grid, int line_j) {
    if (line_j < 1 || line_j > grid.nj() - 1) {
        std::ostringstream msg;
        msg << "control-volume contour on j line " << line_j << ": allowed are j lines 1.."
            << grid.nj() - 1;
        throw InputError(msg.str());
    }
    GridContour contour;
    contour.line_j = line_j;
    contour.cut_i = 0;
    contour.distance = line_distance(grid, line_j);
    contour.wake_crossing = norm(grid.node(0, line_j) - grid.node(0, 0));
    return contour;
}

/// Interpolation weight of a face centre between two centroids (projection on their line).
double face_weight(Vec2 face_center, Vec2 c_in, Vec2 c_out) {
    const Vec2 d = c_out - c_in;
    return dot(face_center - c_in, d) / dot(d, d);
}

}  // namespace

GridContour contour_on_lines(const StructuredGrid& grid, int line_j, int cut_i) {
    const CGridLayout& c = layout_of(grid);
    if (c.closed()) return closed_contour(grid, line_j);
    if (line_j < 1 || line_j > grid.nj() - 1 || cut_i < 1 || cut_i > c.wake) {
        std::ostringstream msg;
        msg << "control-volume contour on j line " << line_j << ", wake crossing at i line "
            << cut_i << ": allowed are j lines 1.." << grid.nj() - 1 << " and i lines 1.."
            << c.wake;
        throw InputError(msg.str());
    }
    GridContour contour;
    contour.line_j = line_j;
    contour.cut_i = cut_i;
    contour.distance = line_distance(grid, line_j);
    contour.wake_crossing = cut_distance(grid, cut_i);
    return contour;
}

GridContour contour_at_distance(const StructuredGrid& grid, double distance) {
    if (!(distance > 0.0) || !std::isfinite(distance)) {
        std::ostringstream msg;
        msg << "control-volume contour distance " << distance
            << " chords: must be a positive number of chords from the section";
        throw InputError(msg.str());
    }
    const CGridLayout& c = layout_of(grid);
    int best_j = 1, best_i = c.closed() ? 0 : 1;
    for (int fj = 1; fj <= grid.nj() - 1; ++fj)
        if (std::abs(line_distance(grid, fj) - distance) <
            std::abs(line_distance(grid, best_j) - distance))
            best_j = fj;
    for (int i = best_i; i <= c.wake; ++i)
        if (std::abs(cut_distance(grid, i) - distance) <
            std::abs(cut_distance(grid, best_i) - distance))
            best_i = i;
    GridContour contour = contour_on_lines(grid, best_j, best_i);
    contour.requested = distance;
    return contour;
}

std::vector<GridContour> contours_at_distances(const StructuredGrid& grid,
                                               const std::vector<double>& distances) {
    std::vector<GridContour> out;
    out.reserve(distances.size());
    for (double d : distances) out.push_back(contour_at_distance(grid, d));
    return out;
}

std::vector<ContourFace> contour_faces(const GridMetrics& m, const StructuredGrid& grid,
                                       const GridContour& contour) {
    // On an O-grid (cut_i = 0) the contour is the j line alone, closed across the seam.
    const bool closed = layout_of(grid).closed();
    const int ni = grid.ni(), fj = contour.line_j, lo = contour.cut_i, hi = ni - contour.cut_i;
    std::vector<ContourFace> faces;
    auto add = [&](Vec2 center, Vec2 area_out, std::size_t in, std::size_t out) {
        faces.push_back(
            {center, area_out, in, out, face_weight(center, m.centroid[in], m.centroid[out])});
    };
    for (int j = 0; j < fj && !closed; ++j) {  // lower i line: +i points inwards
        const std::size_t f = m.face_i(lo, j);
        add(m.face_center_i[f], -1.0 * m.area_i[f], m.cell(lo, j), m.cell(lo - 1, j));
    }
    for (int i = lo; i < hi; ++i) {  // j line: +j points outwards
        const std::size_t f = m.face_j(i, fj);
        add(m.face_center_j[f], m.area_j[f], m.cell(i, fj - 1), m.cell(i, fj));
    }
    for (int j = fj - 1; j >= 0 && !closed; --j) {  // upper i line: +i points outwards
        const std::size_t f = m.face_i(hi, j);
        add(m.face_center_i[f], m.area_i[f], m.cell(hi - 1, j), m.cell(hi, j));
    }
    return faces;
}

std::vector<std::size_t> contour_cells(const GridMetrics& m, const StructuredGrid& grid,
                                       const GridContour& contour) {
    std::vector<std::size_t> cells;
    for (int j = 0; j < contour.line_j; ++j)
        for (int i = contour.cut_i; i < grid.ni() - contour.cut_i; ++i)
            cells.push_back(m.cell(i, j));
    return cells;
}

}  // namespace veer
