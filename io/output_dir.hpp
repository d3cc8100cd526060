#pragma once
/// The run or mesh output folder: created if missing, never silently reused for another study.
#include <filesystem>
#include <optional>
#include <string>

#include "io/folder_lock.hpp"

namespace veer {

/// Prepares `dir` for the outputs of the case whose text is `case_text`.
/// A missing or empty folder is created; a folder written earlier for the same case (its stamp file
/// holds the same case text) is reused; any other non-empty folder is refused with an InputError
/// unless `force` is set. The folder is locked before it is inspected (io/folder_lock.hpp): while
/// the returned lock lives, another run into `dir` is refused. Writes the stamp file.
[[nodiscard]] FolderLock prepare_output_dir(const std::filesystem::path& dir,
                                            const std::string& case_text, bool force);

/// The case text stamped in a folder by prepare_output_dir; nullopt when it has none.
std::optional<std::string> stamped_case_text(const std::filesystem::path& dir);

}  // namespace veer
