#include "io/input_file.hpp"

#include <fcntl.h>
#include <fmt/format.h>
#include <sys/stat.h>
#include <unistd.h>

#include <cerrno>
#include <cstring>

#include "mesh/errors.hpp"

namespace veer {
namespace {

std::string kind_of(mode_t mode) {
    if (S_ISDIR(mode)) return "a folder";
    if (S_ISFIFO(mode)) return "a pipe (FIFO)";
    if (S_ISCHR(mode) || S_ISBLK(mode)) return "a device";
    if (S_ISSOCK(mode)) return "a socket";
    return "not a regular file";
}

std::string megabytes(std::uintmax_t bytes) {
    return std::to_string((bytes + (1u << 20) - 1) >> 20) + " MB";
}

/// Closes the descriptor on every path out of read_input_file.
struct Descriptor {
    int fd;
    ~Descriptor() {
        if (fd >= 0) ::close(fd);
    }
};

}  // namespace

std::string read_input_file(const std::filesystem::path& path, std::string_view what,
                            std::uintmax_t cap) {
    const std::string name = path.string();
    const std::string kind(what);
    // O_NONBLOCK: opening a FIFO without a writer returns at once instead of waiting for one;
    // the type check below then refuses it before any read.
    const Descriptor file{::open(path.c_str(), O_RDONLY | O_NONBLOCK | O_CLOEXEC)};
    if (file.fd < 0)
        throw InputError(name + ": cannot open the " + kind + " (" + std::strerror(errno) +
                         "); expected the path of a readable file");
    struct stat info {};
    if (::fstat(file.fd, &info) != 0)
        throw InputError(name + ": cannot read the " + kind + " (" + std::strerror(errno) + ")");
    if (!S_ISREG(info.st_mode))
        throw InputError(name + ": is " + kind_of(info.st_mode) + "; expected the " + kind +
                         " as a regular file");
    const auto size = static_cast<std::uintmax_t>(info.st_size);
    if (size > cap)
        throw InputError(name + ": " + megabytes(size) + " is too large for a " + kind +
                         " (at most " + megabytes(cap) + "); is this the right file?");
    std::string text;
    text.reserve(static_cast<std::size_t>(size));
    char buffer[1 << 16];
    for (;;) {
        const ssize_t got = ::read(file.fd, buffer, sizeof buffer);
        if (got < 0 && (errno == EINTR || errno == EAGAIN)) continue;
        if (got < 0)
            throw InputError(
                fmt::format("{}: reading the {} failed ({})", name, kind, std::strerror(errno)));
        if (got == 0) break;
        text.append(buffer, static_cast<std::size_t>(got));
        if (text.size() > cap)  // the file grew while being read
            throw InputError(fmt::format("{}: more than {} for a {}; is this the right file?", name,
                                         megabytes(cap), kind));
    }
    return text;
}

}  // namespace veer
