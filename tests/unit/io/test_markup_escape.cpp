#include <gtest/gtest.h>

#include "io/markup_escape.hpp"

namespace veer {
namespace {

TEST(MarkupEscape, ReplacesTheFourSpecialCharacters) {
    EXPECT_EQ(markup_escaped("a<b & \"c\">"), "a&lt;b &amp; &quot;c&quot;&gt;");
}

TEST(MarkupEscape, LeavesOrdinaryTextAndEscapesAmpersandsOnce) {
    EXPECT_EQ(markup_escaped("fields_0001.vts"), "fields_0001.vts");
    EXPECT_EQ(markup_escaped("&amp;"), "&amp;amp;");  // text, not markup: escaped as it stands
    EXPECT_EQ(markup_escaped(""), "");
}

}  // namespace
}  // namespace veer
