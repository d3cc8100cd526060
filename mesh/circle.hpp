#pragma once
/// A circular cylinder as a section: diameter 1 (the reference length, in place of the chord),
/// front point at the origin, rear point at (1, 0), so that its coordinates read like a
/// section's (x from the front along the free stream).
#include <string>
#include <vector>

#include "mesh/section.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// Centre of the unit-diameter circle.
inline constexpr Vec2 circle_centre{0.5, 0.0};

/// around + 1 wall nodes equally spaced in angle, ordered as a section's: from the rear point
/// (1, 0) along the lower half (y < 0) to the front point (node around / 2) and back along the
/// upper half (first == last). The upper half mirrors the lower one exactly (y negated), so a
/// flow along +x sees a grid symmetric to the last bit. Throws InputError naming `around` unless
/// it is even and at least 16.
std::vector<Vec2> circle_surface(int around);

/// The circle as a Section (its points are the wall nodes of circle_surface), named `name`.
Section circle_section(int around, const std::string& name);

/// Angle of a point around the centre, in degrees from the rear point (0) to the front point
/// (180), the same on both halves: where the cylinder figures of the literature put separation.
double angle_from_rear_deg(Vec2 point);

}  // namespace veer
