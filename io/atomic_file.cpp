#include "io/atomic_file.hpp"

#include <fcntl.h>
#include <unistd.h>

#include <fstream>
#include <system_error>

#include "mesh/errors.hpp"

namespace veer {
namespace fs = std::filesystem;

fs::path temporary_path_for(const fs::path& target) {
    fs::path tmp = target;
    tmp += ".tmp";
    return tmp;
}

namespace {
// Without fsync a crash soon after the rename could leave the new name pointing at data that never
// reached the disk; the rename is then no guarantee at all.
void flush_to_disk(const fs::path& file) {
    const int fd = ::open(file.c_str(), O_RDONLY);
    if (fd < 0) return;  // the rename below reports a missing file
    ::fsync(fd);
    ::close(fd);
}
}  // namespace

void commit_temporary(const fs::path& tmp, const fs::path& target) {
    flush_to_disk(tmp);
    std::error_code ec;
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
