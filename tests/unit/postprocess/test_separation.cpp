// Stagnation, separation, reattachment and bubbles on synthetic Cf distributions.
#include <gtest/gtest.h>

#include <functional>

#include "postprocess/separation.hpp"

namespace veer {
namespace {

/// A surface sampled at n points of arc s = x in (0, 1) (flat sides, y = +-0.01).
std::vector<SurfacePoint> side(SurfaceSide which, int n, const std::function<double(double)>& cf,
                               const std::function<double(double)>& cp) {
    std::vector<SurfacePoint> pts;
    for (int k = 0; k < n; ++k) {
        SurfacePoint p;
        p.arc = p.x = (k + 0.5) / n;
        p.y = which == SurfaceSide::upper ? 0.01 : -0.01;
        p.side = which;
        p.cf = cf(p.arc);
        p.cp = cp(p.arc);
        pts.push_back(p);
    }
    return pts;
}

// Sampling at h = 1/400: linear interpolation of a zero of a smooth Cf is off by about
// h^2 |cf''| / (8 |cf'|), here below 1e-5 chords; 1e-4 leaves a margin of ten.
constexpr double zero_tolerance = 1e-4;

TEST(Separation, FindsABubbleAndTrailingEdgeSeparation) {
    // Cf > 0 up to 0.3, reversed in the bubble (0.3, 0.45), attached again, separated from 0.8.
    const auto cf = [](double s) { return (s - 0.3) * (s - 0.45) * (0.8 - s); };
    const auto pts = side(SurfaceSide::upper, 400, cf, [](double) { return 0.0; });
    const SurfaceSeparation r = find_surface_separation(pts, 0.0);
    ASSERT_EQ(r.separations.size(), 2u);
    ASSERT_EQ(r.reattachments.size(), 1u);
    ASSERT_EQ(r.bubbles.size(), 1u);
    EXPECT_NEAR(r.bubbles[0].start.arc, 0.3, zero_tolerance);
    EXPECT_NEAR(r.bubbles[0].end.arc, 0.45, zero_tolerance);
    EXPECT_NEAR(r.bubbles[0].start.x, 0.3, zero_tolerance);
    ASSERT_TRUE(r.trailing_edge_separation.has_value());
    EXPECT_NEAR(r.trailing_edge_separation->arc, 0.8, zero_tolerance);
}

TEST(Separation, AttachedFlowHasNoSeparation) {
    const auto pts = side(
        SurfaceSide::lower, 100, [](double s) { return 0.01 / (0.1 + s); },
        [](double) { return 0.0; });
    const SurfaceSeparation r = find_surface_separation(pts, 0.0);
    EXPECT_TRUE(r.separations.empty());
    EXPECT_TRUE(r.reattachments.empty());
    EXPECT_FALSE(r.trailing_edge_separation.has_value());
}

TEST(Separation, StagnationOnTheLowerSurfaceIsNotSeparation) {
    // Shear along +i (lower surface aft to the leading edge, then upper aft) is sigma - sigma0,
    // sigma = -arc below and +arc above: the stagnation point sits at arc 0.02 on the lower
    // surface, ahead of which the lower-surface flow runs forward (Cf < 0). A bubble follows on
    // the lower surface between 0.5 and 0.6.
    const double s0 = 0.02;
    const auto cp = [&](double sigma) { return 1.0 - 50.0 * (sigma + s0) * (sigma + s0); };
    const auto upper = side(
        SurfaceSide::upper, 400, [&](double s) { return s + s0; }, cp);
    const auto lower = side(
        SurfaceSide::lower, 400, [&](double s) { return (s - s0) * (s - 0.5) * (s - 0.6); },
        [&](double s) { return cp(-s); });
    const SurfaceDistribution d{upper, lower, 1.0, 1.0};
    const SeparationReport r = find_separation(d);
    EXPECT_EQ(r.stagnation.side, SurfaceSide::lower);
    EXPECT_NEAR(r.stagnation.arc, s0, zero_tolerance);
    EXPECT_TRUE(r.upper.separations.empty());
    ASSERT_EQ(r.lower.bubbles.size(), 1u);
    EXPECT_NEAR(r.lower.bubbles[0].start.arc, 0.5, zero_tolerance);
    EXPECT_NEAR(r.lower.bubbles[0].end.arc, 0.6, zero_tolerance);
    EXPECT_EQ(r.lower.separations.size(), 1u);
    EXPECT_FALSE(r.lower.trailing_edge_separation.has_value());
}

}  // namespace
}  // namespace veer
