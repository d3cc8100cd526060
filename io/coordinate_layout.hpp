#pragma once
/// The layouts of section coordinate files: how blocks of points become one outline.
#include <string>
#include <vector>

#include "mesh/raw_outline.hpp"

namespace veer {

/// A point of a coordinate file with its 1-based line.
struct FilePoint {
    Vec2 point;
    int line = 0;
};

/// Points of a file in the order read, in blocks separated by blank lines.
struct FileBlocks {
    std::string source;                          ///< the path, for messages
    std::vector<std::vector<FilePoint>> blocks;  ///< never empty blocks
};

/// What veer reads, for messages that refuse a layout.
inline constexpr const char* k_layouts_read =
    "veer reads one closed loop (from the trailing edge around the section back to it, either "
    "direction) or two surfaces listed separately, each from the leading edge to the trailing "
    "edge (or each the other way), separated by a blank line or announced by a first line with "
    "the two point counts";

/// Recognises the layout of `b` and returns the outline, starting at a trailing edge, with
/// `layout` describing what was found. A first block of one point with two whole numbers that
/// match the sizes of what follows is a count line. Blocks that continue one another (the
/// next starts within three of the neighbouring steps of where the last ended) are one run of
/// points, and so are blocks that together close on themselves; two runs that share an end are two
/// surfaces (a repeated shared leading-edge point is kept once). Throws InputError naming the file
/// and lines for anything else.
RawOutline assemble_outline(const FileBlocks& b);

}  // namespace veer
