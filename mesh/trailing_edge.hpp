#pragma once
/// The trailing edge of an outline: the points that only describe its base are set aside, and a
/// blunt edge is closed to the sharp tip a C-grid needs.
#include <cstddef>
#include <vector>

#include "mesh/raw_outline.hpp"
#include "mesh/section.hpp"

namespace veer {

/// An outline being built into a Section: points clockwise (lower surface first) from one
/// trailing-edge point to the other, each with the index of the source point it came from.
struct OutlineWork {
    static constexpr std::size_t added = static_cast<std::size_t>(-1);  ///< a point veer added
    std::vector<Vec2> points;
    std::vector<std::size_t> source;  ///< index in the RawOutline, or `added`
    std::size_t nose = 0;             ///< index of the nose point
};

struct TrailingEdgeLimits {
    /// A segment at either end of the outline shorter than this (chords) that turns by more
    /// than base_turn_degrees into the surface describes the base: a closing point repeated
    /// at the end, or a segment drawn across the gap (twice the largest gap accepted, so that a
    /// base just too wide is set aside and then refused as a gap, not as a kink).
    static constexpr double base_length = 0.1;
    static constexpr double base_turn_degrees = 45.0;
    /// A gap below this (chords) is a sharp edge written with rounding.
    static constexpr double sharp_gap = 1e-6;
    /// The straight continuations of the two surfaces close the edge (a wedge) when they meet
    /// within this distance (chords) at a tip no blunter than wedge_half_angle_degrees.
    static constexpr double wedge_reach = 0.02;
    static constexpr double wedge_half_angle_degrees = 12.0;
    /// Otherwise each side is continued by a smooth curve (a fairing) that leaves the surface
    /// along its last direction and meets the other at a tip of this half-angle.
    static constexpr double fairing_half_angle_degrees = 8.0;
};

/// Sets aside the base points at both ends of `w` (see TrailingEdgeLimits::base_length), and a
/// point repeating its neighbour at either end, and returns how many there were. `chord` is the
/// outline's size in its own units.
int set_aside_base_points(OutlineWork& w, double chord);

/// Throws InputError (naming `raw`'s lines) when the ends of `w` (base points set aside) do not
/// look like a trailing edge: there both surfaces leave towards the nose, so their first
/// segments point within 90 degrees of each other; a loop that starts at a round nose leaves it
/// in nearly opposite directions.
void check_ends_at_trailing_edge(const RawOutline& raw, const OutlineWork& w);

/// Closes the trailing edge of `w` (in chord units): a gap of at most sharp_gap is made exact,
/// a blunt one gets a wedge or a fairing ending at a tip added first and last. Returns
/// what was done (gap in chords, form, tip distance behind the trailing-edge centre).
TrailingEdgeClosure close_trailing_edge(OutlineWork& w);

}  // namespace veer
