#pragma once
/// The one way veer reads a whole input file (case files, coordinate tables, history, frame
/// lists, JSON records, report tables): only from a regular file, and never more than a cap.
/// A device (/dev/zero), a FIFO, a folder or an oversized file is refused at once with an
/// InputError naming the path and what was expected, so that a wrong path can neither hang a run
/// nor fill the machine's memory.
#include <cstdint>
#include <filesystem>
#include <string>
#include <string_view>

namespace veer {

/// Caps (bytes) for the kinds of file veer reads; generous for real inputs of each kind.
inline constexpr std::uintmax_t case_file_cap = 1u << 20;         ///< a case file: 1 MiB
inline constexpr std::uintmax_t coordinate_file_cap = 16u << 20;  ///< a section table: 16 MiB
inline constexpr std::uintmax_t record_file_cap = 512u << 20;     ///< history, tables, JSON

/// The whole content of `path`, a regular file of at most `cap` bytes. `what` names the kind of
/// file in messages ("case file", "coordinate file"). Throws InputError when the path is missing,
/// is not a regular file (after following symbolic links), is larger than `cap` or cannot be read.
std::string read_input_file(const std::filesystem::path& path, std::string_view what,
                            std::uintmax_t cap);

}  // namespace veer
