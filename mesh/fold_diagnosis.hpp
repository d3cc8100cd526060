#pragma once
/// Why a C-grid folded, in terms of the section outline: which region of the outline (and file
/// line) lies under the fold, the geometric cause found there, and advice that fits it.
#include <string>
#include <vector>

#include "mesh/cgrid.hpp"
#include "mesh/section.hpp"

namespace veer {

/// Limits of the causes looked for within a few surface cells of the fold.
struct FoldCauseLimits {
    static constexpr int reach = 6;  ///< surface nodes either side of the fold examined
    /// Lines marched out from a concave bend of radius R meet near its centre, R from the wall:
    /// a bend whose radius is below this many times the distance at which the layers folded
    /// explains the fold.
    static constexpr double concave_radius_to_distance = 2.0;
    static constexpr double corner_degrees = 25.0;     ///< a turn this sharp at one node
    static constexpr double near_trailing_edge = 0.1;  ///< chords: a wake fold this close
};

/// A one-line message for `fold`, thrown by generate_cgrid on the wall nodes `surface` sampled
/// from `section` with `spec`: "mesh: the C-grid folds at cell (i, j) near (x, y), <region>;
/// <cause>; <advice>". The region names the surface and x, the nose, the trailing-edge closure
/// veer added, or the wake, with the nearest file line; the cause is a concave bend tighter
/// than the distance from the wall at which the layers folded, a corner of the outline, or the
/// trailing-edge tip; without one of those the generic remedies (more normal cells, a smaller first
/// cell or far field, more cells around) are given.
std::string explain_fold(const GridFoldError& e, const Section& section,
                         const std::vector<Vec2>& surface, const CGridSpec& spec);

}  // namespace veer
