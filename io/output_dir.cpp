#include "io/output_dir.hpp"

#include <fstream>
#include <sstream>

#include "mesh/errors.hpp"

namespace veer {
namespace fs = std::filesystem;

namespace {
constexpr const char* stamp_name = ".veer-case.toml";

std::string read_all(const fs::path& p) {
    std::ifstream in(p, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}
}  // namespace

void prepare_output_dir(const fs::path& dir, const std::string& case_text, bool force) {
    std::error_code ec;
    if (fs::exists(dir, ec)) {
        if (!fs::is_directory(dir, ec))
            throw InputError(dir.string() + ": exists and is not a folder; choose another -o");
        const bool empty = fs::is_empty(dir, ec);
        const fs::path stamp = dir / stamp_name;
        const bool same_study = fs::exists(stamp, ec) && read_all(stamp) == case_text;
        if (!empty && !same_study && !force)
            throw InputError(dir.string() +
                             ": folder holds results of another study; choose another -o or "
                             "pass --force to write into it");
    } else {
        fs::create_directories(dir, ec);
        if (ec) throw InputError(dir.string() + ": cannot create the folder: " + ec.message());
    }
    std::ofstream out(dir / stamp_name, std::ios::binary | std::ios::trunc);
    out << case_text;
    if (!out) throw InputError((dir / stamp_name).string() + ": cannot write into the folder");
}

std::optional<std::string> stamped_case_text(const fs::path& dir) {
    std::error_code ec;
    if (!fs::exists(dir / stamp_name, ec)) return std::nullopt;
    return read_all(dir / stamp_name);
}

}  // namespace veer
