#include "solver/trip_region.hpp"

#include <algorithm>
#include <map>

namespace veer {

namespace {

/// The j = 0 wall faces by column.
std::map<int, const BoundaryFace*> foot_faces(const std::vector<BoundaryFace>& faces) {
    std::map<int, const BoundaryFace*> by_column;
    for (const BoundaryFace& b : faces)
        if (b.role == FaceRole::wall && !b.i_face && b.j == 0) by_column[b.i] = &b;
    return by_column;
}

}  // namespace

std::vector<WallFoot> wall_feet(const FaceGeometry& geom, const std::vector<BoundaryFace>& faces) {
    std::vector<WallFoot> feet(geom.volume.size());
    const std::map<int, const BoundaryFace*> columns = foot_faces(faces);
    if (columns.empty()) return feet;
    const BoundaryFace* le = columns.begin()->second;
    const BoundaryFace* te = le;
    for (const auto& [i, b] : columns) {
        if (b->center.x < le->center.x) le = b;
        if (b->center.x > te->center.x) te = b;
    }
    const Vec2 chord{te->center.x - le->center.x, te->center.y - le->center.y};
    const double length2 = std::max(chord.x * chord.x + chord.y * chord.y, 1e-300);
    // The fluid-side normal is -area_out; its component across the chord line tells the sides.
    double look_after_le = 0.0, look_before_le = 0.0;
    for (const auto& [i, b] : columns) {
        const double across = (-b->area_out.y * chord.x + b->area_out.x * chord.y);
        (i > le->i ? look_after_le : look_before_le) += across;
    }
    const bool after_is_upper = look_after_le >= look_before_le;
    for (const auto& [i, b] : columns) {
        WallFoot f;
        const bool after = i >= le->i;
        f.side = after == after_is_upper ? WallFoot::Side::upper : WallFoot::Side::lower;
        f.x_over_c =
            ((b->center.x - le->center.x) * chord.x + (b->center.y - le->center.y) * chord.y) /
            length2;
        for (int j = 0; j < geom.nj; ++j) feet[geom.cell(i, j)] = f;
    }
    return feet;
}

std::vector<TripZone> trip_zones(const std::vector<WallFoot>& feet, const TripPositions& trips) {
    std::vector<TripZone> zones(feet.size(), TripZone::free);
    for (std::size_t k = 0; k < feet.size(); ++k) {
        const WallFoot& f = feet[k];
        const std::optional<double>& trip = f.side == WallFoot::Side::upper   ? trips.upper
                                            : f.side == WallFoot::Side::lower ? trips.lower
                                                                              : std::nullopt;
        if (trip) zones[k] = f.x_over_c >= *trip ? TripZone::turbulent : TripZone::laminar;
    }
    return zones;
}

}  // namespace veer
