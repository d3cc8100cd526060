// Coordinate files: what is read, what is refused, and the brief's bad files through make_section.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <numbers>

#include "io/coordinate_file.hpp"
#include "mesh/errors.hpp"
#include "mesh/naca.hpp"
#include "mesh/section_builder.hpp"
#include "tests/reference_table.hpp"

namespace veer {
namespace {

std::filesystem::path write_file(const std::string& name, const std::string& text) {
    const std::filesystem::path path = std::filesystem::path(testing::TempDir()) / name;
    std::ofstream(path, std::ios::binary) << text;
    return path;
}

/// The message of the InputError thrown by reading the file and building its section.
std::string error_of(const std::filesystem::path& path) {
    try {
        make_section(read_coordinate_file(path), "test");
    } catch (const InputError& e) {
        return e.what();
    }
    return "(no error)";
}

void expect_contains(const std::string& text, const std::string& part) {
    EXPECT_NE(text.find(part), std::string::npos) << "'" << part << "' not in: " << text;
}

TEST(CoordinateFile, ReadsTitleCommentsBlanksAndSeparators) {
    const auto path = write_file("wind_turbine_tip.dat",
                                 "small wind-turbine tip section\n"
                                 "# x y\n"
                                 "1.0 0.0\n"
                                 "\n"
                                 "0.5,0.06\r\n"
                                 "  0.0\t0.0  \n"
                                 "0.5 , -0.04\n"
                                 "+1e0 -0E-3\n");
    const RawOutline raw = read_coordinate_file(path);
    ASSERT_EQ(raw.points.size(), 5u);
    EXPECT_EQ(raw.source, path.string());
    EXPECT_EQ(raw.lines, (std::vector<int>{3, 5, 6, 7, 8}));
    EXPECT_EQ(raw.points[1].x, 0.5);
    EXPECT_EQ(raw.points[1].y, 0.06);
    EXPECT_EQ(raw.points[3].y, -0.04);
    EXPECT_EQ(raw.points[4].x, 1.0);
    EXPECT_FALSE(raw.leading_edge.has_value());
    // the blank line inside a loop that closes on itself separates nothing
    EXPECT_EQ(raw.layout, "one closed loop");
}

TEST(CoordinateFile, MissingFileCannotBeOpened) {
    const auto path = std::filesystem::path(testing::TempDir()) / "no_such_section.dat";
    std::filesystem::remove(path);
    EXPECT_EQ(error_of(path), path.string() +
                                  ": cannot open the coordinate file (No such file or "
                                  "directory); expected the path of a readable file");
}

TEST(CoordinateFile, EmptyFileIsRefused) {
    const auto path = write_file("empty.dat", "");
    EXPECT_EQ(error_of(path), path.string() + ": no coordinates found (empty file)");
    const auto blank = write_file("blank.dat", "\n  \n# only a comment\n");
    EXPECT_EQ(error_of(blank), blank.string() + ": no coordinates found (empty file)");
    const auto title = write_file("title_only.dat", "slow indoor flyer\n");
    EXPECT_EQ(error_of(title), title.string() + ": no coordinates found (only a title line)");
}

TEST(CoordinateFile, NonNumericLineIsRefusedWithItsLine) {
    const auto path = write_file("abc.dat", "title\n1 0\n0.5 abc\n0 0\n");
    EXPECT_EQ(error_of(path),
              path.string() + ":3: expected two numbers \"x y\", found \"0.5 abc\"");
    for (const std::string bad : {"0.5", "0.5 0.1 0.2", "0.5abc 0.1", "nan 0", "0.5 inf", "x y"}) {
        const auto p = write_file("bad_line.dat", "1 0\n" + bad + "\n0 0\n");
        EXPECT_EQ(error_of(p),
                  p.string() + ":2: expected two numbers \"x y\", found \"" + bad + "\"")
            << bad;
    }
}

TEST(CoordinateFile, TooFewPointsAreRefused) {
    const auto path = write_file("five.dat", "1 0\n0.5 0.05\n0 0\n0.5 -0.05\n1 0\n");
    EXPECT_EQ(error_of(path),
              path.string() + ": a section outline needs at least 20 points, found 5");
}

TEST(CoordinateFile, FigureEightIsReportedAsSelfIntersecting) {
    std::string text;
    for (int k = 0; k < 60; ++k) {
        const double t = 2.0 * std::numbers::pi * k / 60;
        char line[64];
        std::snprintf(line, sizeof line, "%.17g %.17g\n", 0.5 + 0.5 * std::cos(t),
                      0.1 * std::sin(2.0 * t));
        text += line;
    }
    const auto path = write_file("eight.dat", text);
    const std::string e = error_of(path);
    expect_contains(e, path.string() + ": the outline crosses itself");
    expect_contains(e, "lines 15 and 16");
    EXPECT_EQ(e.find('\n'), std::string::npos);
}

TEST(CoordinateFile, ErrorsOfTheOutlineNameTheFileLine) {
    // a point repeated on line 12 of a file with a title line
    std::string text = "survey drone wing section\n";
    const RawOutline naca = naca_outline("2412", TrailingEdge::closed, 41);
    for (std::size_t k = 0; k < naca.points.size(); ++k) {
        char line[64];
        std::snprintf(line, sizeof line, "%.6f %.6f\n", naca.points[k].x, naca.points[k].y);
        text += line;
        if (k == 9) text += line;
    }
    const auto path = write_file("repeat.dat", text);
    expect_contains(error_of(path), path.string() + ":12: point");
}

TEST(CoordinateFile, ImportedBluntSectionIsClosed) {
    // a 2412 written upper surface first, open trailing edge, 6 decimals, with a title: it is
    // read, reordered and closed, not refused. Gap 0.00252 (Abbott & von Doenhoff 1959 [T]);
    // 6-decimal rounding: tolerance 2e-5.
    RawOutline naca = naca_outline("2412", TrailingEdge::open, 81);
    std::string text = "survey drone wing section (NACA 2412)\n";
    for (auto it = naca.points.rbegin(); it != naca.points.rend(); ++it) {
        char line[64];
        std::snprintf(line, sizeof line, "%.6f %.6f\n", it->x, it->y);
        text += line;
    }
    const auto path = write_file("drone_2412.dat", text);
    const Section s = make_section(read_coordinate_file(path), "drone");
    const test::ReferenceTable abbott =
        test::ReferenceTable::read("abbott1959_naca_sections.csv", 4);
    EXPECT_NEAR(s.closure.gap, abbott.value("trailing_edge_thickness_t12"), 2e-5);
    // in chord units: the file's axes are kept, the base stays at x = 1 and the tip of the wedge
    // that closes it lies behind
    EXPECT_EQ(s.frame.origin, SectionFrame::Origin::file_axes);
    EXPECT_EQ(s.closure.form, TrailingEdgeClosure::Form::wedge);
    EXPECT_EQ(s.points.front().x, s.points.back().x);
    EXPECT_GT(s.points.front().x, 1.005);
    EXPECT_EQ(s.points[s.leading_edge].x, 0.0);
    EXPECT_LT(s.points[s.leading_edge / 2].y, 0.0);                   // lower surface first
    EXPECT_GT(s.points[s.leading_edge + s.leading_edge / 2].y, 0.0);  // then the upper
}

TEST(CoordinateFile, AFarPointIsBlamedOnItsOwnLine) {
    // A typing error of 1e308 on line 21 set the outline's size and the duplicate check then
    // blamed line 4 (issue 19). 30 cosine stations per side of a 12 % thick section.
    std::string text = "survey drone wing section\n";
    constexpr int n = 30;
    for (int side : {1, -1})
        for (int k = 0; k <= n; ++k) {
            const int q = side > 0 ? n - k : k;
            if (side < 0 && q == 0) continue;
            const double x = 0.5 * (1.0 - std::cos(M_PI * q / n));
            const double t = 0.6 * (0.2969 * std::sqrt(x) - 0.1260 * x - 0.3516 * x * x +
                                    0.2843 * x * x * x - 0.1036 * x * x * x * x);
            text += (q == 15 && side > 0)
                        ? "1e308 0.01\n"  // the typing error, on line 17
                        : std::to_string(x) + " " + std::to_string(side * t) + "\n";
        }
    const std::string e = error_of(write_file("far_point.dat", text));
    EXPECT_NE(e.find("far_point.dat:17: point (1e+308, 0.01) lies far from all the others"),
              std::string::npos)
        << e;
}

}  // namespace
}  // namespace veer
