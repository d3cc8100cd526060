#pragma once
/// Shared helpers of the app tests: a scratch folder per test, small files written by hand.
#include <gtest/gtest.h>
#include <unistd.h>

#include <filesystem>
#include <fstream>
#include <string>

namespace veer::test {

/// A fresh empty folder under the system temp dir, named after the running test, removed after.
class AppScratch {
public:
    AppScratch() {
        const auto* info = ::testing::UnitTest::GetInstance()->current_test_info();
        m_path = std::filesystem::temp_directory_path() /
                 (std::string("veer_app_") + info->test_suite_name() + "_" + info->name() + "_" +
                  std::to_string(::getpid()));
        std::filesystem::remove_all(m_path);
        std::filesystem::create_directories(m_path);
    }
    ~AppScratch() {
        std::error_code ec;
        std::filesystem::remove_all(m_path, ec);
    }
    AppScratch(const AppScratch&) = delete;
    AppScratch& operator=(const AppScratch&) = delete;
    const std::filesystem::path& path() const { return m_path; }
    std::filesystem::path operator/(const std::string& name) const { return m_path / name; }

private:
    std::filesystem::path m_path;
};

inline void write_text(const std::filesystem::path& p, const std::string& text) {
    std::filesystem::create_directories(p.parent_path());
    std::ofstream(p) << text;
}

inline std::string read_text(const std::filesystem::path& p) {
    std::ifstream in(p);
    return {std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>()};
}

/// Whether a file starts with the PNG signature.
inline bool is_png(const std::filesystem::path& p) {
    std::ifstream in(p, std::ios::binary);
    char head[8] = {};
    in.read(head, 8);
    return in && std::string(head + 1, 3) == "PNG";
}

/// A tiny laminar case (a coarse grid: the sweep tests never step the solver on it).
inline std::string tiny_case_text() {
    return "[geometry]\nnaca = \"0012\"\n[mesh]\naround = 32\nnormal = 8\nwake = 8\n"
           "far_field = 10\nfirst_cell = 1e-2\n[flow]\nreynolds = 1000\nalpha = 0\n"
           "model = \"laminar\"\n[run]\nmode = \"steady\"\nsteps = 5\n";
}

/// A small case that converges in a few hundred steady iterations (a second or so): for tests
/// that run `veer run` or `veer sweep` end to end and read what they print or write.
inline std::string quick_case_text() {
    return "[geometry]\nnaca = \"0012\"\n[mesh]\naround = 64\nnormal = 24\nwake = 12\n"
           "far_field = 10\nfirst_cell = 5e-3\n[flow]\nreynolds = 200\nalpha = 0\n"
           "model = \"laminar\"\n[run]\nsteps = 400\n";
}

}  // namespace veer::test
