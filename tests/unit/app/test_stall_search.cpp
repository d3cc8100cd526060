// The stall search of a sweep on synthetic polars: the planner (app/stall_search.hpp) is run as
// the sweep runs it, each planned angle "computed" from a known lift curve, until it stops.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <functional>

#include "app/stall_search.hpp"

namespace veer {
namespace {

using LiftCurve = std::function<double(double)>;

struct SearchRun {
    std::vector<PolarSample> samples;
    std::vector<double> attempted;
    std::vector<double> added;
    StallSearchStep last;
};

/// Runs the requested angles, then the planner's until it stops (at most 50 rounds, a guard).
SearchRun run_search(const std::vector<double>& requested, const LiftCurve& cl,
                     const std::vector<double>& failing = {}) {
    SearchRun run;
    auto compute = [&](double a) {
        run.attempted.push_back(a);
        for (double f : failing)
            if (std::abs(f - a) < 1e-9) return;
        run.samples.push_back({a, cl(a)});
    };
    for (double a : requested) compute(a);
    const StallSearchRule rule{requested, 5, 0.5};
    for (int round = 0; round < 50; ++round) {
        run.last = next_stall_search_step(run.samples, run.attempted, rule);
        if (run.last.state != StallSearchState::searching) break;
        EXPECT_FALSE(run.last.angles.empty()) << "a searching step names its angles";
        for (double a : run.last.angles) compute(a), run.added.push_back(a);
    }
    return run;
}

// A lift curve shaped like a section's near stall: rising, rounded top at 16.7 deg, falling.
double rounded_stall(double a) { return 1.6 - 0.01 * (a - 16.7) * (a - 16.7); }

TEST(StallSearch, SweepEndingBeforeStallGoesOnAndBracketsToHalfADegree) {
    const SearchRun run = run_search({8, 12, 16}, rounded_stall);
    ASSERT_EQ(run.last.state, StallSearchState::bracketed) << run.last.why;
    ASSERT_FALSE(run.added.empty());
    EXPECT_DOUBLE_EQ(run.added.front(), 20.0) << "the first added angle is one step beyond";
    const std::optional<StallBracket> b = stall_bracket(run.samples);
    ASSERT_TRUE(b && b->bracketed);
    ASSERT_TRUE(b->alpha_uncertainty);
    EXPECT_LE(*b->alpha_uncertainty, 0.5);
    EXPECT_LE(std::abs(b->alpha_cl_max - 16.7), *b->alpha_uncertainty);
    // Each round halves the gaps: 4 -> 2 -> 1 -> 0.5, at most two angles a round, plus 20.
    EXPECT_LE(run.added.size(), 7u);
}

TEST(StallSearch, ClMaxUncertaintyIsTheParabolasPeakAboveTheSample) {
    // Samples of an exact parabola: its peak (1.6 at 16.7) is known.
    const std::optional<StallBracket> b =
        stall_bracket({{16, rounded_stall(16)}, {17, rounded_stall(17)}, {18, rounded_stall(18)}});
    ASSERT_TRUE(b && b->bracketed && b->cl_uncertainty);
    EXPECT_DOUBLE_EQ(b->alpha_cl_max, 17.0);
    EXPECT_NEAR(b->cl_max + *b->cl_uncertainty, 1.6, 1e-12);
    EXPECT_DOUBLE_EQ(*b->alpha_uncertainty, 1.0);
}

TEST(StallSearch, CapStopsALiftThatKeepsRising) {
    const SearchRun run = run_search({0, 4, 8, 12}, [](double a) { return 0.05 * a; });
    EXPECT_EQ(run.last.state, StallSearchState::capped);
    EXPECT_EQ(run.added, (std::vector<double>{16, 20, 24, 28, 32})) << "five steps of 4 deg";
    EXPECT_NE(run.last.why.find("cap"), std::string::npos) << run.last.why;
    const std::optional<StallBracket> b = stall_bracket(run.samples);
    ASSERT_TRUE(b);
    EXPECT_FALSE(b->bracketed);
    EXPECT_FALSE(b->alpha_uncertainty);
}

TEST(StallSearch, BracketedSweepAtFineSpacingAddsNothing) {
    const SearchRun run = run_search({15.5, 16, 16.5, 17, 17.5}, rounded_stall);
    EXPECT_EQ(run.last.state, StallSearchState::bracketed);
    EXPECT_TRUE(run.added.empty());
}

TEST(StallSearch, PostStallSweepSearchesBelowItsLowestAngle) {
    const SearchRun run = run_search({18, 22, 26}, rounded_stall);
    ASSERT_FALSE(run.added.empty());
    EXPECT_DOUBLE_EQ(run.added.front(), 14.0);
    EXPECT_EQ(run.last.state, StallSearchState::bracketed);
}

TEST(StallSearch, FailedExtensionIsSteppedOver) {
    // 20 fails: the search goes one step further (24, where Cl has fallen) and brackets, halving
    // towards the maximum past the failed angle.
    const SearchRun run = run_search({8, 12, 16}, rounded_stall, {20});
    EXPECT_EQ(run.last.state, StallSearchState::bracketed) << run.last.why;
    ASSERT_GE(run.added.size(), 2u);
    EXPECT_EQ(run.added[0], 20.0);
    EXPECT_EQ(run.added[1], 24.0);
    EXPECT_EQ(std::count(run.added.begin(), run.added.end(), 20.0), 1);
}

TEST(StallSearch, FailedRefinementAngleIsSteppedAround) {
    // 14 (the middle of 12..16) fails: the next try is the middle of 14..16.
    const SearchRun run = run_search({8, 12, 16, 20}, rounded_stall, {14});
    EXPECT_EQ(run.last.state, StallSearchState::bracketed) << run.last.why;
    EXPECT_EQ(std::count(run.added.begin(), run.added.end(), 14.0), 1);
    EXPECT_EQ(std::count(run.added.begin(), run.added.end(), 15.0), 1);
}

TEST(StallSearch, StopsWhenEveryAngleBelowTheMaximumFails) {
    // A peak at 16 exactly: below it every try fails, down to a quarter degree from it.
    const SearchRun run =
        run_search({8, 12, 16, 20}, [](double a) { return 1.6 - 0.01 * (a - 16) * (a - 16); },
                   {14, 15, 15.5, 15.75});
    EXPECT_EQ(run.last.state, StallSearchState::no_new_angle) << run.last.why;
    for (double a : {14.0, 15.0, 15.5, 15.75})
        EXPECT_EQ(std::count(run.added.begin(), run.added.end(), a), 1) << a;
    EXPECT_NE(run.last.why.find("failed"), std::string::npos) << run.last.why;
}

TEST(StallSearch, SingleAngleIsLeftAlone) {
    const SearchRun run = run_search({8}, rounded_stall);
    EXPECT_EQ(run.last.state, StallSearchState::too_few);
    EXPECT_TRUE(run.added.empty());
}

TEST(StallSearch, WhyTextsHaveNoCommaForTheCsv) {
    const SearchRun run = run_search({8, 12, 16}, rounded_stall);
    const StallSearchStep first =
        next_stall_search_step({{8, 0.9}, {12, 1.2}}, {8, 12}, StallSearchRule{{8, 12}, 5, 0.5});
    ASSERT_EQ(first.state, StallSearchState::searching);
    EXPECT_EQ(first.why.find(','), std::string::npos) << first.why;
    EXPECT_EQ(run.last.why.find(','), std::string::npos) << run.last.why;
}

}  // namespace
}  // namespace veer
