#include "postprocess/wall_faces.hpp"

#include <sstream>

namespace veer {

WallRange find_wall_faces(const StructuredGrid& grid) {
    if (grid.c_layout()) {
        const CGridLayout& c = *grid.c_layout();
        VEER_VERIFY(2 * c.wake + c.around == grid.ni(), "C-grid layout does not match ni");
        return {c.wake, c.wake + c.around};
    }
    for (const BoundarySegment& s : grid.segments())
        if (s.kind == SegmentKind::wall && s.side == Side::j_min) return {s.begin, s.end};
    std::ostringstream msg;
    msg << "grid of " << grid.ni() << " x " << grid.nj()
        << " cells has no wall: expected a C-grid layout or a wall segment on side j_min";
    throw InputError(msg.str());
}

namespace {

/// Normal distance of point p from the line through the face centre with unit normal n.
double distance_from_face(Vec2 p, Vec2 face_center, Vec2 n) { return dot(p - face_center, n); }

/// Value at d = 0 of the line through (d0, f0) and (d1, f1).
double extrapolate_to_wall(double d0, double f0, double d1, double f1) {
    return f0 - d0 * (f1 - f0) / (d1 - d0);
}

}  // namespace

double one_sided_wall_derivative(double d0, double f0, double d1, double f1) {
    return (f0 * d1 * d1 - f1 * d0 * d0) / (d0 * d1 * (d1 - d0));
}

std::vector<WallFaceState> evaluate_wall_faces(const StructuredGrid& grid,
                                               const GridMetrics& metrics, const FlowFields& fields,
                                               const FlowConditions& conditions,
                                               WallPressure wall_pressure) {
    VEER_VERIFY(fields.ni == grid.ni() && fields.nj == grid.nj(), "fields do not match the grid");
    VEER_VERIFY(grid.nj() >= 2, "wall reconstruction needs two cells off the wall");
    VEER_VERIFY(conditions.reynolds > 0.0, "Reynolds number must be positive");
    const WallRange wall = find_wall_faces(grid);
    const double nu = 1.0 / conditions.reynolds;
    std::vector<WallFaceState> faces;
    faces.reserve(static_cast<std::size_t>(wall.count()));
    for (int i = wall.begin; i < wall.end; ++i) {
        WallFaceState f;
        f.i = i;
        const Vec2 area = metrics.area_j[metrics.face_j(i, 0)];
        f.length = norm(area);
        VEER_VERIFY(f.length > 0.0, "wall face of zero length");
        f.normal = (1.0 / f.length) * area;
        f.tangent = {f.normal.y, -f.normal.x};  // n rotated by -90 degrees is +i
        f.center = metrics.face_center_j[metrics.face_j(i, 0)];
        const std::size_t c0 = metrics.cell(i, 0), c1 = metrics.cell(i, 1);
        const double d0 = distance_from_face(metrics.centroid[c0], f.center, f.normal);
        const double d1 = distance_from_face(metrics.centroid[c1], f.center, f.normal);
        VEER_VERIFY(d0 > 0.0 && d1 > d0, "cells off the wall are not ordered by wall distance");
        f.first_cell_distance = d0;
        const double p0 = fields.pressure[c0], p1 = fields.pressure[c1];
        f.pressure =
            wall_pressure == WallPressure::extrapolated ? extrapolate_to_wall(d0, p0, d1, p1) : p0;
        const double ut0 = fields.u[c0] * f.tangent.x + fields.v[c0] * f.tangent.y;
        const double ut1 = fields.u[c1] * f.tangent.x + fields.v[c1] * f.tangent.y;
        f.shear = nu * one_sided_wall_derivative(d0, ut0, d1, ut1);
        faces.push_back(f);
    }
    return faces;
}

}  // namespace veer
