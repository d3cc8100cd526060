#pragma once
/// The physical boundary faces of a block (every segment that is not connectivity), each with
/// its role from the boundary table and its current boundary values.
#include <cstddef>
#include <functional>
#include <string>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/boundary_table.hpp"

namespace veer {

/// A velocity prescribed on one named segment, a function of position (chords) and time: for
/// manufactured solutions and moving walls. Its faces take the role prescribed_velocity.
struct VelocityOverride {
    std::string segment;                             ///< BoundarySegment::name
    std::function<Vec2(Vec2 x, double t)> velocity;  ///< free-stream units
};

/// A wall sliding at constant velocity (a cavity lid), as an override.
VelocityOverride moving_wall(std::string segment, Vec2 wall_velocity);

/// A wall spinning counter-clockwise about `centre` with tangential speed `surface_speed(t)`
/// (free-stream units; negative: clockwise), as an override: u = s(t) k x (x - c) / |x - c|.
/// Tangential to a circle centred at `centre`, so no flow passes its wall.
VelocityOverride spinning_wall(std::string segment, Vec2 centre,
                               std::function<double(double t)> surface_speed);

/// One physical boundary face.
struct BoundaryFace {
    int i = 0;  ///< interior cell next to the face
    int j = 0;
    int gi = 0;  ///< first ghost cell across the face
    int gj = 0;
    bool i_face = true;    ///< an i-face (index into metrics.area_i) or a j-face
    std::size_t face = 0;  ///< index into the i- or j-face arrays
    double outward = 1.0;  ///< +1 where the stored +i/+j area vector points out of the block
    Vec2 area_out;         ///< area vector out of the block (chords)
    Vec2 center;           ///< face midpoint (chords)
    FaceRole role = FaceRole::wall;
    int override_index = -1;  ///< index into the overrides, -1 where none
    Vec2 velocity;            ///< boundary velocity (Dirichlet faces), free-stream units
    double pressure = 0.0;    ///< boundary pressure (outflow faces)
};

/// Every face of the physical segments of `grid`, roles resolved with the free-stream direction
/// `free_stream` (unit vector). Throws InputError when an override names no segment of the grid,
/// InternalError when the segments do not cover the boundary exactly once.
std::vector<BoundaryFace> collect_boundary_faces(const StructuredGrid& grid,
                                                 const GridMetrics& metrics, Vec2 free_stream,
                                                 const std::vector<VelocityOverride>& overrides);

}  // namespace veer
