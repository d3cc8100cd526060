#pragma once
/// The j = 0 line of a C-grid: lower wake cut, section surface, upper wake cut.
#include <vector>

#include "mesh/vec2.hpp"

namespace veer {

/// The ni + 1 = 2 * wake + around + 1 nodes of j = 0 (chords). `surface` holds around + 1 nodes
/// from the trailing edge along the lower surface and back along the upper surface (first ==
/// last). The wake cut runs straight downstream from the trailing edge along +x to
/// x = TE.x + wake_length; its first step is the mean of the two trailing-edge surface spacings
/// and the steps grow geometrically. Node i and node ni - i coincide exactly for i <= wake.
std::vector<Vec2> build_wall_line(const std::vector<Vec2>& surface, int wake, double wake_length);

}  // namespace veer
