// What a shipped case tells its reader: `veer check` finds nothing to warn about in its own
// settings, and the figures its comments state agree with each other and with the case. Each case
// ends with a "# Figures" block (length, speed, kinematic viscosity, speed of sound, then the
// Reynolds and Mach numbers worked out); this test redoes the arithmetic.
#include <gtest/gtest.h>

#include <algorithm>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <regex>
#include <sstream>
#include <string>
#include <vector>

#include "app/commands.hpp"
#include "io/case_file.hpp"
#include "shipped_cases.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

using test::shipped_cases;

std::string text_of(const fs::path& p) {
    std::ifstream in(p);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

/// The first number captured by `pattern` in `text`; fails the test when there is none.
double number_after(const std::string& text, const std::string& pattern) {
    std::smatch m;
    if (!std::regex_search(text, m, std::regex(pattern))) {
        ADD_FAILURE() << "no match for " << pattern;
        return 0.0;
    }
    return std::stod(m[1].str());
}

TEST(CaseFigures, NoShippedCaseWarnsUnderCheck) {
    const std::vector<fs::path> cases = shipped_cases();
    ASSERT_GE(cases.size(), 5u);
    for (const fs::path& c : cases) {
        SCOPED_TRACE(c.filename().string());
        testing::internal::CaptureStdout();
        const int code = run_check_command({c, {}});
        std::fflush(stdout);
        const std::string out = testing::internal::GetCapturedStdout();
        EXPECT_EQ(code, 0) << out;
        EXPECT_NE(out.find("valid case"), std::string::npos) << out;  // it did print its table
        EXPECT_EQ(out.find("warning"), std::string::npos) << out;
    }
}

TEST(CaseFigures, EachCaseShowsConsistentReynoldsAndMachArithmetic) {
    const std::vector<fs::path> cases = shipped_cases();
    ASSERT_GE(cases.size(), 5u);
    for (const fs::path& c : cases) {
        SCOPED_TRACE(c.filename().string());
        const std::string text = text_of(c);
        const std::size_t at = text.find("# Figures");
        ASSERT_NE(at, std::string::npos) << "no '# Figures' block";
        const std::string figures = text.substr(at);
        const double length = number_after(figures, R"((?:chord|diameter) ([0-9.eE+-]+) m,)");
        const double speed = number_after(figures, R"(speed ([0-9.eE+-]+) m/s;)");
        const double nu = number_after(figures, R"(kinematic viscosity ([0-9.eE+-]+) m\^2/s)");
        const double sound = number_after(figures, R"(speed of sound ([0-9.]+) m/s)");
        const double re_stated = number_after(figures, R"(Re = [^=]+= ([0-9.eE+-]+))");
        const double mach_stated = number_after(figures, R"(Mach = [^=]+= ([0-9.eE+-]+))");
        ASSERT_GT(nu, 0.0);
        ASSERT_GT(sound, 0.0);
        const double re = length * speed / nu;
        const double mach = speed / sound;
        // The stated results are rounded to two or three figures (1 % and 5 % cover that).
        EXPECT_NEAR(re_stated, re, 0.01 * re);
        EXPECT_NEAR(mach_stated, mach, 0.05 * mach);
        // The case's own Reynolds number is the stated one rounded for the key (3 %).
        const CaseSpec spec = read_case_file(c);
        EXPECT_NEAR(spec.flow.reynolds, re, 0.03 * re);
        // Incompressible: the README's limit (Mach roughly below 0.3, common practice); above
        // 0.1 the case must say what compressibility would change.
        EXPECT_LT(mach, 0.3);
        if (mach > 0.1) {
            EXPECT_NE(text.find("Prandtl-Glauert"), std::string::npos);
        }
        // Only a transition demo may speak of transition (the SA cases are fully turbulent).
        if (c.stem().string().find("transition") == std::string::npos) {
            EXPECT_EQ(text.find("transition"), std::string::npos);
        }
    }
}

}  // namespace
}  // namespace veer
