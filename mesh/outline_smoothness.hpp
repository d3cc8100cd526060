#pragma once
/// Points that break the smoothness of a surface (a spike, a kink): each point is compared with
/// the smooth curve through its two neighbours on either side.
#include "mesh/raw_outline.hpp"
#include "mesh/trailing_edge.hpp"

namespace veer {

/// A point is off the smooth curve when its distance from the cubic through its neighbours
/// (k-2, k-1, k+1, k+2, in chord length) exceeds both limits: an offset in chords and an offset
/// relative to the half-distance between its neighbours. Tables of NACA sections from the formula
/// (Abbott & von Doenhoff 1959, section 6.4), 18 to 161 stations per surface rounded to 4-6
/// decimals, stay below a third of both limits away from the nose; within nose_zone of the nose a
/// coarse table is legitimately far off such a curve (up to 0.92 spacings for a 6 % section at
/// 61 even stations), so there only gross errors are caught.
struct SmoothnessLimits {
    static constexpr double nose_zone = 0.05;  ///< chords from the foremost point
    static constexpr double offset = 5e-4;     ///< chords, away from the nose
    static constexpr double offset_to_spacing = 0.05;
    static constexpr double nose_offset = 1e-3;  ///< chords, near the nose
    static constexpr double nose_offset_to_spacing = 1.0;
};

/// Throws a one-line InputError for the point of `w` (base points set aside, any orientation)
/// farthest beyond the limits: its file line and coordinates, its neighbours, how far it is off
/// and where the curve through its neighbours passes. A point far off also pulls its
/// neighbours' curves off, so the point named is the one farthest off among the two on either
/// side of the first found beyond the limits. `raw` names the points.
void check_smoothness(const RawOutline& raw, const OutlineWork& w);

}  // namespace veer
