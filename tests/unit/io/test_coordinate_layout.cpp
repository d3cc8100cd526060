// The layouts of coordinate files: one closed loop in any of its common dresses, two surfaces
// with or without a count line; all give the same section, and anything else is refused with
// what veer reads.
#include <gtest/gtest.h>

#include <algorithm>
#include <filesystem>

#include "io/coordinate_file.hpp"
#include "mesh/errors.hpp"
#include "mesh/section_builder.hpp"
#include "tests/support/naca_tables.hpp"

namespace veer {
namespace {

// NACA 4412 from the formula (Abbott & von Doenhoff 1959, section 6.4 [T]) at 35 cosine-spaced
// stations per surface, 5 decimals: a coarse table as a report would print it.
const test::Surfaces& table_4412() {
    static const test::Surfaces s =
        test::naca_surfaces({0.04, 0.4, 0.12}, test::cosine_stations(35));
    return s;
}

std::filesystem::path write(const std::string& name, const std::string& text) {
    return test::write_table(std::filesystem::path(testing::TempDir()) / name, text);
}

std::string rows(const std::vector<Vec2>& p) { return test::table_text(p, 5); }

std::vector<Vec2> reversed(std::vector<Vec2> p) {
    std::reverse(p.begin(), p.end());
    return p;
}

std::string replace_all(std::string text, const std::string& from, const std::string& to) {
    for (std::size_t at = text.find(from); at != std::string::npos;
         at = text.find(from, at + to.size()))
        text.replace(at, from.size(), to);
    return text;
}

std::string error_of(const std::filesystem::path& path) {
    try {
        read_coordinate_file(path);
    } catch (const InputError& e) {
        return e.what();
    }
    return "(no error)";
}

void expect_contains(const std::string& text, const std::string& part) {
    EXPECT_NE(text.find(part), std::string::npos) << "'" << part << "' not in: " << text;
}

void expect_same_section(const Section& a, const Section& b, const std::string& what) {
    ASSERT_EQ(a.points.size(), b.points.size()) << what;
    EXPECT_EQ(a.leading_edge, b.leading_edge) << what;
    for (std::size_t k = 0; k < a.points.size(); ++k) {
        EXPECT_EQ(a.points[k].x, b.points[k].x) << what << " point " << k;
        EXPECT_EQ(a.points[k].y, b.points[k].y) << what << " point " << k;
    }
}

TEST(CoordinateLayout, LoopReadInEveryCommonDress) {
    const std::vector<Vec2> loop = test::loop_of(table_4412());
    const auto plain = write("loop.dat", "NACA 4412 loop\n" + rows(loop));
    const RawOutline first = read_coordinate_file(plain);
    EXPECT_EQ(first.layout, "one closed loop");
    EXPECT_EQ(first.points.size(), 69u);
    const Section reference = make_section(first, "loop");
    const std::string tabs = replace_all(rows(reversed(loop)), " ", "\t");
    const std::vector<std::pair<std::string, std::string>> dresses = {
        {"lower first, comments, tabs, CRLF",
         replace_all("# small wind-turbine blade section\n# x\ty\n" + tabs, "\n", "\r\n")},
        {"commas, CR line ends",
         replace_all("title, with a comma\n" + replace_all(rows(loop), " ", ", "), "\n", "\r")},
        {"no title, blank lines around", "\n\n" + rows(loop) + "\n\n"},
    };
    for (const auto& [what, text] : dresses) {
        const RawOutline raw = read_coordinate_file(write("dress.dat", text));
        EXPECT_EQ(raw.layout, "one closed loop") << what;
        expect_same_section(reference, make_section(raw, "d"), what);
    }
}

TEST(CoordinateLayout, TwoSurfacesWithOrWithoutCountLineGiveTheLoopsSection) {
    const test::Surfaces& s = table_4412();
    const Section reference =
        make_section(read_coordinate_file(write("ref.dat", rows(test::loop_of(s)))), "loop");
    const std::string counts = "35. 35.\n";
    struct Variant {
        std::string what, text, layout;
    };
    const std::string le_to_te = "two surfaces, each from the leading edge to the trailing edge";
    const std::vector<Variant> variants = {
        {"blank line", "NACA 4412\n" + rows(s.upper) + "\n" + rows(s.lower), le_to_te},
        {"lower first", rows(s.lower) + "\n\n" + rows(s.upper), le_to_te},
        {"count line, blank lines",
         "NACA 4412\n" + counts + "\n" + rows(s.upper) + "\n" + rows(s.lower),
         le_to_te + ", with a count line (35, 35)"},
        {"count line, no blank line", "NACA 4412\n" + counts + rows(s.upper) + rows(s.lower),
         le_to_te + ", with a count line (35, 35)"},
        {"each surface from the trailing edge",
         rows(reversed(s.upper)) + "\n" + rows(reversed(s.lower)),
         "two surfaces, each from the trailing edge to the leading edge"},
    };
    for (const Variant& v : variants) {
        const RawOutline raw = read_coordinate_file(write("two.dat", v.text));
        EXPECT_EQ(raw.layout, v.layout) << v.what;
        EXPECT_EQ(raw.points.size(), 69u) << v.what;  // the shared leading edge kept once
        expect_same_section(reference, make_section(raw, "t"), v.what);
    }
}

TEST(CoordinateLayout, CountLineThatDoesNotMatchIsRefused) {
    const test::Surfaces& s = table_4412();
    const auto path = write("counts.dat", "T\n61. 61.\n\n" + rows(s.upper) + "\n" + rows(s.lower));
    const std::string e = error_of(path);
    expect_contains(e, path.string() + ":2: \"61 61\" reads as the point counts of two surfaces");
    expect_contains(e, "but 70 points follow");
}

TEST(CoordinateLayout, OtherLayoutsAreRefusedListingWhatIsRead) {
    const test::Surfaces& s = table_4412();
    std::vector<Vec2> moved = s.upper;
    for (Vec2& p : moved) p.x += 3.0;
    const auto three =
        write("three.dat", "T\n" + rows(s.upper) + "\n" + rows(s.lower) + "\n" + rows(moved));
    const std::string e3 = error_of(three);
    expect_contains(e3, "3 separate runs of points (lines 2-36, lines 38-72, lines 74-108)");
    expect_contains(e3, "veer reads one closed loop");
    expect_contains(e3, "two surfaces listed separately");
    // two surfaces written one after the other without a blank line or a count line
    const auto run_on = write("run_on.dat", "T\n" + rows(s.upper) + rows(s.lower));
    expect_contains(error_of(run_on),
                    run_on.string() +
                        ":2: the points start at the leading edge and do not come "
                        "back to it; for two surfaces put a blank line between them");
    // two blocks that share no end
    const auto apart = write("apart.dat", rows(s.upper) + "\n" + rows(moved));
    expect_contains(error_of(apart), "2 separate runs of points (lines 1-35, lines 37-71)");
}

}  // namespace
}  // namespace veer
