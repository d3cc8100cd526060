#pragma once
/// Nodes along a section surface for the wall of a C-grid.
#include <vector>

#include "mesh/section.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// around + 1 nodes on the section's spline from the trailing edge along the lower surface to the
/// leading edge and back along the upper surface to the trailing edge (first == last == TE). The
/// leading edge is exactly node around / 2. Both halves are sampled by the same rule (see the .cpp:
/// spacing set by curvature and a trailing-edge clustering, then limited so neighbouring spacings
/// differ by about 10%), so a symmetric section gives an exact mirror image.
/// Throws InputError naming the key `around` unless it is even and at least 8.
std::vector<Vec2> sample_surface(const Section& s, int around);

}  // namespace veer
