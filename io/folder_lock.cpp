#include "io/folder_lock.hpp"

#include <fcntl.h>
#include <sys/file.h>
#include <sys/stat.h>
#include <unistd.h>

#include <cerrno>
#include <chrono>
#include <cstring>
#include <ctime>
#include <string>
#include <thread>

#include "mesh/errors.hpp"

namespace veer {
namespace fs = std::filesystem;
namespace {

std::string owner_line() {
    char host[256] = "unknown host";
    ::gethostname(host, sizeof host - 1);
    const std::time_t now = std::time(nullptr);
    char when[32] = "";
    std::tm utc{};
    ::gmtime_r(&now, &utc);
    std::strftime(when, sizeof when, "%Y-%m-%d %H:%M:%S UTC", &utc);
    return "pid " + std::to_string(::getpid()) + " on " + host + ", started " + when;
}

/// What the holder wrote into the lock file (its first line, bounded). A holder writes its line
/// just after taking the lock, so an empty file is read again for up to half a second: two runs
/// started at once otherwise met an empty file in about one try of thirty.
std::string holder_of(int fd) {
    for (int attempt = 0; attempt < 100; ++attempt) {
        char text[512] = "";
        const ssize_t got = ::pread(fd, text, sizeof text - 1, 0);
        std::string line(text, got > 0 ? static_cast<std::size_t>(got) : 0);
        line = line.substr(0, line.find('\n'));
        if (!line.empty()) return line;
        std::this_thread::sleep_for(std::chrono::milliseconds(5));
    }
    return "a run that is still starting";
}

/// True when `fd` is still the file at `path` (a releasing run may have just removed it).
bool same_file(int fd, const fs::path& path) {
    struct stat open_file {
    }, named{};
    return ::fstat(fd, &open_file) == 0 && ::stat(path.c_str(), &named) == 0 &&
           open_file.st_ino == named.st_ino && open_file.st_dev == named.st_dev;
}

}  // namespace

FolderLock::FolderLock(const fs::path& dir) : m_file(dir / file_name) {
    for (int attempt = 0; attempt < 20; ++attempt) {
        const int fd = ::open(m_file.c_str(), O_RDWR | O_CREAT | O_CLOEXEC, 0644);
        if (fd < 0)
            throw InputError(dir.string() + ": cannot create the lock file " + file_name + " (" +
                             std::strerror(errno) + "); choose a folder you can write to");
        if (::flock(fd, LOCK_EX | LOCK_NB) != 0) {
            const std::string holder = holder_of(fd);
            ::close(fd);
            throw InputError(dir.string() + ": another veer run is writing into this folder (" +
                             holder + "); wait for it to finish or choose another -o");
        }
        if (!same_file(fd, m_file)) {  // taken over a file its owner removed meanwhile: again
            ::close(fd);
            continue;
        }
        const std::string line = owner_line() + "\n";
        if (::ftruncate(fd, 0) != 0 ||
            ::pwrite(fd, line.data(), line.size(), 0) != static_cast<ssize_t>(line.size())) {
            ::close(fd);
            throw InputError(dir.string() + ": cannot write the lock file " + file_name +
                             " (disk full?)");
        }
        m_fd = fd;
        return;
    }
    throw InputError(dir.string() + ": the lock file " + file_name +
                     " keeps changing; is another run starting and stopping here?");
}

FolderLock::FolderLock(FolderLock&& other) noexcept
    : m_file(std::move(other.m_file)), m_fd(other.m_fd) {
    other.m_fd = -1;
}

FolderLock::~FolderLock() {
    if (m_fd < 0) return;
    ::unlink(m_file.c_str());  // before the unlock, so no one locks a file about to vanish
    ::close(m_fd);
}

}  // namespace veer
