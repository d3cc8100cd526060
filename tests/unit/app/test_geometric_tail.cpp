// The remaining-change estimate of a settling force (app/geometric_tail.hpp) and the stop it
// allows in the convergence monitor: a geometric settling stops once its remaining change is
// within the tolerance, earlier than the 100-step window would; an oscillation that the window
// keeps running is never stopped by the estimate.
#include <gtest/gtest.h>

#include <cmath>
#include <deque>

#include "app/convergence.hpp"
#include "app/geometric_tail.hpp"

namespace veer {
namespace {

constexpr double pi = 3.14159265358979323846;

std::deque<double> geometric(double limit, double amplitude, double rate, int n) {
    std::deque<double> x;
    for (int k = 0; k < n; ++k) x.push_back(limit + amplitude * std::pow(rate, k));
    return x;
}

TEST(GeometricTail, EstimatesTheDistanceToTheLimitOfAGeometricSettling) {
    // 0.955 per step: the rate of the lift mode of "fast" (solver/README.md).
    const std::deque<double> x = geometric(1.08, 1e-3, 0.955, 60);
    const double truth = std::abs(x.back() - 1.08);
    EXPECT_NEAR(geometric_tail(x, 10, 0.9), truth, 1e-6 * truth);
    // Falling towards the limit from above or below alike.
    const std::deque<double> rising = geometric(1.08, -1e-3, 0.955, 60);
    EXPECT_NEAR(geometric_tail(rising, 10, 0.9), truth, 1e-6 * truth);
}

TEST(GeometricTail, DistrustsWhatIsNotAGeometricSettling) {
    EXPECT_TRUE(std::isinf(geometric_tail(geometric(1.0, 1e-3, 0.955, 30), 10, 0.9)))
        << "needs three blocks and one more value";
    EXPECT_TRUE(std::isinf(geometric_tail(geometric(1.0, 1e-3, 0.995, 60), 10, 0.9)))
        << "0.995 per step is 0.95 per block, above the ratio allowed";
    std::deque<double> turning;  // a slow oscillation nearing its crest: slowing, not geometric
    for (int k = 0; k < 31; ++k) turning.push_back(1e-4 * std::sin(2.0 * pi * (k - 40) / 300.0));
    EXPECT_TRUE(std::isinf(geometric_tail(turning, 10, 0.9)));
    std::deque<double> noisy = geometric(1.0, 1e-3, 0.955, 60);
    noisy[55] += 1e-4;  // one step against the others
    EXPECT_TRUE(std::isinf(geometric_tail(noisy, 10, 0.9)));
    EXPECT_EQ(geometric_tail(std::deque<double>(31, 0.7), 10, 0.9), 0.0) << "all still";
}

/// Steps until the monitor stops a run whose residuals are already low and whose Cl is
/// `cl(step)` (Cd constant); -1 if it does not within `cap`. `last_cl` gets the Cl at the stop.
template <class Cl>
int stop_step(const ConvergenceCriteria& c, Cl cl, int cap, double& last_cl) {
    ConvergenceMonitor m(c);
    for (int n = 1; n <= cap; ++n) {
        const double r = n <= c.reference_steps ? 1.0 : 1e-8;
        last_cl = cl(n);
        if (m.add({{r, r, r}, last_cl, 0.01})) return n;
    }
    return -1;
}

TEST(ConvergenceMonitor, GeometricSettlingStopsWithinTheToleranceBeforeTheWindow) {
    ConvergenceCriteria estimate;  // veer run's defaults: tolerance 1e-5, window 100
    ConvergenceCriteria window = estimate;
    window.tail_block = 0;
    auto cl = [](int n) { return 1.08 + 0.1 * std::pow(0.955, n); };
    double at_estimate = 0.0, at_window = 0.0;
    const int early = stop_step(estimate, cl, 2000, at_estimate);
    const int late = stop_step(window, cl, 2000, at_window);
    ASSERT_GT(early, 0);
    ASSERT_GT(late, 0);
    // The window stops once Cl moved less than 1e-5 over 100 steps, when it is ~1e-7 from its
    // limit; the estimate once it is a tenth of the tolerance (1e-6) away: 50 steps sooner
    // (0.955^50 = 0.1, times the window's 0.955^100 = 0.01).
    EXPECT_LE(early, late - 45);
    EXPECT_LE(std::abs(at_estimate - 1.08), 0.1 * estimate.force_tolerance);
    EXPECT_GT(std::abs(at_estimate - 1.08), 0.05 * estimate.force_tolerance) << "not later";
    // e (1 / 0.955^100 - 1) = 1e-5: e = 1.0e-7.
    EXPECT_LE(std::abs(at_window - 1.08), 0.011 * window.force_tolerance);
}

TEST(ConvergenceMonitor, CaseKeysSetTheCriteria) {
    RunSpec run;
    run.residual_drop = 1e-8;
    run.force_tolerance = 2e-6;
    const ConvergenceCriteria on = convergence_criteria(run);
    EXPECT_EQ(on.residual_drop, 1e-8);
    EXPECT_EQ(on.force_tolerance, 2e-6);
    EXPECT_GT(on.tail_block, 0);
    run.settle_estimate = false;
    EXPECT_EQ(convergence_criteria(run).tail_block, 0) << "the window alone";
    // And a window-only monitor runs a geometric settling on to the window's stop.
    auto cl = [](int n) { return 1.0 + 0.1 * std::pow(0.955, n); };
    double at_on = 0.0, at_off = 0.0;
    EXPECT_LT(stop_step(on, cl, 3000, at_on),
              stop_step(convergence_criteria(run), cl, 3000, at_off));
}

TEST(ConvergenceMonitor, OscillationTheWindowKeepsRunningIsNotStoppedByTheEstimate) {
    // Cl oscillating by 1e-4 with periods of 30 to 500 steps and any phase: it moves by at least
    // 1.9e-5 over any 100 steps, so the window (1e-5) never stops it, and the estimate must not
    // either (near a crest a slow oscillation slows down, which an estimate from two blocks
    // alone took for settling at periods of 300 and 500).
    const ConvergenceCriteria c;
    int runs = 0;
    for (const double period : {30.0, 50.0, 100.0, 200.0, 300.0, 500.0})
        for (int phase = 0; phase < 20; ++phase) {
            auto cl = [&](int n) {
                return 0.5 + 1e-4 * std::sin(2.0 * pi * n / period + 0.3 * phase);
            };
            double last = 0.0;
            EXPECT_EQ(stop_step(c, cl, 3000, last), -1)
                << "period " << period << " phase " << phase;
            ++runs;
        }
    EXPECT_EQ(runs, 120);
}

}  // namespace
}  // namespace veer
