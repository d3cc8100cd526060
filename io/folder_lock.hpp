#pragma once
/// A lock on an output folder for the lifetime of one run, so that two runs never write into one
/// folder at once (they would mix their frames and histories). The lock is an advisory flock() on
/// DIR/.veer-lock, which holds the owner's pid, host and start time for the refusal message. The
/// kernel drops the lock when its process dies, so the lock of a killed run is stale at once and
/// the next run takes it over.
#include <filesystem>

namespace veer {

class FolderLock {
public:
    /// Takes the lock of the existing folder `dir`. Throws InputError naming the folder and the
    /// run that holds it (pid, host, start time) when another process has it.
    explicit FolderLock(const std::filesystem::path& dir);
    /// Releases the lock and removes the lock file.
    ~FolderLock();
    FolderLock(FolderLock&& other) noexcept;
    FolderLock(const FolderLock&) = delete;
    FolderLock& operator=(const FolderLock&) = delete;
    FolderLock& operator=(FolderLock&&) = delete;

    /// The lock file's name inside the folder.
    static constexpr const char* file_name = ".veer-lock";

private:
    std::filesystem::path m_file;
    int m_fd = -1;
};

}  // namespace veer
