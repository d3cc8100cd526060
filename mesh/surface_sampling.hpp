#pragma once
/// Nodes along a section surface for the wall of a C-grid.
#include <vector>

#include "mesh/cgrid_spec.hpp"
#include "mesh/section.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// around + 1 nodes on the section's spline from the trailing edge along the lower surface to the
/// leading edge and back along the upper surface to the trailing edge (first == last == TE). The
/// leading edge is exactly node around / 2. Both halves are sampled by the same rule (see the .cpp:
/// spacing set by curvature and a trailing-edge clustering, then limited so neighbouring spacings
/// differ by about 10%), so a symmetric section gives an exact mirror image.
///
/// `max_slope` caps |d spacing / d arc length|: neighbouring spacings differ by about max_slope.
/// A fixed cap binds on coarse grids (up to about 400 cells around a NACA 0012) and not on fine
/// ones, so grids of different `around` with one cap are not one systematic family; scaling the
/// cap with the cell size (cap x ratio^k on the member k times coarser) keeps the spacing
/// distribution h / h_mean of every member the same (`veer grid-study --same-surface-spacing`).
/// Throws InputError naming the key `around` unless it is even and at least 8, and for a cap
/// that is not positive.
std::vector<Vec2> sample_surface(const Section& s, int around,
                                 double max_slope = default_surface_slope);

}  // namespace veer
