// One run per output folder: the second is refused with a message naming the first; the lock of a
// process that died is taken over (the kernel released it).
#include <fcntl.h>
#include <gtest/gtest.h>
#include <sys/file.h>
#include <unistd.h>

#include <chrono>
#include <fstream>
#include <string>
#include <thread>

#include "io/folder_lock.hpp"
#include "io/output_dir.hpp"
#include "io_test_support.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

TEST(FolderLock, ASecondLockOnTheFolderIsRefusedNamingTheFirst) {
    test::ScratchDir dir;
    const FolderLock first(dir.path());
    try {
        const FolderLock second(dir.path());
        ADD_FAILURE() << "two locks on one folder";
    } catch (const InputError& e) {
        const std::string why = e.what();
        EXPECT_NE(why.find("another veer run"), std::string::npos) << why;
        EXPECT_NE(why.find("pid " + std::to_string(::getpid())), std::string::npos) << why;
        EXPECT_NE(why.find("started 20"), std::string::npos) << why;
        EXPECT_NE(why.find(dir.path().string()), std::string::npos) << why;
    }
}

TEST(FolderLock, AHolderThatHasNotYetWrittenItsLineIsStillNamed) {
    // A run that has just taken the lock writes its line a moment later; one started at the same
    // moment must wait for the line rather than call the holder "still starting".
    test::ScratchDir dir;
    const std::string file = (dir / FolderLock::file_name).string();
    const int fd = ::open(file.c_str(), O_RDWR | O_CREAT | O_CLOEXEC, 0644);
    ASSERT_GE(fd, 0);
    ASSERT_EQ(::flock(fd, LOCK_EX | LOCK_NB), 0);
    std::thread writer([fd] {
        std::this_thread::sleep_for(std::chrono::milliseconds(50));
        const std::string line = "pid 4242 on elsewhere, started 2026-12-04 18:00:00 UTC\n";
        EXPECT_EQ(::pwrite(fd, line.data(), line.size(), 0), static_cast<ssize_t>(line.size()));
    });
    try {
        const FolderLock second(dir.path());
        ADD_FAILURE() << "two locks on one folder";
    } catch (const InputError& e) {
        const std::string why = e.what();
        EXPECT_NE(why.find("pid 4242"), std::string::npos) << why;
    }
    writer.join();
    ::close(fd);
}

TEST(FolderLock, ReleasedWithItsOwnerAndStaleFilesAreTakenOver) {
    test::ScratchDir dir;
    { const FolderLock first(dir.path()); }
    EXPECT_FALSE(std::filesystem::exists(dir / FolderLock::file_name));
    // A killed run leaves its lock file, but no process holds the lock any more.
    std::ofstream(dir / FolderLock::file_name) << "pid 999999 on elsewhere, started long ago\n";
    EXPECT_NO_THROW(FolderLock{dir.path()});
}

TEST(FolderLock, PrepareOutputDirHoldsTheLockAndRemovesStaleTemporaries) {
    test::ScratchDir dir;
    std::ofstream(dir / "history.csv.4242424.tmp") << "half a ro";  // a killed run's leftover
    std::ofstream(dir / "notes.tmp") << "the user's";               // not ours: kept
    const FolderLock held = prepare_output_dir(dir / ".", "case a", true);
    EXPECT_FALSE(std::filesystem::exists(dir / "history.csv.4242424.tmp"));
    EXPECT_TRUE(std::filesystem::exists(dir / "notes.tmp"));
    EXPECT_THROW((void)prepare_output_dir(dir.path(), "case a", true), InputError);
}

}  // namespace
}  // namespace veer
