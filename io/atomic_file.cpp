#include "io/atomic_file.hpp"

#include <fcntl.h>
#include <unistd.h>

#include <fstream>
#include <system_error>

#include "mesh/errors.hpp"

namespace veer {
namespace fs = std::filesystem;

fs::path temporary_path_for(const fs::path& target) {
    std::string name = target.filename().string();
    name.append(".").append(std::to_string(::getpid())).append(".tmp");
    return target.parent_path() / name;
}

bool is_stale_temporary(const fs::path& file) {
    const std::string name = file.filename().string();
    const std::string end = ".tmp";
    if (name.size() <= end.size() || name.compare(name.size() - end.size(), end.size(), end) != 0)
        return false;
    const std::string stem = name.substr(0, name.size() - end.size());
    const std::size_t dot = stem.rfind('.');
    if (dot == std::string::npos || dot + 1 == stem.size()) return false;
    const std::string pid = stem.substr(dot + 1);
    if (pid.find_first_not_of("0123456789") != std::string::npos) return false;
    return pid != std::to_string(::getpid());
}

namespace {
// Without fsync a crash soon after the rename could leave the new name pointing at data that never
// reached the disk; the rename is then no guarantee at all. File systems that allocate late report
// a full disk only here, so a failed fsync is a failed write.
bool flush_to_disk(const fs::path& file) {
    const int fd = ::open(file.c_str(), O_RDONLY);
    if (fd < 0) return true;  // the rename below reports a missing file
    const bool flushed = ::fsync(fd) == 0;
    ::close(fd);
    return flushed;
}
}  // namespace

void commit_temporary(const fs::path& tmp, const fs::path& target) {
    std::error_code ec;
    if (!flush_to_disk(tmp)) {
        fs::remove(tmp, ec);
        throw InputError(target.string() + ": the new version (" + tmp.string() +
                         ") did not reach the disk (is it full?); the previous file is kept");
    }
    fs::rename(tmp, target, ec);
    if (ec) {
        const std::string why = ec.message();  // before remove() reuses ec
        fs::remove(tmp, ec);
        throw InputError(target.string() + ": cannot replace the file with its new version (" +
                         tmp.string() + "): " + why);
    }
}

void write_text_atomically(const fs::path& target, std::string_view text) {
    const fs::path tmp = temporary_path_for(target);
    {
        std::ofstream out(tmp, std::ios::binary | std::ios::trunc);
        if (!out)
            throw InputError(target.string() + ": cannot open " + tmp.string() + " for writing");
        out.write(text.data(), static_cast<std::streamsize>(text.size()));
        out.close();
        if (!out) {
            std::error_code ec;
            fs::remove(tmp, ec);
            throw InputError(target.string() + ": writing " + tmp.string() +
                             " failed (disk full?)");
        }
    }
    commit_temporary(tmp, target);
}

}  // namespace veer
