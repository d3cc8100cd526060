#pragma once
/// Writing an output file so that readers only ever see a complete one: write a temporary file
/// next to the target, flush it to disk, then rename it over the target (atomic on POSIX).
#include <filesystem>
#include <string_view>

namespace veer {

/// The temporary name used while `target` is being written: `target` + ".PID.tmp" with this
/// process's id, in the same folder (a rename within one folder is atomic). Two processes never
/// share a temporary file; one process gets the same name for a target each time.
std::filesystem::path temporary_path_for(const std::filesystem::path& target);

/// True for a temporary file of the form NAME.PID.tmp written by another process: in a folder
/// this run has locked (io/folder_lock.hpp), the leftover of a run that was killed mid-write.
bool is_stale_temporary(const std::filesystem::path& file);

/// Flushes the finished temporary file `tmp` to disk and renames it over `target`, replacing any
/// earlier file. Throws InputError naming `target` if the rename fails (the old file then stays).
void commit_temporary(const std::filesystem::path& tmp, const std::filesystem::path& target);

/// Writes `text` to `target` through a temporary file (see commit_temporary). Throws InputError
/// naming the file if it cannot be written.
void write_text_atomically(const std::filesystem::path& target, std::string_view text);

}  // namespace veer
