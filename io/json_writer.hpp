#pragma once
/// JSON result files (summaries, mesh reports): written whole or not at all.
#include <filesystem>
#include <nlohmann/json.hpp>

namespace veer {

/// Writes `value` to `path`, pretty-printed (2-space indent, trailing newline), through a temporary
/// file renamed into place. Non-finite numbers become null (JSON has no NaN); invalid UTF-8 in
/// strings is replaced, not thrown. Throws InputError naming the file if it cannot be written.
void write_json_file(const std::filesystem::path& path, const nlohmann::json& value);

/// Reads a JSON file. Throws InputError naming the file when it is missing or not valid JSON
/// (with the byte offset of the first error).
nlohmann::json read_json_file(const std::filesystem::path& path);

}  // namespace veer
