#include "io/output_dir.hpp"

#include <fstream>
#include <sstream>

#include "io/atomic_file.hpp"
#include "io/input_file.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace fs = std::filesystem;

namespace {
constexpr const char* stamp_name = ".veer-case.toml";

std::string read_all(const fs::path& p) { return read_input_file(p, "study stamp", case_file_cap); }

/// True when `dir` holds nothing but its lock file.
bool holds_nothing(const fs::path& dir) {
    std::error_code ec;
    for (const fs::directory_entry& e : fs::directory_iterator(dir, ec))
        if (e.path().filename() != FolderLock::file_name) return false;
    return true;
}
}  // namespace

FolderLock prepare_output_dir(const fs::path& dir, const std::string& case_text, bool force) {
    std::error_code ec;
    if (fs::exists(dir, ec) && !fs::is_directory(dir, ec))
        throw InputError(dir.string() + ": exists and is not a folder; choose another -o");
    fs::create_directories(dir, ec);
    if (ec) throw InputError(dir.string() + ": cannot create the folder: " + ec.message());
    FolderLock lock(dir);  // before looking inside: a second run started at once stops here
    const fs::path stamp = dir / stamp_name;
    const bool same_study = fs::exists(stamp, ec) && read_all(stamp) == case_text;
    if (!holds_nothing(dir) && !same_study && !force)
        throw InputError(dir.string() +
                         ": folder holds results of another study; choose another -o or "
                         "pass --force to write into it");
    for (const fs::directory_entry& e : fs::directory_iterator(dir, ec))
        if (e.is_regular_file(ec) && is_stale_temporary(e.path())) fs::remove(e.path(), ec);
    std::ofstream out(dir / stamp_name, std::ios::binary | std::ios::trunc);
    out << case_text;
    if (!out) throw InputError((dir / stamp_name).string() + ": cannot write into the folder");
    return lock;
}

std::optional<std::string> stamped_case_text(const fs::path& dir) {
    std::error_code ec;
    if (!fs::exists(dir / stamp_name, ec)) return std::nullopt;
    return read_all(dir / stamp_name);
}

}  // namespace veer
