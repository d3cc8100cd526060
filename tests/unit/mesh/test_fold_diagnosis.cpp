// When the C-grid folds, the message names the outline region under the fold (with the file
// line) and the geometric cause found there, with advice that fits it.
#include <gtest/gtest.h>

#include <cmath>

#include "cgrid_test_support.hpp"
#include "mesh/cgrid.hpp"
#include "mesh/fold_diagnosis.hpp"
#include "mesh/naca.hpp"
#include "mesh/section_builder.hpp"
#include "mesh/surface_sampling.hpp"
#include "tests/support/naca_tables.hpp"

namespace veer {
namespace {

void expect_contains(const std::string& text, const std::string& part) {
    EXPECT_NE(text.find(part), std::string::npos) << "'" << part << "' not in: " << text;
}

TEST(FoldDiagnosis, ConcaveBendNamesItsPlaceRadiusAndLine) {
    // NACA 0012 (closed edge; Abbott & von Doenhoff 1959, section 6.4 [T]) at 401 stations with a
    // smooth dent in the lower surface (depth 0.02, width 0.03 at x = 0.5; bottom radius
    // w^2 / 2d = 0.0225 chords): smooth at every station, so the outline checks pass, but grid
    // lines marched from it meet about 0.02 chords out
    test::Surfaces s = test::naca_surfaces({0.0, 0.4, 0.12, -0.1036}, test::cosine_stations(401));
    for (Vec2& p : s.lower) p.y += 0.02 * std::exp(-std::pow((p.x - 0.5) / 0.03, 2));
    RawOutline raw;
    raw.source = "dented.dat";
    raw.points = test::loop_of(s);
    for (std::size_t k = 0; k < raw.points.size(); ++k)
        raw.lines.push_back(static_cast<int>(k) + 2);
    const Section section = make_section(raw, "dented");
    const CGridSpec spec = test::demo_cgrid_spec();
    const std::vector<Vec2> surface = sample_surface(section, spec.around);
    try {
        generate_cgrid(surface, spec);
        FAIL() << "the dented section meshed";
    } catch (const GridFoldError& e) {
        const std::string m = explain_fold(e, section, surface, spec);
        expect_contains(m, "mesh: the C-grid folds at cell (");
        expect_contains(m, "off the lower surface at x = 0.49");
        expect_contains(m, "the outline bends inwards at (0.50");
        expect_contains(m, "(near file line 60");  // the dent's stations are lines 598-604
        expect_contains(m, "with a radius of 0.02");
        expect_contains(m, "check the coordinates there, or give the bend a radius");
        EXPECT_EQ(m.find('\n'), std::string::npos);
    }
}

TEST(FoldDiagnosis, WakeFoldAtTheTipNamesTheTrailingEdge) {
    // a fold reported in the first wake cell above the cut (as blunt closures used to give) on
    // a sharp 0012: the cause named is the tip, with its half-angle (atan 0.145 = 8.26 deg, the
    // closed-edge thickness slope at x = 1)
    const Section section = make_section(naca_outline("0012", TrailingEdge::closed), "0012");
    const CGridSpec spec = test::demo_cgrid_spec();
    const std::vector<Vec2> surface = sample_surface(section, spec.around);
    const GridFoldError fold("folded", MarchOutcome{true, spec.wake - 1, 12, {1.004, -0.05}}, 0.05);
    const std::string m = explain_fold(fold, section, surface, spec);
    expect_contains(m, "above the wake cut 0.004 chords behind the trailing edge");
    expect_contains(m,
                    "the trailing-edge tip, where the wall meets the wake cut at a half-angle "
                    "of 8.2");
    expect_contains(m, "use more normal cells (normal = 64)");
}

TEST(FoldDiagnosis, NoFeatureGivesTheGridRemedies) {
    // mid-chord of a smooth section, far from the wall: nothing in the outline explains it
    const Section section = make_section(naca_outline("0012", TrailingEdge::closed), "0012");
    const CGridSpec spec = test::demo_cgrid_spec();
    const std::vector<Vec2> surface = sample_surface(section, spec.around);
    const int i = spec.wake + spec.around / 4;
    const GridFoldError fold("folded", MarchOutcome{true, i, 40, {0.5, -1.0}}, 1.0);
    const std::string m = explain_fold(fold, section, surface, spec);
    expect_contains(m, "off the lower surface at x = 0.");
    expect_contains(m, "no sharp feature of the outline lies below it; use more normal cells");
}

}  // namespace
}  // namespace veer
