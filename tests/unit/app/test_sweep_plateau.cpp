// The stall detector of a sweep's steady attempts, on synthetic residual and lift histories
// whose rates are known, and end to end: a steady point whose iteration is judged stalled goes
// time-accurate at that step, not at its step cap.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

#include "app/mesh_pipeline.hpp"
#include "app/report_csv.hpp"
#include "app/residual_plateau.hpp"
#include "app/simulation.hpp"
#include "app/sweep_point.hpp"
#include "app_test_support.hpp"
#include "io/case_file.hpp"
#include "stalling_sweep.hpp"

namespace veer {
namespace {

constexpr double two_pi = 2 * std::numbers::pi;

/// Feeds `steps` samples; returns the first step (1-based) at which the detector says stalled,
/// or 0 when it never does.
template <class Residual, class Lift>
long first_stall(ResidualPlateau& d, long steps, Residual residual, Lift lift) {
    for (long n = 1; n <= steps; ++n)
        if (d.add(residual(n), lift(n))) return n;
    return 0;
}

TEST(ResidualPlateau, LimitCycleIsFoundWhenTheWindowFirstFills) {
    // The residual of a shedding flow under pseudo-time: it oscillates about 1e-3 and never
    // falls; Cl swings by +-0.01 with a period of 400 steps.
    ResidualPlateau d({3000, 10.0, 1e-5, 100});
    const long at = first_stall(
        d, 10000, [](long n) { return 1e-3 * (1.5 + std::sin(two_pi * double(n) / 400.0)); },
        [](long n) { return 0.45 + 0.01 * std::sin(two_pi * double(n) / 400.0); });
    EXPECT_EQ(at, 3000);  // the first evaluation with a full window
    EXPECT_LT(d.window_drop(), 1.5);
    EXPECT_NEAR(d.lift_range(), 0.02, 1e-6);  // the second half holds whole periods
}

TEST(ResidualPlateau, SteadyConvergenceIsNeverStalled) {
    // Falling tenfold every 1000 steps (three times the required rate), with a decaying lift
    // oscillation on top: the iteration is converging, whatever the lift does meanwhile.
    ResidualPlateau d({3000, 10.0, 1e-5, 100});
    const long at = first_stall(
        d, 12000, [](long n) { return std::pow(10.0, -double(n) / 1000.0); },
        [](long n) {
            return 0.3 + 0.05 * std::exp(-double(n) / 800.0) * std::sin(two_pi * double(n) / 300.0);
        });
    EXPECT_EQ(at, 0);
    // Over 3000 steps, the first tenth's minimum over the last tenth's: 10^(2700/1000).
    EXPECT_NEAR(std::log10(d.window_drop()), 2.7, 0.01);
}

TEST(ResidualPlateau, ThresholdOnTheRateOfFall) {
    // A residual falling by a factor q per window: the minima of the first and last tenths are
    // 0.9 windows apart, so the measured drop is q^0.9. Just above and just below 10.
    auto run = [](double q) {
        ResidualPlateau d({2000, 10.0, 1e-5, 100});
        return first_stall(
            d, 8000, [q](long n) { return std::pow(q, -double(n) / 2000.0); },
            [](long n) { return 0.2 + 1e-3 * std::sin(two_pi * double(n) / 250.0); });
    };
    EXPECT_EQ(run(std::pow(10.0, 1.0 / 0.9) * 1.05), 0);     // 5 % faster than required
    EXPECT_EQ(run(std::pow(10.0, 1.0 / 0.9) * 0.95), 2000);  // 5 % slower: stalled at once
}

TEST(ResidualPlateau, ResidualFloorWithStillLiftIsNotAStall) {
    // A converged flow whose residual sits on a round-off floor above the requested drop: the
    // lift does not move, so it is not shedding (the step cap, not the sweep, ends it).
    ResidualPlateau d({1000, 10.0, 1e-5, 50});
    const long at = first_stall(
        d, 5000, [](long n) { return 2e-6 * (1.0 + 0.3 * std::sin(double(n))); },
        [](long n) { return 0.25 + 1e-7 * std::sin(double(n)); });
    EXPECT_EQ(at, 0);
}

TEST(ResidualPlateau, FrozenCycleFarAboveAnyFloorIsAStall) {
    // The frozen two-step cycle measured on a 128 x 32 SA grid (residual_plateau.hpp): the
    // relative residual alternates about 0.13 and never falls, Cl alternates by 1e-8.
    ResidualPlateau d({3000, 10.0, 1e-5, 100});
    const long at = first_stall(
        d, 6000, [](long n) { return 0.13 * (1.0 + 0.01 * double(n % 2)); },
        [](long n) { return 0.22132 + 1e-8 * double(n % 2); });
    EXPECT_EQ(at, 3000);
    EXPECT_TRUE(d.frozen());
    // The same flat residual at 1e-4 (below the frozen level, above a converged floor) with a
    // still lift is left to the step cap, as a floor is.
    ResidualPlateau floor({3000, 10.0, 1e-5, 100});
    EXPECT_EQ(first_stall(
                  floor, 6000, [](long n) { return 1e-4 * (1.0 + 0.01 * double(n % 2)); },
                  [](long n) { return 0.22132 + 1e-8 * double(n % 2); }),
              0);
    EXPECT_FALSE(floor.frozen());
}

TEST(ResidualPlateau, ConvergenceThatStallsIsFoundOnceTheStallFillsTheWindow) {
    // Falling tenfold every 200 steps until step 1500, flat afterwards with the lift swinging.
    // A 1000-step window ending at step N has its first-tenth minimum at N - 900 and its
    // last-tenth minimum on the flat part: the drop is 10^((1500 - (N - 900)) / 200), below 10
    // once N > 2200, so the stall is seen at the evaluation at 2300 (2200 sits on the threshold,
    // where rounding decides).
    ResidualPlateau d({1000, 10.0, 1e-5, 100});
    const long at = first_stall(
        d, 6000, [](long n) { return std::pow(10.0, -std::min(double(n), 1500.0) / 200.0); },
        [](long n) { return 0.4 + (n > 1500 ? 0.02 * std::sin(two_pi * double(n) / 300.0) : 0); });
    EXPECT_GE(at, 2200);
    EXPECT_LE(at, 2300);
}

TEST(ResidualPlateau, BadCriteriaAreRefused) {
    EXPECT_THROW(ResidualPlateau({10, 10.0, 1e-5, 100}), std::exception);
    EXPECT_THROW(ResidualPlateau({1000, 1.0, 1e-5, 100}), std::exception);
    EXPECT_THROW(ResidualPlateau({1000, 10.0, 1e-5, 100, 0.0}), std::exception);
}

TEST(SweepPlateau, StalledSteadyPointGoesTimeAccurateAtTheStall) {
    // A tiny grid and criteria no iteration can meet (a residual drop of 1e30 over 20 steps):
    // the steady attempt must end at step 20, far before its cap of 500, and the point continue
    // time-accurately.
    test::AppScratch tmp;
    SweepCase sweep = test::stalling_tiny_sweep(tmp);
    const CaseSpec spec = point_case(sweep, 4.0);
    const StructuredGrid grid = build_mesh(spec).grid;
    const PointOutcome out = run_sweep_point(sweep, 4.0, spec, grid, tmp / "sw", nullptr, "");
    ASSERT_TRUE(out.record);
    const PointRecord& r = *out.record;
    EXPECT_NE(r.note.find("stalled"), std::string::npos) << r.note;
    EXPECT_EQ(r.final_run, "unsteady");
    EXPECT_EQ(r.status, "end time");  // 0.05 time units: far too short to count as settled
    const CsvTable steady = CsvTable::read(tmp / "sw" / r.folder / "history.csv");
    EXPECT_EQ(steady.rows(), 20u);
    EXPECT_TRUE(std::filesystem::exists(tmp / "sw" / r.folder / "unsteady" / "history.csv"));
}

TEST(SweepPlateau, SimulationStopsWhereItsStopRequestSaysSo) {
    test::AppScratch tmp;
    const CaseSpec spec = parse_case_text(test::tiny_case_text(), "c.toml", ".");
    SimulationOptions o;
    o.progress = false;
    long calls = 0;
    o.stop_early = [&calls](const StepReport& step, double relative_residual,
                            const SurfaceForces&) {
        ++calls;
        EXPECT_EQ(step.step, calls);
        EXPECT_GT(relative_residual, 0.0);
        return calls == 3;
    };
    Simulation sim(spec, build_mesh(spec).grid, tmp.path(), o);
    const RunResult r = sim.run();
    EXPECT_EQ(r.steps, 3);  // the case's cap is 5
    EXPECT_EQ(r.status, RunStatus::step_cap);
}

}  // namespace
}  // namespace veer
