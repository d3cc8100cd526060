#pragma once
/// Forced transition (a grit strip or turbulator): where on the section's surfaces the boundary
/// layer is held laminar and where it is let go. Each cell belongs to the wall face at the foot
/// of its wall-normal grid line (the j = 0 face of its column); a cell whose foot lies on a
/// tripped surface ahead of the trip position is held laminar, at or behind it turbulent.
/// Columns with no wall at their foot (the wake, the plate's upstream run) are left alone.
///
/// Positions are fractions of the chord along the chord line from the leading edge (the wall
/// face centre furthest upstream, smallest x) to the trailing edge (largest x). The upper
/// surface is the one whose wall faces look towards +y off the chord line, on average.
#include <cstdint>
#include <optional>
#include <vector>

#include "solver/boundary_faces.hpp"
#include "solver/face_geometry.hpp"

namespace veer {

/// Trip positions per surface (x/c, 0 to 1); none: that surface is not tripped.
struct TripPositions {
    std::optional<double> upper;
    std::optional<double> lower;
    bool any() const { return upper.has_value() || lower.has_value(); }
};

/// Where each cell's foot lies: its surface and chordwise position.
struct WallFoot {
    enum class Side : std::uint8_t { none, upper, lower } side = Side::none;
    double x_over_c = 0.0;
};

/// The foot of every cell (ni * nj): its wall face's surface and x/c.
std::vector<WallFoot> wall_feet(const FaceGeometry& geom, const std::vector<BoundaryFace>& faces);

/// What a trip makes of a cell: nothing (its foot is on no tripped surface: the wake, an
/// untripped surface), held laminar (ahead of its surface's trip), or turbulent (at or behind it).
enum class TripZone : std::uint8_t { free, laminar, turbulent };

/// The zone of every cell (ni * nj).
std::vector<TripZone> trip_zones(const std::vector<WallFoot>& feet, const TripPositions& trips);

}  // namespace veer
