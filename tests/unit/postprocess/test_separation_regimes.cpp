// Separated regions told apart by where the layer turned turbulent.
#include <gtest/gtest.h>

#include "postprocess/separation_regimes.hpp"

namespace veer {
namespace {

SurfaceLocation at(double x) { return {SurfaceSide::upper, x, x, 0.05}; }

TEST(SeparationRegimes, ABubbleWithTransitionInsideIsALaminarBubble) {
    SurfaceSeparation s;
    s.bubbles.push_back({at(0.30), at(0.42)});
    const auto regions = separated_regions(s, at(0.38));
    ASSERT_EQ(regions.size(), 1u);
    EXPECT_EQ(regions[0].kind, SeparationKind::laminar_bubble);
    ASSERT_TRUE(regions[0].transition.has_value());
    EXPECT_DOUBLE_EQ(regions[0].transition->x, 0.38);
    ASSERT_TRUE(regions[0].end.has_value());
    EXPECT_DOUBLE_EQ(regions[0].end->x, 0.42);
}

TEST(SeparationRegimes, SeparationBehindTransitionIsTurbulent) {
    // A laminar bubble closed by transition, then the turbulent layer leaves the wall at 0.85.
    SurfaceSeparation s;
    s.bubbles.push_back({at(0.10), at(0.16)});
    s.trailing_edge_separation = at(0.85);
    const auto regions = separated_regions(s, at(0.13));
    ASSERT_EQ(regions.size(), 2u);
    EXPECT_EQ(regions[0].kind, SeparationKind::laminar_bubble);
    EXPECT_EQ(regions[1].kind, SeparationKind::turbulent_separation);
    EXPECT_FALSE(regions[1].end.has_value());
    EXPECT_FALSE(regions[1].transition.has_value());
    EXPECT_EQ(kind_words(regions[1].kind), "turbulent separation");
}

TEST(SeparationRegimes, OpenSeparationAheadOfTransitionIsLaminarSeparation) {
    // A burst bubble: separates at 0.05 and never reattaches; transition in the reversed flow.
    SurfaceSeparation s;
    s.trailing_edge_separation = at(0.05);
    const auto regions = separated_regions(s, at(0.2));
    ASSERT_EQ(regions.size(), 1u);
    EXPECT_EQ(regions[0].kind, SeparationKind::laminar_separation);
    ASSERT_TRUE(regions[0].transition.has_value());
}

TEST(SeparationRegimes, WithoutTransitionEveryRegionIsLaminar) {
    // A laminar model, or a layer laminar to the trailing edge.
    SurfaceSeparation s;
    s.bubbles.push_back({at(0.5), at(0.6)});
    s.trailing_edge_separation = at(0.9);
    const auto regions = separated_regions(s, std::nullopt);
    ASSERT_EQ(regions.size(), 2u);
    EXPECT_EQ(regions[0].kind, SeparationKind::laminar_bubble);
    EXPECT_FALSE(regions[0].transition.has_value());
    EXPECT_EQ(regions[1].kind, SeparationKind::laminar_separation);
}

TEST(SeparationRegimes, TransitionAfterReattachmentIsNotInsideTheBubble) {
    SurfaceSeparation s;
    s.bubbles.push_back({at(0.2), at(0.3)});
    const auto regions = separated_regions(s, at(0.5));
    ASSERT_EQ(regions.size(), 1u);
    EXPECT_EQ(regions[0].kind, SeparationKind::laminar_bubble);
    EXPECT_FALSE(regions[0].transition.has_value());
}

}  // namespace
}  // namespace veer
