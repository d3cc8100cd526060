#pragma once
/// Plain two-column section coordinate files.
#include <filesystem>

#include "mesh/raw_outline.hpp"

namespace veer {

/// Reads `x y` pairs (whitespace or comma separated), one per line. The first non-empty line may be
/// a title (anything that is not two numbers); blank lines and lines starting with '#' are skipped.
/// Fills `lines` with each point's 1-based line and `source` with the path. Throws a one-line
/// InputError: "FILE: cannot open", "FILE: no coordinates found (empty file)" or
/// "FILE:LINE: expected two numbers "x y", found "..."".
RawOutline read_coordinate_file(const std::filesystem::path& path);

}  // namespace veer
