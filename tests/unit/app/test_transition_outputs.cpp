// What a user reads of transition: the model warning by Reynolds number, the closing table's
// transition lines, and summary.json / surface.csv of a short Spalart–Allmaras run.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <sstream>
#include <string>

#include "app/closing_table.hpp"
#include "app/mesh_pipeline.hpp"
#include "app/model_range_note.hpp"
#include "app/report_transition.hpp"
#include "app/run_report.hpp"
#include "app/simulation.hpp"
#include "app/transition_figures.hpp"
#include "app_test_support.hpp"
#include "io/case_file.hpp"
#include "io/json_writer.hpp"
#include "io/plot_canvas.hpp"

namespace veer {
namespace {

TEST(ModelRangeNote, LaminarAboveItsRangeNamesTheAlternative) {
    const auto note = model_range_note("laminar", 2.0e5, false);
    ASSERT_TRUE(note.has_value());
    EXPECT_NE(note->find("5e4"), std::string::npos) << *note;
    EXPECT_NE(note->find("common practice"), std::string::npos) << *note;
    EXPECT_NE(note->find("model = \""), std::string::npos) << *note;  // names what to use
    EXPECT_FALSE(model_range_note("laminar", 4.0e4, false).has_value());
    EXPECT_FALSE(model_range_note("laminar", laminar_reynolds_limit, false).has_value());
}

TEST(ModelRangeNote, FullyTurbulentBelowItsRangeUnlessTripped) {
    const auto note = model_range_note("spalart-allmaras", 2.5e5, false);
    ASSERT_TRUE(note.has_value());
    EXPECT_NE(note->find("1e6"), std::string::npos) << *note;
    EXPECT_FALSE(model_range_note("spalart-allmaras", 2.5e5, true).has_value());
    EXPECT_FALSE(model_range_note("spalart-allmaras", 3.0e6, false).has_value());
    EXPECT_FALSE(model_range_note("spalart-allmaras", fully_turbulent_reynolds_limit, false));
}

TEST(ModelRangeNote, ACaseWithATripIsNotWarned) {
    const std::string base =
        "[geometry]\nnaca = \"0012\"\n[mesh]\naround = 32\nnormal = 8\nwake = 8\n"
        "far_field = 10\nfirst_cell = 1e-3\n[flow]\nreynolds = 5e5\nalpha = 0\n"
        "model = \"spalart-allmaras\"\n";
    EXPECT_TRUE(model_range_note(parse_case_text(base, "a.toml", ".")).has_value());
    EXPECT_FALSE(
        model_range_note(parse_case_text(base + "trip_upper = 0.05\n", "b.toml", ".")).has_value());
}

TEST(TransitionFigures, ClosingTableStatesTransitionAndTheBubble) {
    RunAnalysis a;
    a.has_turbulence_index = true;
    a.transition.upper = SurfaceLocation{SurfaceSide::upper, 0.35, 0.35, 0.05};
    SeparatedRegion b;
    b.kind = SeparationKind::laminar_bubble;
    b.start = {SurfaceSide::upper, 0.3, 0.3, 0.05};
    b.end = SurfaceLocation{SurfaceSide::upper, 0.4, 0.4, 0.05};
    b.transition = a.transition.upper;
    a.regions_upper.push_back(b);
    CaseSpec spec;
    testing::internal::CaptureStdout();
    print_closing_table(spec, a);
    std::fflush(stdout);
    const std::string out = testing::internal::GetCapturedStdout();
    EXPECT_NE(out.find("upper x/c 0.350, lower laminar to the trailing edge"), std::string::npos)
        << out;
    EXPECT_NE(out.find("laminar bubble 0.300-0.400 (transition 0.350 inside)"), std::string::npos)
        << out;
    const nlohmann::json s = transition_summary(a);
    EXPECT_DOUBLE_EQ(s.at("transition_upper").get<double>(), 0.35);
    EXPECT_TRUE(s.at("transition_lower").is_null());
    ASSERT_EQ(s.at("laminar_bubbles_upper").size(), 1u);
    EXPECT_DOUBLE_EQ(s.at("laminar_bubbles_upper")[0][1].get<double>(), 0.35);
}

TEST(TransitionFigures, TurbulentFromTheLeadingEdgeIsSaidSoNotANegativePosition) {
    // Fully turbulent SA on a cambered section at high alpha: the first upper face walked lies a
    // little ahead of x = 0 (x/c -0.0002 was printed before).
    RunAnalysis a;
    a.has_turbulence_index = true;
    a.transition.upper = SurfaceLocation{SurfaceSide::upper, 0.0003, -0.0002, 0.002};
    a.transition.upper_from_leading_edge = true;
    a.transition.lower = SurfaceLocation{SurfaceSide::lower, 0.61, 0.6, -0.03};
    const std::string line = transition_line(a);
    EXPECT_NE(line.find("upper turbulent from the leading edge, lower x/c 0.600"),
              std::string::npos)
        << line;
    EXPECT_EQ(line.find("-0.000"), std::string::npos) << line;
    const nlohmann::json s = transition_summary(a);
    EXPECT_EQ(s.at("transition_upper").get<double>(), 0.0);
    EXPECT_TRUE(s.at("turbulent_from_leading_edge_upper").get<bool>());
    EXPECT_FALSE(s.at("turbulent_from_leading_edge_lower").get<bool>());
    EXPECT_DOUBLE_EQ(s.at("transition_lower").get<double>(), 0.6);
}

TEST(TransitionFigures, LaminarRunHasNoTransitionLine) {
    RunAnalysis a;  // no turbulence index
    EXPECT_TRUE(transition_line(a).empty());
}

/// A short fully turbulent run at Re 2.5e5 on a small grid: nu~ is there, so every wall face
/// has a turbulence index and each surface a transition position near the leading edge.
TEST(TransitionFigures, SpalartAllmarasRunWritesTheIndexAndTheTransition) {
    test::AppScratch scratch;
    const CaseSpec spec = parse_case_text(
        "[geometry]\nnaca = \"0012\"\n[mesh]\naround = 96\nnormal = 40\nwake = 24\n"
        "far_field = 20\ny_plus = 1.0\n[flow]\nreynolds = 2.5e5\nalpha = 2\n"
        "model = \"spalart-allmaras\"\n[run]\nmode = \"steady\"\nsteps = 150\n",
        "sa.toml", ".");
    SimulationOptions quiet;
    quiet.progress = false;
    Simulation sim(spec, build_mesh(spec).grid, scratch.path(), quiet);
    const RunResult r = sim.run();
    ASSERT_TRUE(write_run_report(sim, r, ClosingTable::omit, nullptr).has_value());
    const nlohmann::json s = read_json_file(scratch / "summary.json");
    ASSERT_TRUE(s.at("transition_upper").is_number()) << s.dump();
    ASSERT_TRUE(s.at("transition_lower").is_number()) << s.dump();
    // Fully turbulent: the index rises within the first tenth of the chord on both surfaces.
    EXPECT_GE(s["transition_upper"].get<double>(), 0.0);
    EXPECT_LT(s["transition_upper"].get<double>(), 0.1);
    EXPECT_LT(s["transition_lower"].get<double>(), 0.1);
    EXPECT_TRUE(s.at("model_warning").is_string());  // SA at Re 2.5e5 untripped
    std::istringstream csv(test::read_text(scratch / "surface.csv"));
    std::string line;
    std::getline(csv, line);
    ASSERT_EQ(line, "x_c,y_c,side,cp,cf,y_plus,turbulence_index");
    // Every row ends in a number: no empty index cell on a Spalart–Allmaras run.
    std::size_t rows = 0;
    for (; std::getline(csv, line); ++rows) {
        const std::string last = line.substr(line.rfind(',') + 1);
        EXPECT_TRUE(std::isfinite(std::stod(last))) << line;
    }
    EXPECT_EQ(rows, 96u);  // one per wall face
}

ChartSeries ramp(const std::string& label) {
    ChartSeries s;
    s.label = label;
    for (int k = 0; k <= 10; ++k) s.x.push_back(0.1 * k), s.y.push_back(0.01);
    return s;
}

TEST(TransitionPictures, CfIsSplitAtTransitionWithTheBubbleDrawn) {
    test::AppScratch scratch;
    test::write_text(scratch / "summary.json",
                     R"({"model": "sa-aft", "transition_upper": 0.35, "transition_lower": null,
                         "laminar_bubbles_upper": [[0.3, 0.35, 0.4]], "laminar_bubbles_lower": []})");
    Chart c;
    c.series = {ramp("upper"), ramp("lower")};
    mark_transition_on_cf(c, scratch / "summary.json");
    // upper laminar + upper turbulent + the bubble + lower laminar (no transition there).
    ASSERT_EQ(c.series.size(), 4u);
    EXPECT_EQ(c.series[0].label, "upper surface, laminar");
    EXPECT_TRUE(c.series[0].dashed);
    EXPECT_DOUBLE_EQ(c.series[0].x.back(), 0.3);  // the points ahead of 0.35
    EXPECT_EQ(c.series[1].label, "upper surface, turbulent");
    EXPECT_FALSE(c.series[1].dashed);
    EXPECT_DOUBLE_EQ(c.series[1].x.front(), 0.4);
    EXPECT_EQ(c.series[2].label, "laminar bubble, upper");
    EXPECT_EQ(c.series[2].x, (std::vector<double>{0.3, 0.4}));
    EXPECT_EQ(c.series[3].label, "lower surface, laminar");
    EXPECT_EQ(c.series[3].x.size(), 11u);
    ASSERT_EQ(c.marks.size(), 1u);
    EXPECT_EQ(c.marks[0].label, "transition upper 0.35");
}

/// The colour a series is drawn in (io/plot_chart.cpp's rule).
Colour drawn_colour(const Chart& c, std::size_t k) {
    return series_colour(c.series[k].colour >= 0 ? c.series[k].colour : static_cast<int>(k));
}

bool same_colour(const Colour& a, const Colour& b) {
    return a.r == b.r && a.g == b.g && a.b == b.b;
}

TEST(TransitionPictures, BubblesHaveColoursOfTheirOwnOnTheCfPicture) {
    test::AppScratch scratch;
    test::write_text(scratch / "summary.json",
                     R"({"model": "sa-aft", "transition_upper": 0.35, "transition_lower": 0.7,
                         "laminar_bubbles_upper": [[0.3, 0.35, 0.4]],
                         "laminar_bubbles_lower": [[0.6, 0.7, 0.75]]})");
    Chart c;
    c.series = {ramp("upper"), ramp("lower")};
    c.series[0].colour = 0;  // as report_run_pictures.cpp draws them
    c.series[1].colour = 1;
    mark_transition_on_cf(c, scratch / "summary.json");
    ASSERT_EQ(c.series.size(), 6u);
    std::vector<std::size_t> bubbles, surfaces;
    for (std::size_t k = 0; k < c.series.size(); ++k)
        (c.series[k].label.starts_with("laminar bubble") ? bubbles : surfaces).push_back(k);
    ASSERT_EQ(bubbles.size(), 2u);
    EXPECT_FALSE(same_colour(drawn_colour(c, bubbles[0]), drawn_colour(c, bubbles[1])));
    for (std::size_t b : bubbles)
        for (std::size_t s : surfaces)
            EXPECT_FALSE(same_colour(drawn_colour(c, b), drawn_colour(c, s)))
                << c.series[b].label << " drawn like " << c.series[s].label;
}

TEST(TransitionPictures, EverySeriesOfTheSweepPictureHasItsOwnColour) {
    std::vector<PointRecord> p(2);
    p[0].alpha = 0.0, p[1].alpha = 4.0;
    for (PointRecord& r : p) {
        r.transition_upper = 0.5 - 0.05 * r.alpha, r.transition_lower = 0.7;
        r.laminar_bubble_upper = 0.3, r.laminar_bubble_upper_end = 0.45;
    }
    const Chart c = transition_positions_chart(p, PolarFigures{});
    ASSERT_EQ(c.series.size(), 4u);  // upper, lower, bubble start, bubble end
    for (std::size_t a = 0; a < c.series.size(); ++a)
        for (std::size_t b = a + 1; b < c.series.size(); ++b)
            EXPECT_FALSE(same_colour(drawn_colour(c, a), drawn_colour(c, b)))
                << c.series[a].label << " and " << c.series[b].label << " share a colour";
}

TEST(TransitionPictures, LaminarRunCfIsLeftAlone) {
    test::AppScratch scratch;
    test::write_text(scratch / "summary.json",
                     R"({"model": "laminar", "transition_upper": null, "transition_lower": null})");
    Chart c;
    c.series = {ramp("upper"), ramp("lower")};
    mark_transition_on_cf(c, scratch / "summary.json");
    ASSERT_EQ(c.series.size(), 2u);
    EXPECT_EQ(c.series[0].label, "upper");
    EXPECT_TRUE(c.marks.empty());
}

TEST(TransitionPictures, SweepPictureOfTransitionAgainstAlpha) {
    test::AppScratch scratch;
    std::vector<PointRecord> p(3);
    for (int k = 0; k < 3; ++k) p[k].alpha = 4.0 * k;
    EXPECT_THROW(draw_transition_positions(p, PolarFigures{}, scratch / "t.png"), InputError);
    p[0].transition_upper = 0.5;
    p[1].transition_upper = 0.3;
    p[1].laminar_bubble_upper = 0.25;
    p[1].laminar_bubble_upper_end = 0.32;
    draw_transition_positions(p, PolarFigures{}, scratch / "t.png");
    EXPECT_TRUE(test::is_png(scratch / "t.png"));
}

}  // namespace
}  // namespace veer
