// The bounded-cycle judge of a sweep's steady attempts (app/bounded_cycle.hpp), on synthetic
// force histories whose band, period and drift are known: a cycle inside the band is accepted
// with its mean and half band; one a little wider, one drifting without whole cycles, one too
// short, and a Cd outside its own band are refused.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>
#include <vector>

#include "app/bounded_cycle.hpp"

namespace veer {
namespace {

constexpr double two_pi = 2 * std::numbers::pi;

struct History {
    std::vector<double> cl, cd, cm;
};

/// n iterations of Cl = cl0 + a sin(2 pi n / period) + drift n, Cd = cd0 + b sin(...).
History cycle(long n, double cl0, double a, double cd0, double b, double period,
              double drift = 0.0) {
    History h;
    for (long k = 0; k < n; ++k) {
        const double s = std::sin(two_pi * static_cast<double>(k) / period);
        h.cl.push_back(cl0 + a * s + drift * static_cast<double>(k));
        h.cd.push_back(cd0 + b * s);
        h.cm.push_back(-0.1 + 0.1 * a * s);
    }
    return h;
}

TEST(BoundedCycle, TheDroneCycleIsAcceptedWithItsMeanAndHalfBand) {
    // The measured cycle at 10 degrees (cases/drone-cruise-transition.toml, app/bounded_cycle.hpp):
    // about 70 iterations, Cl 1.4254 +- 0.00115, Cd 0.02001 +- 0.0004; a start-up transient
    // before the judged window.
    History h = cycle(3000, 1.4254, 0.00115, 0.02001, 0.0004, 70.0);
    for (long k = 0; k < 500; ++k) h.cl[static_cast<std::size_t>(k)] += 0.3;  // outside window
    const auto b = bounded_cycle(h.cl, h.cd, h.cm, BoundedCycleCriteria{});
    ASSERT_TRUE(b.has_value());
    // Mean over 1000 iterations = 14.3 periods: the part-period residue is below 1/14 of the
    // amplitude over pi.
    EXPECT_NEAR(b->cl, 1.4254, 3e-5);
    EXPECT_NEAR(b->cd, 0.02001, 1e-5);
    // 70 samples a period miss the peaks by up to A (1 - cos(pi / 70)) = 1e-3 A.
    EXPECT_NEAR(b->cl_half_band, 0.00115, 1.5e-6);
    EXPECT_NEAR(b->cd_half_band, 0.0004, 5e-7);
    EXPECT_EQ(b->iterations, 1000);
    EXPECT_GE(b->cycles, 13);  // 14.3 periods: 14 or 15 upward crossings
    EXPECT_LE(b->cycles, 15);
}

TEST(BoundedCycle, AWiderCycleIsRefused) {
    // Cl peak-to-peak 0.6 % of 1.4254 against the band's 0.5 %.
    const History h = cycle(2000, 1.4254, 0.0043, 0.02001, 0.0004, 70.0);
    EXPECT_FALSE(bounded_cycle(h.cl, h.cd, h.cm, BoundedCycleCriteria{}).has_value());
}

TEST(BoundedCycle, ACdOutsideItsBandIsRefused) {
    // Cl well inside; Cd peak-to-peak 6 % of its mean against the band's 5 %.
    const History h = cycle(2000, 1.4254, 0.0002, 0.02, 0.0006, 70.0);
    EXPECT_FALSE(bounded_cycle(h.cl, h.cd, h.cm, BoundedCycleCriteria{}).has_value());
}

TEST(BoundedCycle, ASlowDriftInsideTheBandIsNoCycle) {
    // Cl creeps by 0.006 over the window (inside 0.5 % of 1.4) with no oscillation: an
    // iteration still moving, not a cycle; refused for want of whole cycles.
    const History h = cycle(2000, 1.4, 0.0, 0.02, 0.0, 70.0, 6e-6);
    EXPECT_FALSE(bounded_cycle(h.cl, h.cd, h.cm, BoundedCycleCriteria{}).has_value());
}

TEST(BoundedCycle, TooShortAHistoryIsNotJudged) {
    const History h = cycle(999, 1.4254, 0.00115, 0.02001, 0.0004, 70.0);
    EXPECT_FALSE(bounded_cycle(h.cl, h.cd, h.cm, BoundedCycleCriteria{}).has_value());
    BoundedCycleCriteria off;
    off.window = 0;  // the sweep's --cycle-band 0
    const History longer = cycle(3000, 1.4254, 0.00115, 0.02001, 0.0004, 70.0);
    EXPECT_FALSE(bounded_cycle(longer.cl, longer.cd, longer.cm, off).has_value());
}

TEST(BoundedCycle, NearZeroLiftUsesTheFloor) {
    // A symmetric section at zero lift: |mean Cl| ~ 0; the band is taken on the floor 1e-3, so
    // a cycle of 2.5e-6 peak-to-peak passes (band 5e-6) and one of 5e-5 does not.
    const History small = cycle(2000, 0.0, 1.25e-6, 0.01, 1e-6, 100.0);
    EXPECT_TRUE(bounded_cycle(small.cl, small.cd, small.cm, BoundedCycleCriteria{}).has_value());
    const History big = cycle(2000, 0.0, 2.5e-5, 0.01, 1e-6, 100.0);
    EXPECT_FALSE(bounded_cycle(big.cl, big.cd, big.cm, BoundedCycleCriteria{}).has_value());
}

}  // namespace
}  // namespace veer
