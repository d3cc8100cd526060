#pragma once
/// An expensive validation result computed once and shared by the tests of a group. CTest runs
/// every test in its own process, so a fixture's SetUpTestSuite alone recomputes it per test;
/// here the result is a folder under the build tree (VEER_VALIDATION_CACHE_DIR), stamped with
/// what produced it: this test executable (path, size, modification time) and a text naming the
/// inputs. A rebuilt executable or other inputs recompute it; concurrent processes wait on a
/// lock file, so with `ctest -j2` the second test reuses the first one's result.
#include <fcntl.h>
#include <sys/file.h>
#include <unistd.h>

#include <chrono>
#include <filesystem>
#include <fstream>
#include <functional>
#include <iostream>
#include <sstream>
#include <stdexcept>
#include <string>

namespace veer::test {

/// What produced a result: this executable and the caller's inputs.
inline std::string result_stamp(const std::string& inputs) {
    namespace fs = std::filesystem;
    const fs::path exe = fs::read_symlink("/proc/self/exe");
    std::ostringstream s;
    s << exe.string() << " " << fs::file_size(exe) << " "
      << fs::last_write_time(exe).time_since_epoch().count() << "\n"
      << inputs;
    return s.str();
}

/// The folder of result `name`: computed by `compute(folder)` into a fresh folder unless an
/// earlier call with the same executable and `inputs` finished it. `compute` that throws leaves
/// no stamp, so the next call tries again.
inline std::filesystem::path computed_once(
    const std::string& name, const std::string& inputs,
    const std::function<void(const std::filesystem::path&)>& compute) {
    namespace fs = std::filesystem;
    const fs::path base = VEER_VALIDATION_CACHE_DIR;
    fs::create_directories(base);
    const fs::path dir = base / name, stamp_file = base / (name + ".stamp");
    const int lock = ::open((base / (name + ".lock")).c_str(), O_CREAT | O_RDWR, 0644);
    if (lock < 0 || ::flock(lock, LOCK_EX) != 0)
        throw std::runtime_error("cannot lock " + (base / (name + ".lock")).string());
    struct Unlock {
        int fd;
        ~Unlock() { ::close(fd); }  // closing releases the lock
    } unlock{lock};
    const std::string stamp = result_stamp(inputs);
    std::ifstream in(stamp_file);
    const std::string found((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
    if (found == stamp && fs::is_directory(dir)) {
        std::cout << "reusing the result computed earlier by this build: " << dir.string() << "\n";
        return dir;
    }
    fs::remove(stamp_file);
    fs::remove_all(dir);
    fs::create_directories(dir);
    const auto start = std::chrono::steady_clock::now();
    compute(dir);
    std::ofstream(stamp_file) << stamp;
    std::cout << "computed " << dir.string() << " in "
              << std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count()
              << " s (shared with the other tests of the group)\n";
    return dir;
}

}  // namespace veer::test
