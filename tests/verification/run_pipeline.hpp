#pragma once
/// A steady laminar NACA 0012 case through the same chain as `veer run`: case text -> mesh
/// pipeline (app/mesh_pipeline) -> Simulation with its convergence monitor (app/convergence) ->
/// the run's post-processing (app/run_report analyse_run). Output files go to a scratch folder
/// that is removed afterwards.
#include <gtest/gtest.h>
#include <unistd.h>

#include <filesystem>
#include <string>

#include "app/mesh_pipeline.hpp"
#include "app/run_report.hpp"
#include "app/simulation.hpp"
#include "io/case_file.hpp"
#include "postprocess/free_stream.hpp"

namespace veer::test {

/// The grid of a case (the [mesh] table); far field 30 chords as in the acceptance cases.
struct CaseGrid {
    int around = 256;
    int normal = 64;
    int wake = 48;
    double first_cell = 2e-3;
};

/// The three nested grids of the lift studies: cells halved each way, first cell doubled.
inline CaseGrid grid_512() { return {512, 128, 96, 1e-3}; }
inline CaseGrid grid_256() { return {256, 64, 48, 2e-3}; }
inline CaseGrid grid_128() { return {128, 32, 24, 4e-3}; }

/// Case text for laminar NACA 0012 at Re 1000 and `alpha_deg`, steady, at most `steps` steps.
inline std::string naca0012_case_text(const CaseGrid& g, double alpha_deg, long steps = 4000) {
    return "[geometry]\nnaca = \"0012\"\n[mesh]\naround = " + std::to_string(g.around) +
           "\nnormal = " + std::to_string(g.normal) + "\nwake = " + std::to_string(g.wake) +
           "\nfar_field = 30\nfirst_cell = " + std::to_string(g.first_cell) +
           "\n[flow]\nreynolds = 1000\nalpha = " + std::to_string(alpha_deg) +
           "\nmodel = \"laminar\"\n[run]\nmode = \"steady\"\nsteps = " + std::to_string(steps) +
           "\ncheckpoint_every = 100000\n";
}

/// What a finished run leaves for the checks.
struct PipelineRun {
    RunResult result;
    RunAnalysis analysis;
    double alpha_deg = 0.0;
};

/// Runs a case to its stop criterion and post-processes it as `veer run` does.
inline PipelineRun run_pipeline(const std::string& case_text) {
    const auto* info = ::testing::UnitTest::GetInstance()->current_test_info();
    const std::filesystem::path dir =
        std::filesystem::temp_directory_path() /
        (std::string("veer_pipeline_") + (info ? info->name() : "run") + "_" +
         std::to_string(::getpid()));
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    PipelineRun out;
    {
        const CaseSpec spec = parse_case_text(case_text, "test case", dir);
        SimulationOptions quiet;
        quiet.progress = false;
        Simulation sim(spec, build_mesh(spec).grid, dir, quiet);
        out.result = sim.run();
        out.analysis = analyse_run(sim);
        out.alpha_deg = spec.flow.alpha_deg;
    }
    std::error_code ec;
    std::filesystem::remove_all(dir, ec);
    return out;
}

/// Mean over a wake profile's band of the velocity normal to the free stream, u . e_lift
/// (trapezoidal in y): negative where the flow is turned down.
inline double mean_normal_velocity(const WakeProfile& w, double alpha_deg) {
    const Vec2 e = lift_direction(alpha_deg);
    double integral = 0.0;
    for (std::size_t k = 1; k < w.samples.size(); ++k) {
        const WakeSample &a = w.samples[k - 1], &b = w.samples[k];
        integral += 0.5 * (b.y - a.y) * (a.u * e.x + a.v * e.y + b.u * e.x + b.v * e.y);
    }
    return integral / (w.samples.back().y - w.samples.front().y);
}

}  // namespace veer::test
