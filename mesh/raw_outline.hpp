#pragma once
/// A section outline as read or generated, before it is checked and normalised into a Section.
#include <cstddef>
#include <optional>
#include <string>
#include <vector>

#include "mesh/vec2.hpp"

namespace veer {

/// Points of an outline in the source's own units and orientation, starting at the trailing edge
/// and running once around the section (either direction).
struct RawOutline {
    std::vector<Vec2> points;
    /// 1-based line of the source file for each point; empty when the outline was generated.
    std::vector<int> lines;
    /// Where the points came from, for messages: a file path or e.g. "naca 0012".
    std::string source;
    /// Index of the leading-edge point where the source defines it (a NACA section's nose, the
    /// origin of its chord line); empty: make_section takes the point farthest from the
    /// trailing-edge midpoint.
    std::optional<std::size_t> leading_edge = std::nullopt;
    /// How a file was laid out (e.g. "one closed loop"), for reports; empty when generated.
    std::string layout;
};

}  // namespace veer
