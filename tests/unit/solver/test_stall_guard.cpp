/// The stall guard that hands a "fast" steady run over to "classic": converging residuals pass,
/// a plateau or an oscillation of any one equation is caught after the patience, round-off
/// floors are not stalls, and a saved guard continues as the uninterrupted one.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <numbers>
#include <vector>

#include "solver/stall_guard.hpp"

namespace veer {
namespace {

// Residuals of u, v, continuity and two model variables (the guard takes any number).
std::vector<double> falling(long step, double rate) {
    const double f = std::pow(rate, static_cast<double>(step));
    return {1.0 * f, 0.5 * f, 3.0 * f, 2e-5 * f, 7e-3 * f};
}

TEST(StallGuard, ResidualsHalvingWithinThePatienceNeverStall) {
    StallGuard guard;
    const StallRule rule;
    // Halves every 150 steps: slower than any measured "fast" run, inside the 200-step patience.
    const double rate = std::pow(0.5, 1.0 / 150.0);
    for (long n = 1; n <= 3000; ++n) ASSERT_FALSE(guard.stalled_after(falling(n, rate))) << n;
    EXPECT_FALSE(guard.stalled());
    EXPECT_EQ(rule.patience, 200);
}

TEST(StallGuard, APlateauOfOneEquationStallsAfterThePatience) {
    StallRule rule;
    StallGuard guard(rule);
    long stalled_at = 0;
    for (long n = 1; n <= 1000 && stalled_at == 0; ++n) {
        // The fourth equation (a model variable) stops at its step-100 level.
        std::vector<double> r = falling(n, 0.9);
        if (n > 100) r[3] = falling(100, 0.9)[3];
        if (guard.stalled_after(r)) stalled_at = n;
    }
    ASSERT_GT(stalled_at, 0) << "the plateau was not caught";
    // The last progress (a halving, one every 6.6 steps at 0.9 per step) came between steps 94
    // and 100; the stall is declared once `patience` steps have passed without one.
    EXPECT_GE(stalled_at, 94 + rule.patience);
    EXPECT_LE(stalled_at, 100 + rule.patience + 1);
    EXPECT_TRUE(guard.stalled());
    EXPECT_TRUE(guard.stalled_after(falling(2000, 0.9))) << "a stall is final";
}

TEST(StallGuard, AnOscillationWhoseTroughsDoNotFallStalls) {
    StallGuard guard;
    long stalled_at = 0;
    for (long n = 1; n <= 2000 && stalled_at == 0; ++n) {
        // Wanders between 5e-4 and 1e-2 of the reference with a period of 240 steps, as "fast"
        // did at 18 degrees from the free stream.
        const double level =
            n <= 20 ? 1.0
                    : 5e-4 * std::pow(20.0, 0.5 + 0.5 * std::sin(static_cast<double>(n) * 2.0 *
                                                                 std::numbers::pi / 240.0));
        if (guard.stalled_after({level, level, level})) stalled_at = n;
    }
    EXPECT_GT(stalled_at, 200);
    EXPECT_LT(stalled_at, 1000);
}

TEST(StallGuard, ARoundOffFloorFarBelowTheCriteriaIsNotAStall) {
    StallGuard guard;
    for (long n = 1; n <= 2000; ++n) {
        const double level = std::max(std::pow(0.8, static_cast<double>(n)), 1e-12);
        ASSERT_FALSE(guard.stalled_after({level, level})) << n;
    }
}

TEST(StallGuard, ASavedGuardContinuesAsTheUninterruptedOne) {
    StallGuard whole, first;
    auto level = [](long n) {
        return std::vector<double>{n < 150 ? std::pow(0.95, static_cast<double>(n)) : 1e-3};
    };
    for (long n = 1; n <= 200; ++n) {
        whole.stalled_after(level(n));
        first.stalled_after(level(n));
    }
    StallGuard second;
    second.load(first.save());
    long whole_at = 0, second_at = 0;
    for (long n = 201; n <= 1000; ++n) {
        if (whole_at == 0 && whole.stalled_after(level(n))) whole_at = n;
        if (second_at == 0 && second.stalled_after(level(n))) second_at = n;
    }
    ASSERT_GT(whole_at, 0);
    EXPECT_EQ(second_at, whole_at);
    StallGuard fresh;
    fresh.load({});
    EXPECT_FALSE(fresh.stalled());
}

}  // namespace
}  // namespace veer
