// What veer says about how a section was read and placed: the chord line used with the scale and
// rotation applied, the trailing-edge gap and its closure; the same in JSON and on the report.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

#include "app/commands.hpp"
#include "app/section_notes.hpp"
#include "app_test_support.hpp"
#include "io/json_writer.hpp"
#include "mesh/naca.hpp"
#include "mesh/section_builder.hpp"

namespace veer {
namespace {

void expect_contains(const std::string& text, const std::string& part) {
    EXPECT_NE(text.find(part), std::string::npos) << "'" << part << "' not in: " << text;
}

/// The NACA 0012 outline as a file would give it (no leading-edge mark), 61 stations.
RawOutline table_0012(TrailingEdge te) {
    RawOutline raw = naca_outline("0012", te, 61);
    raw.leading_edge.reset();
    raw.source = "table.dat";
    raw.layout = "one closed loop";
    for (std::size_t k = 0; k < raw.points.size(); ++k)
        raw.lines.push_back(static_cast<int>(k) + 2);
    return raw;
}

TEST(SectionNotes, AnalyticSectionMovesNothing) {
    const SectionNotes n =
        section_notes(make_section(naca_outline("0012", TrailingEdge::open), "a"));
    EXPECT_EQ(n.layout, "");
    expect_contains(n.chord_line, "the formula's own, (0, 0) to (1, 0); scale 1, rotation 0 deg");
    expect_contains(n.trailing_edge, "blunt, gap 0.252% chord, closed by a wedge");
}

TEST(SectionNotes, TableInChordUnitsKeepsItsAxesAndSaysSo) {
    const Section s = make_section(table_0012(TrailingEdge::closed), "t");
    const SectionNotes n = section_notes(s);
    EXPECT_EQ(n.layout,
              "one closed loop, lower surface first; 121 points used (file lines 2 to 122)");
    expect_contains(n.chord_line,
                    "the file's own x axis, (0, 0) to (1, 0) as written; scale 1, "
                    "rotation 0 deg (trailing-edge centre found at (1, 0)");
    EXPECT_EQ(n.trailing_edge, "sharp");
    const nlohmann::json j = section_placement_json(s);
    EXPECT_EQ(j["chord_line"], "file-axes");
    EXPECT_EQ(j["chord_line_requested"], "auto");
    EXPECT_EQ(j["rotation_deg"], 0.0);
    EXPECT_EQ(j["scale"], 1.0);
    EXPECT_EQ(j["trailing_edge_closure"], "sharp");
    ASSERT_EQ(j["notes"].size(), 3u);
    EXPECT_EQ(j["notes"][1], n.chord_line);
}

TEST(SectionNotes, PlacedFileGivesScaleAndRotation) {
    // the 0012 written in millimetres (chord 200), pitched 10 deg nose-up: veer turns it back by
    // +10 deg (counter-clockwise) and scales it by 1/200; for a symmetric section the nose point
    // is the formula's, so the figures are exact to round-off
    RawOutline raw = table_0012(TrailingEdge::open);
    const double a = -10.0 * std::numbers::pi / 180.0;
    for (Vec2& p : raw.points)
        p = {200.0 * (std::cos(a) * p.x - std::sin(a) * p.y),
             200.0 * (std::sin(a) * p.x + std::cos(a) * p.y)};
    const Section s = make_section(raw, "mm");
    const SectionNotes n = section_notes(s);
    expect_contains(n.chord_line, "placed by veer, the file is not in chord units");
    expect_contains(n.chord_line, "scale 0.005 chords per file unit");
    expect_contains(n.chord_line,
                    "rotation +10.0000 deg (the file's chord line pointed 10.0000 "
                    "deg nose-up)");
    const nlohmann::json j = section_placement_json(s);
    EXPECT_EQ(j["chord_line"], "nose-to-tail");
    EXPECT_NEAR(j["rotation_deg"].get<double>(), 10.0, 1e-9);
    EXPECT_NEAR(j["scale"].get<double>(), 0.005, 1e-15);
    EXPECT_EQ(j["trailing_edge_closure"], "wedge");
}

TEST(SectionNotes, FairingAndSetAsideBasePointsAreNamed) {
    // 0012 cut at x = 0.9 (base 3.2 % of the new chord) with the base drawn as a closing segment
    RawOutline raw = table_0012(TrailingEdge::closed);
    std::vector<Vec2> cut;
    for (const Vec2& p : raw.points)
        if (p.x <= 0.9) cut.push_back(p);
    cut.push_back(cut.front());
    raw.points = cut;
    raw.lines.resize(cut.size());
    const SectionNotes n = section_notes(make_section(raw, "cut"));
    expect_contains(n.trailing_edge,
                    "closed by a fairing (each surface continued smoothly to a "
                    "tip of 8 deg half-angle)");
    expect_contains(n.trailing_edge, "1 point that only drew the base");
}

TEST(SectionNotes, ReportPageShowsThePlacement) {
    test::AppScratch tmp;
    write_json_file(tmp / "summary.json", {{"section", "drone"}, {"alpha", 2.0}, {"cl", 0.3}});
    write_json_file(tmp / "section.json",
                    section_placement_json(make_section(table_0012(TrailingEdge::open), "d")));
    ASSERT_EQ(run_report_command({tmp.path()}), 0);
    const std::string html = test::read_text(tmp / "report.html");
    expect_contains(html, "Section: how the coordinates were read and placed");
    expect_contains(html, "the file's own x axis");
    expect_contains(html, "trailing-edge closure");  // a label, not the JSON key
}

}  // namespace
}  // namespace veer
