#pragma once
/// The checks a raw outline must pass before it becomes a Section (used by make_section).
#include <string>

#include "mesh/raw_outline.hpp"

namespace veer {

/// Tolerances of the outline checks, relative to the outline's size (its largest distance from
/// the trailing-edge midpoint, about the chord).
struct OutlineTolerances {
    static constexpr std::size_t min_points = 20;
    /// First and last points at most this far apart (chords): one closed loop.
    static constexpr double max_closure_gap = 0.05;
    /// Consecutive points closer than this (chords) count as repeated: a spline cannot tell them
    /// apart from one point (the densest tables, 6 decimals at the nose, are 1e-5 apart).
    static constexpr double duplicate_distance = 1e-7;
    /// Non-adjacent segments closer than this (chords) count as crossing.
    static constexpr double crossing_distance = 1e-9;
    /// A turn of more than this between consecutive segments away from the trailing edge is a
    /// reversal (degrees); a coarse leading edge of a thin section turns by well under 130.
    static constexpr double max_turn_degrees = 150.0;
};

/// "SOURCE:LINE" where the outline has file lines, else "SOURCE (point K)" with K 1-based.
std::string outline_location(const RawOutline& raw, std::size_t k);

/// "(x, y)" with six significant digits.
std::string format_point(Vec2 p);

/// "line L (x, y)" where the outline has file lines, else "point K (x, y)".
std::string point_label(const RawOutline& raw, std::size_t k);

/// "; neighbours: <label of point first - 1>, <label of point last + 1>" (those that exist).
std::string neighbours_text(const RawOutline& raw, std::size_t first, std::size_t last);

/// Throws the InputError for a loop that starts and ends at the round nose instead of the
/// trailing edge; `first` is the source index of its first point.
[[noreturn]] void refuse_loop_start(const RawOutline& raw, std::size_t first);

/// Throws a one-line InputError naming the source (and file line) for the first failed check:
/// too few points, repeated consecutive points (a duplicated station), an outline that does not
/// close, a pair of points in reverse order or a sharp reversal away from the trailing edge, a
/// self-intersection. Each names the point(s) with their coordinates and neighbours.
void check_outline(const RawOutline& raw);

}  // namespace veer
