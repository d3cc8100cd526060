// make_section: normalisation, either ordering, blunt trailing edges and every refused outline.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <numbers>

#include "mesh/errors.hpp"
#include "mesh/naca.hpp"
#include "mesh/section_builder.hpp"
#include "tests/reference_table.hpp"
#include "tests/support/naca_tables.hpp"

namespace veer {
namespace {

/// A generated outline with its leading-edge hint removed, as a file would give it.
RawOutline as_file(RawOutline raw) {
    raw.leading_edge.reset();
    return raw;
}

std::string error_of(const RawOutline& raw) {
    try {
        make_section(raw, "test");
    } catch (const InputError& e) {
        return e.what();
    }
    return "(no error)";
}

void expect_contains(const std::string& text, const std::string& part) {
    EXPECT_NE(text.find(part), std::string::npos) << "'" << part << "' not in: " << text;
}

double max_distance(const Section& a, const Section& b) {
    EXPECT_EQ(a.points.size(), b.points.size());
    double worst = 0.0;
    for (std::size_t k = 0; k < std::min(a.points.size(), b.points.size()); ++k) {
        worst = std::max(worst, norm(a.points[k] - b.points[k]));
    }
    return worst;
}

TEST(SectionBuilder, SharpSectionIsNormalisedAndOrdered) {
    const Section s = make_section(naca_outline("2412", TrailingEdge::closed), "drone wing");
    EXPECT_EQ(s.name, "drone wing");
    ASSERT_EQ(s.points.size(), 321u);  // a sharp source gains no points
    EXPECT_EQ(s.leading_edge, 160u);
    EXPECT_EQ(s.closure.gap, 0.0);
    EXPECT_EQ(s.closure.form, TrailingEdgeClosure::Form::sharp);
    EXPECT_EQ(s.frame.origin, SectionFrame::Origin::analytic);  // the formula's own chord line
    EXPECT_EQ(s.frame.rotation_deg, 0.0);
    EXPECT_EQ(s.points.front().x, 1.0);
    EXPECT_EQ(s.points.front().y, 0.0);
    EXPECT_EQ(s.points.back().x, 1.0);
    EXPECT_EQ(s.points.back().y, 0.0);
    EXPECT_EQ(s.points[s.leading_edge].x, 0.0);
    EXPECT_EQ(s.points[s.leading_edge].y, 0.0);
    // lower surface first: at mid-chord the first half is below the second
    EXPECT_LT(s.points[80].y, s.points[240].y);
    for (const Vec2& p : s.points) {
        // the formula's upper surface runs ahead of its nose by y_t sin(theta), under 1e-4 here
        EXPECT_GE(p.x, -1e-4);
        EXPECT_LE(p.x, 1.0 + 1e-12);
    }
}

TEST(SectionBuilder, EitherOrderingGivesTheSameSection) {
    // the same points listed upper surface first (counter-clockwise) must give the same Section;
    // the operations differ only in order, so round-off (1e-15) is the tolerance
    const RawOutline lower_first = as_file(naca_outline("4412", TrailingEdge::closed, 81));
    RawOutline upper_first = lower_first;
    std::reverse(upper_first.points.begin(), upper_first.points.end());
    const Section a = make_section(lower_first, "a");
    const Section b = make_section(upper_first, "b");
    EXPECT_EQ(a.leading_edge, b.leading_edge);
    EXPECT_LT(max_distance(a, b), 1e-15);
    // and with the hint of the generator, reversed along with the points
    RawOutline hinted = naca_outline("4412", TrailingEdge::open, 81);
    const Section c = make_section(hinted, "c");
    std::reverse(hinted.points.begin(), hinted.points.end());
    hinted.leading_edge = hinted.points.size() - 1 - *hinted.leading_edge;
    EXPECT_LT(max_distance(c, make_section(hinted, "d")), 1e-15);
}

TEST(SectionBuilder, TableInChordUnitsKeepsItsAxes) {
    // symmetric: the foremost point is the nose, so hint or no hint the Section is the same, bit
    // for bit
    const Section hinted = make_section(naca_outline("0012", TrailingEdge::open), "h");
    const Section found = make_section(as_file(naca_outline("0012", TrailingEdge::open)), "f");
    EXPECT_EQ(found.leading_edge, hinted.leading_edge);
    EXPECT_EQ(max_distance(found, hinted), 0.0);
    // cambered: the table is in chord units, so its own axes are the chord line and nothing moves
    // (the point farthest from the trailing edge lies a little off the formula's nose and would
    // turn the section if it defined the chord line)
    const RawOutline raw = as_file(naca_outline("4412", TrailingEdge::open));
    const Section cambered = make_section(raw, "c");
    EXPECT_EQ(cambered.frame.origin, SectionFrame::Origin::file_axes);
    EXPECT_EQ(cambered.frame.scale, 1.0);
    EXPECT_EQ(cambered.frame.rotation_deg, 0.0);
    const Section analytic = make_section(naca_outline("4412", TrailingEdge::open), "a");
    EXPECT_EQ(max_distance(cambered, analytic), 0.0);
    // every point of the table is in the section as it was, between the added tips
    ASSERT_EQ(cambered.points.size(), raw.points.size() + 2);
    for (std::size_t k = 0; k < raw.points.size(); ++k) {
        const Vec2 p = raw.points[k];  // the generator runs lower surface first, as a Section
        EXPECT_EQ(cambered.points[k + 1].x, p.x) << k;
        EXPECT_EQ(cambered.points[k + 1].y, p.y) << k;
    }
    // the foremost point of the formula's outline is a little ahead of (0, 0) on the upper side
    EXPECT_LT(cambered.points[cambered.leading_edge].x, 0.0);
    EXPECT_GT(cambered.points[cambered.leading_edge].y, 0.0);
}

TEST(SectionBuilder, DroopedNoseKeepsTheFileAxes) {
    // a 4412 table (35 cosine stations, Abbott & von Doenhoff 1959 section 6.4 [T]) whose nose
    // stations are shifted down, up to 1.5 % chord at the nose and fading out by x = 0.15 (a real
    // asymmetric nose): the file's chord line stays, and nothing is turned or scaled, so the
    // user's angle of attack is the angle of their data
    RawOutline raw;
    raw.source = "drooped.dat";
    raw.points = test::loop_of(test::naca_surfaces({0.04, 0.4, 0.12}, test::cosine_stations(35)));
    for (Vec2& p : raw.points)
        if (p.x < 0.15) p.y -= 0.015 * std::pow(1.0 - p.x / 0.15, 2);
    const Section s = make_section(raw, "drooped");
    EXPECT_EQ(s.frame.origin, SectionFrame::Origin::file_axes);
    EXPECT_EQ(s.frame.rotation_deg, 0.0);
    EXPECT_EQ(s.frame.scale, 1.0);
    EXPECT_NEAR(s.points[s.leading_edge].y, -0.015, 1e-12);  // the nose point, as written
    // the line from the drooped nose to the trailing edge points nose-down: taking it as the
    // chord line would have turned the section by -0.70 deg and changed every angle of attack
    const Section turned = make_section(raw, "turned", ChordLineChoice::nose_to_tail);
    EXPECT_LT(turned.frame.rotation_deg, -0.5);
}

TEST(SectionBuilder, NoseToTailChordLineTurnsACamberedTable) {
    // asked for, the line from the farthest point to the trailing-edge centre is used: on a 4412
    // that point lies off the formula's nose, so the section turns a little, and says by how much
    const RawOutline raw = as_file(naca_outline("4412", TrailingEdge::open, 81));
    const Section s = make_section(raw, "c", ChordLineChoice::nose_to_tail);
    EXPECT_EQ(s.frame.origin, SectionFrame::Origin::nose_to_tail);
    EXPECT_GT(std::abs(s.frame.rotation_deg), 0.01);
    EXPECT_LT(std::abs(s.frame.rotation_deg), 0.5);
    EXPECT_EQ(s.points[s.leading_edge].x, 0.0);
    EXPECT_EQ(s.points[s.leading_edge].y, 0.0);
}

TEST(SectionBuilder, InvariantUnderRotationScaleAndShift) {
    // a file in other units and attitude (chord 250 mm, pitched 12 deg, offset) is placed by
    // veer (it is not in chord units) and gives the same Section as the unmoved table placed the
    // same way. Round-off of the transforms and of the Newton refinement of the nose: 1e-9.
    const RawOutline raw = as_file(naca_outline("2412", TrailingEdge::open, 121));
    RawOutline moved = raw;
    const double a = 12.0 * std::numbers::pi / 180.0;
    for (Vec2& p : moved.points) {
        p = {250.0 * (std::cos(a) * p.x - std::sin(a) * p.y) + 40.0,
             250.0 * (std::sin(a) * p.x + std::cos(a) * p.y) - 7.0};
    }
    const Section s0 = make_section(raw, "a", ChordLineChoice::nose_to_tail);
    const Section s1 = make_section(moved, "b");
    EXPECT_EQ(s1.frame.origin, SectionFrame::Origin::nose_to_tail);
    EXPECT_EQ(s0.leading_edge, s1.leading_edge);
    EXPECT_LT(max_distance(s0, s1), 1e-9);
    EXPECT_NEAR(s0.closure.gap, s1.closure.gap, 1e-12);
    // the file was turned 12 deg counter-clockwise (nose-down): veer turned it back by -12 deg
    EXPECT_NEAR(s1.frame.rotation_deg, s0.frame.rotation_deg - 12.0, 1e-9);
    EXPECT_NEAR(s1.frame.scale, s0.frame.scale / 250.0, 1e-15);
}

TEST(SectionBuilder, FileAxesAskedOfAFileNotInChordUnitsIsRefused) {
    RawOutline raw = as_file(naca_outline("0012", TrailingEdge::open, 61));
    for (Vec2& p : raw.points) p = 0.25 * p;  // chord 0.25: written in metres
    raw.source = "metres.dat";
    std::string e;
    try {
        make_section(raw, "m", ChordLineChoice::file_axes);
    } catch (const InputError& error) {
        e = error.what();
    }
    expect_contains(e, "metres.dat: chord_line = \"file-axes\" needs coordinates in chords");
    expect_contains(e, "the trailing-edge centre is at (0.25, 0)");
    // automatic places it instead: scale 4, no rotation (a symmetric section)
    const Section s = make_section(raw, "m");
    EXPECT_EQ(s.frame.origin, SectionFrame::Origin::nose_to_tail);
    EXPECT_NEAR(s.frame.scale, 4.0, 1e-12);
    EXPECT_EQ(s.frame.rotation_deg, 0.0);
}

TEST(SectionBuilder, BluntTrailingEdgeIsClosedWithAWedge) {
    // open 0012: gap 0.00252 chord (Abbott & von Doenhoff 1959 [T]); the surfaces' last segments
    // meet about 0.009 chord behind the base (half-angle 8 deg), well within the wedge's reach.
    // The chord stays the formula's: the base sits at x = 1 and the tip behind it.
    const Section s = make_section(naca_outline("0012", TrailingEdge::open), "blunt");
    ASSERT_EQ(s.points.size(), 323u);  // the tip is added first and last
    const test::ReferenceTable abbott =
        test::ReferenceTable::read("abbott1959_naca_sections.csv", 4);
    EXPECT_EQ(s.closure.form, TrailingEdgeClosure::Form::wedge);
    EXPECT_NEAR(s.closure.gap, abbott.value("trailing_edge_thickness_t12"), 5e-6);
    EXPECT_EQ(s.points.front().x, s.points.back().x);
    EXPECT_EQ(s.points.front().y, 0.0);
    EXPECT_EQ(s.points.back().y, 0.0);
    EXPECT_NEAR(s.points.front().x, 1.0 + s.closure.length, 1e-15);
    EXPECT_GT(s.closure.length, 0.007);
    EXPECT_LT(s.closure.length, 0.011);
    const Vec2 lower_base = s.points[1], upper_base = s.points[s.points.size() - 2];
    EXPECT_EQ(lower_base.x, 1.0);
    EXPECT_EQ(upper_base.x, 1.0);
    EXPECT_EQ(lower_base.y, -upper_base.y);
    // the wedge continues the surface directions: the angle between the base-to-tip segment and
    // the last surface segment is round-off small
    const Vec2 last = lower_base - s.points[2];
    const Vec2 wedge = s.points[0] - lower_base;
    EXPECT_NEAR(cross(last, wedge) / (norm(last) * norm(wedge)), 0.0, 1e-9);
}

TEST(SectionBuilder, TooFewPointsAreRefused) {
    RawOutline raw;
    raw.points = {{1, 0}, {0.5, 0.05}, {0, 0}, {0.5, -0.05}, {1, 0}};
    raw.source = "five.dat";
    EXPECT_EQ(error_of(raw), "five.dat: a section outline needs at least 20 points, found 5");
}

TEST(SectionBuilder, RepeatedPointIsRefusedWithItsLine) {
    RawOutline raw = as_file(naca_outline("0012", TrailingEdge::open, 41));
    raw.points.insert(raw.points.begin() + 30, raw.points[30]);
    raw.source = "repeat.dat";
    for (std::size_t k = 0; k < raw.points.size(); ++k)
        raw.lines.push_back(static_cast<int>(k) + 2);
    const std::string e = error_of(raw);
    expect_contains(e, "repeat.dat:33:");  // point index 31, one title line before the first
    expect_contains(e, "repeats the previous one (line 32 (");
    expect_contains(e, "a duplicated station");
    expect_contains(e, "neighbours: line 31 (");
    // generated outlines name the point instead
    raw.lines.clear();
    expect_contains(error_of(raw), "repeat.dat (point 32)");
}

TEST(SectionBuilder, OpenLoopIsRefusedWithTheTolerance) {
    RawOutline raw = as_file(naca_outline("0012", TrailingEdge::open, 61));
    raw.points.resize(raw.points.size() - 20);  // stops at mid upper surface
    raw.source = "half.dat";
    const std::string e = error_of(raw);
    expect_contains(e, "half.dat: the outline is not one closed loop");
    expect_contains(e, "at most 0.05 allowed");
}

TEST(SectionBuilder, FigureEightIsRefusedAsSelfIntersecting) {
    // x = 0.5 + 0.5 cos t, y = 0.1 sin 2t, 60 points: the two lobes cross at (0.5, 0)
    RawOutline raw;
    raw.source = "eight.dat";
    for (int k = 0; k < 60; ++k) {
        const double t = 2.0 * std::numbers::pi * k / 60;
        raw.points.push_back({0.5 + 0.5 * std::cos(t), 0.1 * std::sin(2.0 * t)});
        raw.lines.push_back(k + 1);
    }
    const std::string e = error_of(raw);
    expect_contains(e, "eight.dat: the outline crosses itself");
    expect_contains(e, "lines 15 and 16");  // t just before pi/2 runs into the crossing
}

TEST(SectionBuilder, CrossingIsFoundInALargeOutline) {
    // 1001 points; the upper surface dips smoothly (no sharp turn) through the lower one
    // between x = 0.4 and 0.6
    RawOutline raw = as_file(naca_outline("0012", TrailingEdge::open, 501));
    for (std::size_t k = 501; k < raw.points.size(); ++k) {
        Vec2& p = raw.points[k];
        if (p.x > 0.4 && p.x < 0.6)
            p.y -= 0.2 * std::pow(std::sin((p.x - 0.4) / 0.2 * std::numbers::pi), 2);
    }
    raw.source = "dented.dat";
    expect_contains(error_of(raw), "dented.dat: the outline crosses itself");
}

TEST(SectionBuilder, PointThrownBackIsNamedAsOutOfPlace) {
    // one lower-surface point thrown back upstream: the outline runs back to it and turns again;
    // leaving that point out mends it, so it is the one named (point 21, 1-based)
    RawOutline raw = as_file(naca_outline("0012", TrailingEdge::open, 61));
    raw.points[20] = raw.points[19] + 3.0 * (raw.points[18] - raw.points[19]);
    raw.source = "thrown.dat";
    const std::string e = error_of(raw);
    expect_contains(e, "thrown.dat (point 21): point (");
    expect_contains(e, "is out of place");
    expect_contains(e, "at most 150 allowed");
    expect_contains(e, "neighbours: point 20 (");
}

TEST(SectionBuilder, PairInReverseOrderIsNamed) {
    // two stations of the lower surface swapped (a reversed step): swapping them back mends it
    RawOutline raw = as_file(naca_outline("0012", TrailingEdge::open, 61));
    std::swap(raw.points[30], raw.points[31]);
    raw.source = "swapped.dat";
    for (std::size_t k = 0; k < raw.points.size(); ++k)
        raw.lines.push_back(static_cast<int>(k) + 3);  // two header lines
    const std::string e = error_of(raw);
    expect_contains(e, "swapped.dat:33: line 33 (");
    expect_contains(e, "and line 34 (");
    expect_contains(e, "are in reverse order");
    expect_contains(e, "neighbours: line 32 (");
    expect_contains(e, "line 35 (");
}

TEST(SectionBuilder, LoopStartingAtTheNoseIsRefused) {
    // a loop listed from the nose over the upper surface to the trailing edge and back: with a
    // sharp edge it turns back at the tip, with a blunt one it does not, and both are named
    for (const double last : {-0.1036, -0.1015}) {
        const test::Surfaces s =
            test::naca_surfaces({0.04, 0.4, 0.12, last}, test::cosine_stations(35));
        RawOutline raw;
        raw.source = "nose_first.dat";
        raw.points = s.upper;
        raw.points.insert(raw.points.end(), s.lower.rbegin() + 1, s.lower.rend());
        for (std::size_t k = 0; k < raw.points.size(); ++k)
            raw.lines.push_back(static_cast<int>(k) + 2);
        expect_contains(error_of(raw),
                        "nose_first.dat:2: the loop starts and ends at (0, 0), "
                        "where the outline is round");
    }
}

TEST(SectionBuilder, ErrorsAreOneLine) {
    RawOutline raw = as_file(naca_outline("0012", TrailingEdge::open, 61));
    raw.points.resize(60);
    raw.source = "short.dat";
    EXPECT_EQ(error_of(raw).find('\n'), std::string::npos);
}

}  // namespace
}  // namespace veer
