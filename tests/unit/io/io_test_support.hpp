#pragma once
/// Shared helpers of the io tests: a scratch folder per test and a small distorted grid.
#include <gtest/gtest.h>

#include <cmath>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>

#include "mesh/structured_grid.hpp"

namespace veer::test {

/// A fresh empty folder under the system temp dir, named after the running test, removed after.
class ScratchDir {
public:
    ScratchDir() {
        const auto* info = ::testing::UnitTest::GetInstance()->current_test_info();
        m_path = std::filesystem::temp_directory_path() /
                 (std::string("veer_io_") + info->test_suite_name() + "_" + info->name());
        std::filesystem::remove_all(m_path);
        std::filesystem::create_directories(m_path);
    }
    ~ScratchDir() {
        std::error_code ec;
        std::filesystem::remove_all(m_path, ec);
    }
    ScratchDir(const ScratchDir&) = delete;
    ScratchDir& operator=(const ScratchDir&) = delete;
    const std::filesystem::path& path() const { return m_path; }
    std::filesystem::path operator/(const std::string& name) const { return m_path / name; }

private:
    std::filesystem::path m_path;
};

/// A curved, non-uniform block (a ring sector): coordinates with no short binary form, so a
/// lossy path (float, ASCII rounding) would show in a bit-for-bit comparison.
inline StructuredGrid curved_grid(int ni, int nj) {
    StructuredGrid grid(ni, nj);
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i) {
            const double r = 1.0 + 0.3 * std::pow(static_cast<double>(j) / nj, 1.7);
            const double theta = 0.9 * static_cast<double>(i) / ni + 0.01 * j;
            grid.node(i, j) = {r * std::cos(theta) / 3.0, r * std::sin(theta) / 7.0};
        }
    return grid;
}

inline std::string read_file_text(const std::filesystem::path& p) {
    std::ifstream in(p, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

}  // namespace veer::test
