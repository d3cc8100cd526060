#pragma once
/// The shipped case files (cases/*.toml, found by listing the folder, so a new case is picked up),
/// in name order.
#include <algorithm>
#include <filesystem>
#include <vector>

namespace veer::test {

inline std::vector<std::filesystem::path> shipped_cases() {
    std::vector<std::filesystem::path> cases;
    for (const auto& entry :
         std::filesystem::directory_iterator(std::filesystem::path(VEER_SOURCE_DIR) / "cases"))
        if (entry.path().extension() == ".toml") cases.push_back(entry.path());
    std::sort(cases.begin(), cases.end());
    return cases;
}

}  // namespace veer::test
