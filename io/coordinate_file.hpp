#pragma once
/// Section coordinate files: two columns x y, in one of the layouts of coordinate_layout.hpp.
#include <filesystem>

#include "mesh/raw_outline.hpp"

namespace veer {

/// Reads `x y` pairs (separated by spaces, tabs or a comma), one per line; line ends LF, CRLF
/// or CR. The first non-empty line may be a title (anything that is not two numbers); lines
/// starting with '#' are comments; blank lines separate blocks (see assemble_outline for the
/// layouts recognised). Fills `lines` with each point's 1-based line, `source` with the path and
/// `layout` with what was found. Throws a one-line InputError: "FILE: cannot open", "FILE: no
/// coordinates found (empty file)", "FILE:LINE: expected two numbers "x y", found "..."" or a
/// layout that is not read, listing those that are.
RawOutline read_coordinate_file(const std::filesystem::path& path);

}  // namespace veer
