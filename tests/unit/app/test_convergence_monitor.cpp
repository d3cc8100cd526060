// The steady convergence monitor: every equation's residual counts (nu_tilde too), the record
// in a checkpoint continues bit for bit, and the older record without nu_tilde still loads.
#include <gtest/gtest.h>

#include <cmath>

#include "app/convergence.hpp"

namespace veer {
namespace {

ConvergenceCriteria quick_criteria() {
    ConvergenceCriteria c;
    c.residual_drop = 1e-3;
    c.force_tolerance = 1e-6;
    c.reference_steps = 3;
    c.force_window = 5;
    return c;
}

/// Residuals 1 for the reference steps, then `flow` for u, v, continuity and `nu_tilde` for
/// the model; constant forces.
ConvergenceSample sample(long step, double flow, double nu_tilde) {
    const double f = step <= 3 ? 1.0 : flow, n = step <= 3 ? 1.0 : nu_tilde;
    return {{f, f, f, n}, 0.5, 0.01};
}

int steps_to_converge(ConvergenceMonitor& m, double flow, double nu_tilde, int cap) {
    for (int n = 1; n <= cap; ++n)
        if (m.add(sample(n, flow, nu_tilde))) return n;
    return -1;
}

TEST(ConvergenceMonitor, NuTildeResidualMustDropToo) {
    // Flow residuals 1e-4 (below the 1e-3 drop), nu_tilde's only 1e-2: not converged.
    ConvergenceMonitor stalled(quick_criteria());
    EXPECT_EQ(steps_to_converge(stalled, 1e-4, 1e-2, 50), -1);
    EXPECT_DOUBLE_EQ(stalled.relative_residual(), 1e-2);
    // Both below: converged once the force window (5 steps after the reference) is full.
    ConvergenceMonitor settled(quick_criteria());
    EXPECT_EQ(steps_to_converge(settled, 1e-4, 1e-4, 50), 6);
}

TEST(ConvergenceMonitor, LaminarRunsIgnoreTheZeroNuTildeResidual) {
    ConvergenceMonitor m(quick_criteria());
    EXPECT_EQ(steps_to_converge(m, 1e-4, 0.0, 50), 6);
}

TEST(ConvergenceMonitor, RaisedReferencesJudgeAContinuedRun) {
    // A run continued from a nearby solution: its own start residuals are 1e-2 of a fresh
    // start's, and it levels off at 1e-4 of a fresh start's.
    auto continued = [](ConvergenceMonitor& m) {
        for (int n = 1; n <= 50; ++n) {
            const double r = n <= 3 ? 1e-2 : 1e-4;
            if (m.add({{r, r, r, r}, 0.5, 0.01})) return n;
        }
        return -1;
    };
    ConvergenceMonitor own(quick_criteria());
    EXPECT_EQ(continued(own), -1);  // 1e-2 of its own start: short of the 1e-3 drop
    ConvergenceMonitor raised(quick_criteria());
    raised.raise_references({1.0, 1.0, 1.0, 1.0});
    EXPECT_EQ(continued(raised), 6);
    EXPECT_DOUBLE_EQ(raised.relative_residual(), 1e-4);
    // Raising never lowers: a reference above the floor stays.
    ConvergenceMonitor high(quick_criteria());
    high.raise_references({1e-6, 1e-6, 1e-6, 1e-6});
    EXPECT_EQ(continued(high), -1);
}

TEST(ConvergenceMonitor, SavedRecordContinuesExactly) {
    ConvergenceMonitor straight(quick_criteria()), first(quick_criteria());
    for (int n = 1; n <= 4; ++n) {
        straight.add(sample(n, 1e-2, 1e-1));
        first.add(sample(n, 1e-2, 1e-1));
    }
    ConvergenceMonitor resumed(quick_criteria());
    resumed.load(first.save());
    EXPECT_FALSE(resumed.legacy_record());
    EXPECT_EQ(resumed.save(), straight.save());
    for (int n = 5; n <= 12; ++n)
        EXPECT_EQ(straight.add(sample(n, 1e-4, 1e-2)), resumed.add(sample(n, 1e-4, 1e-2)));
    EXPECT_EQ(resumed.save(), straight.save());
    EXPECT_DOUBLE_EQ(resumed.relative_residual(), 1e-2);  // nu_tilde's reference survived
}

TEST(ConvergenceMonitor, OlderRecordWithoutNuTildeLoads) {
    // count, references of u, v, continuity, relative residual, then (Cl, Cd) pairs.
    const std::vector<double> legacy = {4.0, 1.0, 2.0, 3.0, 0.5, 0.5, 0.01, 0.5, 0.01};
    ConvergenceMonitor m(quick_criteria());
    m.load(legacy);
    EXPECT_TRUE(m.legacy_record());
    EXPECT_EQ(m.count(), 4);
    EXPECT_DOUBLE_EQ(m.relative_residual(), 0.5);
    // Its references are kept: u at 1e-3 of 1, v of 2, continuity of 3 is the largest ratio.
    m.add({{1e-3, 2e-3, 6e-3, 0.0}, 0.5, 0.01});
    EXPECT_DOUBLE_EQ(m.relative_residual(), 2e-3);
}

TEST(ConvergenceMonitor, MalformedRecordIsRejected) {
    ConvergenceMonitor m(quick_criteria());
    EXPECT_ANY_THROW(m.load({-2.0, 1.0, 1.0}));
    EXPECT_ANY_THROW(m.load({1.0, 1.0}));
}

}  // namespace
}  // namespace veer
