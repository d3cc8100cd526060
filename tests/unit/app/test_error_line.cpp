// Whatever an error message holds, the user sees one line of bounded length that keeps where the
// problem is (its start) and what would be right (its end).
#include <gtest/gtest.h>

#include <string>

#include "app/error_line.hpp"

namespace veer {
namespace {

TEST(ErrorLine, ShortMessagesPassUnchanged) {
    EXPECT_EQ(one_line("case.toml:3: [run] cfl = -1; expected 0 or more", 300),
              "case.toml:3: [run] cfl = -1; expected 0 or more");
}

TEST(ErrorLine, ControlCharactersBecomeSpaces) {
    EXPECT_EQ(one_line(std::string("a\nb\rc\0d\x1b", 8), 300), "a b c d ");
}

TEST(ErrorLine, LongValuesAreShortenedKeepingBothEnds) {
    const std::string message =
        "case.toml:7: [geometry] name = \"" + std::string(2'000'000, 'x') + "\"; expected a label";
    const std::string line = one_line(message, 300);
    EXPECT_LE(line.size(), 300u);
    EXPECT_EQ(line.rfind("case.toml:7: [geometry] name", 0), 0u) << line;
    EXPECT_NE(line.find("\u2026"), std::string::npos) << line;
    EXPECT_EQ(line.substr(line.size() - 18), "; expected a label") << line;
}

TEST(ErrorLine, NeverSplitsAUtf8Character) {
    std::string message;
    for (int k = 0; k < 400; ++k) message += "\u00e9";  // two bytes each
    const std::string line = one_line(message, 301);
    EXPECT_LE(line.size(), 301u);
    for (std::size_t k = 0; k < line.size(); ++k) {
        const auto c = static_cast<unsigned char>(line[k]);
        if (c == 0xC3) {  // a lead byte is always followed by its continuation
            ASSERT_LT(k + 1, line.size());
            EXPECT_EQ(static_cast<unsigned char>(line[k + 1]) & 0xC0, 0x80);
        }
    }
    EXPECT_NE(static_cast<unsigned char>(line[0]) & 0xC0, 0x80);
    EXPECT_NE(static_cast<unsigned char>(line.back()) & 0xC0, 0xC0);  // no dangling lead byte
}

}  // namespace
}  // namespace veer
