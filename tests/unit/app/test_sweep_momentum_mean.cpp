// The time mean of the control-volume lift of a time-accurate sweep point: the mean over a
// window of samples of known signals, and samples that are the control-volume lift the run
// report gives.
#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

#include "app/mesh_pipeline.hpp"
#include "app/run_report.hpp"
#include "app/sweep_momentum_mean.hpp"
#include "app_test_support.hpp"
#include "io/case_file.hpp"
#include "io/json_writer.hpp"

namespace veer {
namespace {

StructuredGrid tiny_grid() {
    return build_mesh(parse_case_text(test::tiny_case_text(), "c.toml", ".")).grid;
}

TEST(MomentumLiftSampler, MeanOfALineOverAPartialWindowIsExact) {
    // Linear interpolation of a linear signal is exact, window ends between samples included.
    MomentumLiftSampler s(tiny_grid(), {1.0});
    for (int k = 0; k <= 10; ++k) s.add(k, 2.0 * k);
    ASSERT_TRUE(s.mean(2.5, 7.25));
    EXPECT_NEAR(*s.mean(2.5, 7.25), 2.0 * (2.5 + 7.25) / 2, 1e-12);
    EXPECT_FALSE(s.mean(20.0, 30.0));  // no samples there
}

TEST(MomentumLiftSampler, MeanOverWholeCyclesIsTheSignalMean) {
    // 0.3 + 0.05 sin(2 pi t / 1.25) over 4 whole periods at 50 samples per period: the
    // trapezoidal rule is exact for a sampled sinusoid over whole periods (to round-off).
    MomentumLiftSampler s(tiny_grid(), {1.0});
    for (int k = 0; k <= 400; ++k) {
        const double t = 0.025 * k;
        s.add(t, 0.3 + 0.05 * std::sin(2 * std::numbers::pi * t / 1.25));
    }
    EXPECT_NEAR(*s.mean(2.5, 7.5), 0.3, 1e-12);
}

TEST(MomentumLiftSampler, SamplesAreTheRunReportsControlVolumeLift) {
    test::AppScratch tmp;
    const CaseSpec spec = parse_case_text(test::tiny_case_text(), "c.toml", ".");
    const StructuredGrid grid = build_mesh(spec).grid;
    MomentumLiftSampler sampler(grid, spec.post.contours, 1);
    SimulationOptions o;
    o.progress = false;
    Simulation* sim_ptr = nullptr;
    o.stop_early = [&](const StepReport& step, double, const SurfaceForces&) {
        sampler.after_step(*sim_ptr, step.step, step.time);
        return false;
    };
    Simulation sim(spec, grid, tmp.path(), o);
    sim_ptr = &sim;
    const RunResult r = sim.run();
    write_run_report(sim, r);
    ASSERT_EQ(sampler.lifts().size(), static_cast<std::size_t>(r.steps));
    // The report's control-volume lift on the largest default contour (4 chords), last step.
    const nlohmann::json s = read_json_file(tmp / "summary.json");
    EXPECT_DOUBLE_EQ(sampler.lifts().back(), s["cl_momentum"]["4"].get<double>());
}

}  // namespace
}  // namespace veer
