#pragma once
/// Distances between points and straight segments in the plane (the outline checks and the wall
/// distance share them).
#include "mesh/vec2.hpp"

namespace veer {

/// Distance (chords) from point p to the segment ab (to a itself when a and b coincide).
double point_segment_distance(Vec2 p, Vec2 a, Vec2 b);

}  // namespace veer
