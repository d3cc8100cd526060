// Blunt trailing edges: every gap the outline checks accept (up to 5 % chord) closes to a sharp
// tip a C-grid can leave, a base drawn in the file is set aside, and the closure never bulges.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

#include "cgrid_test_support.hpp"
#include "mesh/cgrid.hpp"
#include "mesh/section_builder.hpp"
#include "mesh/surface_sampling.hpp"
#include "mesh/trailing_edge.hpp"
#include "tests/support/naca_tables.hpp"

namespace veer {
namespace {

constexpr double k_degrees = 180.0 / std::numbers::pi;

/// NACA 0012 with the closed trailing edge (last coefficient -0.1036; Abbott & von Doenhoff 1959,
/// section 6.4 [T]) at 81 cosine stations, its trailing edge opened to `gap` (chords) by adding
/// gap / 2 * x to the half-thickness, as a section thickened for strength or manufacture would
/// be; 6 decimals.
std::vector<Vec2> opened_0012(double gap) {
    return test::loop_of(test::opened_by(
        test::naca_surfaces({0.0, 0.4, 0.12, -0.1036}, test::cosine_stations(81)), gap));
}

RawOutline as_raw(std::vector<Vec2> points, const std::string& source) {
    RawOutline raw;
    raw.source = source;
    for (Vec2& p : points) p = {std::round(p.x * 1e6) / 1e6, std::round(p.y * 1e6) / 1e6};
    raw.points = std::move(points);
    for (std::size_t k = 0; k < raw.points.size(); ++k)
        raw.lines.push_back(static_cast<int>(k) + 2);
    return raw;
}

/// Half the angle between the two sides at the tip (degrees).
double tip_half_angle(const Section& s) {
    const Vec2 a = s.points[1] - s.points[0], b = s.points[s.points.size() - 2] - s.points[0];
    return 0.5 * std::acos(dot(a, b) / (norm(a) * norm(b))) * k_degrees;
}

TEST(TrailingEdgeClosure, EveryAcceptedGapClosesToASlenderTip) {
    // 0.5 % closes with the surfaces' own continuations; from 1.25 % they would meet too far
    // behind (beyond 0.02 chord) and a fairing takes over. The tip half-angle must stay at or
    // below the wedge limit (12 deg), below which the demo grid marches cleanly (the next test).
    for (double gap : {0.005, 0.0125, 0.025, 0.049}) {
        const Section s = make_section(as_raw(opened_0012(gap), "gap.dat"), "g");
        EXPECT_NEAR(s.closure.gap, gap, 2e-6) << gap;  // 6-decimal rounding of each corner
        EXPECT_EQ(s.closure.form, gap < 0.01 ? TrailingEdgeClosure::Form::wedge
                                             : TrailingEdgeClosure::Form::fairing)
            << gap;
        EXPECT_LE(tip_half_angle(s), TrailingEdgeLimits::wedge_half_angle_degrees + 1e-9) << gap;
        EXPECT_EQ(s.points.front().y, 0.0) << gap;  // symmetric: the tip on the chord line
        EXPECT_NEAR(s.points.front().x, 1.0 + s.closure.length, 1e-12) << gap;
    }
}

TEST(TrailingEdgeClosure, EveryAcceptedGapMeshesOnTheDemoGrid) {
    // the demo grid of cases/indoor-flyer-laminar.toml: 256 x 64, wake 48, far field 30, first
    // cell 2e-3. Before the fairing, gaps of 1.25 % chord and more folded the grid here.
    const CGridSpec spec = test::demo_cgrid_spec();
    for (double gap : {0.005, 0.0125, 0.025, 0.049}) {
        const Section s = make_section(as_raw(opened_0012(gap), "gap.dat"), "g");
        EXPECT_NO_THROW(generate_cgrid(sample_surface(s, spec.around), spec)) << gap;
    }
}

TEST(TrailingEdgeClosure, FairingLeavesEachSurfaceSmoothlyAndNeverBulges) {
    // 4.9 % gap: the fairing leaves the corner along the last surface segment (a quadratic
    // Bezier whose first control leg is that direction: the first fairing segment turns by at
    // most the Bezier's own turn over 1/16 of its parameter, under 2 deg here) and closes
    // monotonically: x grows and |y| shrinks from corner to tip
    const Section s = make_section(as_raw(opened_0012(0.049), "gap.dat"), "g");
    ASSERT_EQ(s.closure.form, TrailingEdgeClosure::Form::fairing);
    std::size_t corner = 0;
    while (s.lines[corner] == 0) ++corner;  // the first file point: the lower corner
    ASSERT_GT(corner, 2u);
    const Vec2 surface = s.points[corner] - s.points[corner + 1];
    const Vec2 fairing = s.points[corner - 1] - s.points[corner];
    const double turn = std::acos(dot(surface, fairing) / (norm(surface) * norm(fairing)));
    EXPECT_LT(turn * k_degrees, 2.0);
    for (std::size_t k = corner; k > 0; --k) {
        EXPECT_GT(s.points[k - 1].x, s.points[k].x) << k;
        EXPECT_LE(std::abs(s.points[k - 1].y), std::abs(s.points[k].y)) << k;
    }
    // length: between h / (2 tan 8 - tan phi) and h / tan 8 (h the half gap, phi the surfaces'
    // convergence towards the axis, positive), so the curve turns one way only
    const double h = 0.5 * s.closure.gap, theta = 8.0 / k_degrees;
    EXPECT_GT(s.closure.length, h / (2.0 * std::tan(theta)));
    EXPECT_LT(s.closure.length, h / std::tan(theta));
}

TEST(TrailingEdgeClosure, BaseDrawnInTheFileIsSetAside) {
    // the open 0012 (gap 0.252 %) written three ways: plain; with its first point repeated at
    // the end (the base drawn as the closing segment); and starting and ending at the base
    // centre (the base drawn as two short segments). All give the same section.
    const std::vector<Vec2> loop = opened_0012(0.00252);
    const Section plain = make_section(as_raw(loop, "plain.dat"), "p");
    std::vector<Vec2> repeated = loop;
    repeated.push_back(loop.front());
    std::vector<Vec2> segments = loop;
    segments.insert(segments.begin(), {1.0, 0.0});
    segments.push_back({1.0, 0.0});
    for (const auto& [points, set_aside] : {std::pair{repeated, 1}, std::pair{segments, 2}}) {
        const Section s = make_section(as_raw(points, "base.dat"), "b");
        EXPECT_EQ(s.closure.base_points_set_aside, set_aside);
        EXPECT_EQ(s.closure.form, TrailingEdgeClosure::Form::wedge);
        ASSERT_EQ(s.points.size(), plain.points.size());
        for (std::size_t k = 0; k < s.points.size(); ++k) {
            EXPECT_EQ(s.points[k].x, plain.points[k].x) << k;
            EXPECT_EQ(s.points[k].y, plain.points[k].y) << k;
        }
    }
}

}  // namespace
}  // namespace veer
