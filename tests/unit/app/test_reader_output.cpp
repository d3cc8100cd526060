// What a practitioner reads: the run table's labels pinned word for word (units, contour
// distances as placed, the Cm convention), the caution as the last line of `veer run` and
// `veer sweep`, and a sweep's report page with its caution, its study and no raw JSON.
#include <gtest/gtest.h>

#include <cstdio>
#include <sstream>
#include <string>
#include <vector>

#include "app/closing_table.hpp"
#include "app/commands.hpp"
#include "app/reader_labels.hpp"
#include "app/run_report.hpp"
#include "app_test_support.hpp"

namespace veer {
namespace {

// The page's text with every tag replaced by a line break (std::regex is avoided: GCC 12 warns
// inside <regex> under the sanitizer build's -O1, and warnings are errors).
std::string text_between_tags(const std::string& html) {
    std::string text;
    bool in_tag = false;
    for (const char c : html) {
        if (c == '<') in_tag = true;
        if (!in_tag) text += c;
        if (c == '>') {
            in_tag = false;
            text += '\n';
        }
    }
    return text;
}

// The first line whose first non-blank character opens a JSON object or list ("" if none).
std::string first_line_opening_json(const std::string& text) {
    std::istringstream lines(text);
    std::string line;
    while (std::getline(lines, line)) {
        const std::size_t first = line.find_first_not_of(" \t\r\f\v");
        if (first != std::string::npos && (line[first] == '{' || line[first] == '[')) return line;
    }
    return "";
}

// The src of every <img src="..."> on the page.
std::vector<std::string> image_sources(const std::string& html) {
    const std::string opening = "<img src=\"";
    std::vector<std::string> sources;
    for (std::size_t at = html.find(opening); at != std::string::npos;
         at = html.find(opening, at + 1)) {
        const std::size_t begin = at + opening.size();
        const std::size_t end = html.find('"', begin);
        if (end == std::string::npos) break;
        sources.push_back(html.substr(begin, end - begin));
    }
    return sources;
}

namespace fs = std::filesystem;

RunAnalysis two_contours() {
    RunAnalysis a;
    a.forces.cl.total = 0.5;
    a.forces.cd.total = 0.02;
    a.forces.cm.total = -0.05;
    for (double d : {0.53, 3.89}) {
        RouteComparison r;
        r.contour.distance = d;  // placed, e.g. asked 0.5 and 4
        r.contour.requested = d < 1 ? 0.5 : 4.0;
        r.cl_momentum = 0.49;
        r.cd_momentum = 0.021;
        r.cl_momentum_difference = -0.01;
        r.cl_circulation = 0.47;
        r.cl_circulation_difference = -0.03;
        a.routes.push_back(r);
    }
    a.max_lift_disagreement = largest_lift_disagreement(a.routes);
    a.outermost.contour.distance = 29.61;  // the far-boundary force check
    a.outermost.cl_momentum = 0.495;
    a.outermost.cd_momentum = 0.0205;
    a.outermost.cl_momentum_difference = -0.005;
    WakeProfile w;
    w.station = 1.0;
    w.downwash_deg = 1.5;
    w.downward_momentum_flux = 0.02;
    a.wake.push_back(w);
    return a;
}

/// The golden text: every label, unit and convention of the table of a steady run.
constexpr const char* golden_table = R"(
  lift two ways (NACA 0012 at alpha 4 deg, Re 1000)
  route                                      Cl         Cd  Cl - surface
  surface (pressure + friction)         0.50000    0.02000             -
  control volume at 0.53 chords         0.49000    0.02100      -0.01000
  control volume at 3.89 chords         0.49000    0.02100      -0.01000
  circulation at 0.53 chords            0.47000                 -0.03000
  circulation at 3.89 chords            0.47000                 -0.03000
  outermost contour at 29.6 chords      0.49500    0.02050      -0.00500
  note: in viscous flow the circulation rows lie below the surface lift, because a contour leaves out the vorticity shed into the wake behind its wake crossing; that offset is expected and is not an error bar
  largest surface/control-volume disagreement: 0.01000 (2.00% of Cl)
  Cm -0.05000 (about the quarter chord, nose-up positive); Kutta check: Cp upper 0.0000, lower 0.0000 at the trailing edge
  upper surface attached; lower surface attached
  wake: downwash in deg; downward momentum flux (per unit span, in rho U^2 c; positive when the flow is turned down; over |y - y_TE| <= 1 chord)
  wake 1.00 chords behind the TE: downwash +1.500 deg, downward momentum flux 0.02000
)";

TEST(ReaderOutput, RunTableLabelsAreThePinnedOnes) {
    CaseSpec spec;
    spec.geometry.name = "NACA 0012";
    spec.flow.alpha_deg = 4.0;
    spec.flow.reynolds = 1000.0;
    testing::internal::CaptureStdout();
    print_closing_table(spec, two_contours());
    std::fflush(stdout);
    EXPECT_EQ(testing::internal::GetCapturedStdout(), golden_table);
}

std::string last_line(const std::string& out) {
    std::istringstream in(out);
    std::string line, last;
    while (std::getline(in, line))
        if (!line.empty()) last = line;
    return last;
}

TEST(ReaderOutput, RunEndsWithTheCaution) {
    test::AppScratch tmp;
    test::write_text(tmp / "c.toml", test::quick_case_text());
    RunOptions o;
    o.input.case_file = tmp / "c.toml";
    o.input.overrides = {"run.steps=40"};
    o.out_dir = tmp / "run";
    o.quiet = true;
    testing::internal::CaptureStdout();
    const int code = run_run_command(o);  // 40 steps: the step cap, exit 1
    std::fflush(stdout);
    const std::string out = testing::internal::GetCapturedStdout();
    EXPECT_EQ(code, 1);
    EXPECT_NE(out.find("lift two ways"), std::string::npos) << out;  // the table was printed
    EXPECT_EQ(last_line(out), reader_caution()) << out;
}

/// Runs a one-point sweep of the quick case into tmp/sw; returns its stdout.
std::string quick_sweep(const test::AppScratch& tmp) {
    test::write_text(tmp / "c.toml", test::quick_case_text());
    SweepOptions o;
    o.input.case_file = tmp / "c.toml";
    o.alpha = "0:2:2";
    o.out_dir = tmp / "sw";
    o.quiet = true;
    o.steady_steps = 40;
    o.unsteady_time = 0.5;  // a point past the cap runs briefly time-accurately
    testing::internal::CaptureStdout();
    run_sweep_command(o);
    std::fflush(stdout);
    return testing::internal::GetCapturedStdout();
}

TEST(ReaderOutput, SweepEndsWithTheCautionAndReportPageReadsAsText) {
    test::AppScratch tmp;
    const std::string out = quick_sweep(tmp);
    EXPECT_NE(out.find("polar of 2 points written"), std::string::npos) << out;
    EXPECT_EQ(last_line(out), reader_caution()) << out;

    ASSERT_EQ(run_report_command({tmp / "sw"}), 0);
    const std::string html = test::read_text(tmp / "sw" / "report.html");
    ASSERT_FALSE(html.empty());
    // The caution comes before the first section, the study names the grid in A x N words.
    const std::size_t caution = html.find(std::string(reader_caution()));
    ASSERT_NE(caution, std::string::npos);
    EXPECT_LT(caution, html.find("<h2>"));
    EXPECT_NE(html.find("64 x 24 (around x normal; wake 12 cells each side), 88 x 24 cells"),
              std::string::npos);
    EXPECT_NE(html.find("0 to 2 deg (2 points)"), std::string::npos);
    // No raw JSON object, list or key: the text between tags never starts with { or [, and
    // the summary's keys are shown by their labels.
    const std::string text = text_between_tags(html);
    EXPECT_EQ(first_line_opening_json(text), "");
    EXPECT_EQ(html.find("{&quot;"), std::string::npos);
    for (const char* key : {"alpha_cd_min", "linear_range", "missing_points", "lift_slope_per_deg",
                            "trailing_edge_closure"})
        EXPECT_EQ(text.find(key), std::string::npos) << key;
    // Every picture the page names exists and is a PNG.
    const std::vector<std::string> pictures = image_sources(html);
    EXPECT_GE(pictures.size(), 5U);
    for (const std::string& src : pictures) EXPECT_TRUE(test::is_png(tmp / "sw" / src)) << src;
}

}  // namespace
}  // namespace veer
