#pragma once
/// An airfoil section outline in chord units.
#include <string>
#include <vector>

#include "mesh/vec2.hpp"

namespace veer {

/// A closed section outline with a sharp trailing edge, unit chord, leading edge at the origin and
/// trailing edge at (1, 0). Points run from the trailing edge along the lower surface to the leading
/// edge and back along the upper surface; the trailing-edge point appears first and last.
struct Section {
    std::string name;
    std::vector<Vec2> points;
    /// Index of the leading-edge point in `points`.
    std::size_t leading_edge = 0;
    /// Trailing-edge gap of the source data before closing (chords); 0 for a sharp source.
    double source_te_gap = 0.0;
};

}  // namespace veer
