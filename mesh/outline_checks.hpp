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
    /// Consecutive points closer than this (chords) count as repeated.
    static constexpr double duplicate_distance = 1e-12;
    /// Non-adjacent segments closer than this (chords) count as crossing.
    static constexpr double crossing_distance = 1e-9;
    /// A turn of more than this between consecutive segments away from the trailing edge is a
    /// reversal (degrees); a coarse leading edge of a thin section turns by well under 130.
    static constexpr double max_turn_degrees = 150.0;
};

/// "SOURCE:LINE" where the outline has file lines, else "SOURCE (point K)" with K 1-based.
std::string outline_location(const RawOutline& raw, std::size_t k);

/// Throws a one-line InputError naming the source (and file line) for the first failed check:
/// too few points, repeated consecutive points, an outline that does not close, a sharp reversal
/// away from the trailing edge, a self-intersection.
void check_outline(const RawOutline& raw);

}  // namespace veer
