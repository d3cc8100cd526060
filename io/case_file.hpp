#pragma once
/// Reads and validates a TOML case file. Every error names the file, the line, the key, the value
/// found and what is allowed.
#include <filesystem>
#include <string>
#include <vector>

#include "io/case_spec.hpp"

namespace veer {

/// A case file's text, read once, and where it came from.
struct CaseSource {
    std::filesystem::path path;
    std::string text;
};

/// Reads the text of the case file `path`. Throws InputError naming it when it cannot be read.
CaseSource read_case_source(const std::filesystem::path& path);

/// The case of `source` with `overrides` applied (read_case_file without reading the file
/// again: a sweep derives each point's case from the text it read once).
CaseSpec parse_case_source(const CaseSource& source, const std::vector<std::string>& overrides);

/// Reads `path`, applies `overrides` ("table.key=value", the value in TOML syntax, e.g.
/// "flow.alpha=6" or "geometry.naca=\"4412\"") and validates the result. Throws InputError.
CaseSpec read_case_file(const std::filesystem::path& path,
                        const std::vector<std::string>& overrides = {});

/// Whether the files a case names (coordinates) must exist: a restart takes its grid from the
/// checkpoint and no longer needs them.
enum class FileCheck { require, skip };

/// Same, from text; `source` names it in messages and `base_dir` resolves relative paths.
CaseSpec parse_case_text(const std::string& text, const std::string& source,
                         const std::filesystem::path& base_dir,
                         const std::vector<std::string>& overrides = {},
                         FileCheck files = FileCheck::require);

}  // namespace veer
