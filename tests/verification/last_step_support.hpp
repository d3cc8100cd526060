#pragma once
/// A time-accurate case run to an end time, every step's surface Cl and Cd recorded: for the
/// checks that the last step, shortened to land on the end time, does not move the forces
/// (test_last_step.cpp; tests/validation/test_last_step_naca0012.cpp).
#include <gtest/gtest.h>
#include <unistd.h>

#include <filesystem>
#include <string>
#include <vector>

#include "app/mesh_pipeline.hpp"
#include "app/run_report.hpp"
#include "app/simulation.hpp"
#include "io/case_file.hpp"

namespace veer::test {

struct Trace {
    std::vector<double> time, cl, cd;
};

struct EndedRun {
    Trace trace;
    RunAnalysis analysis;  ///< of the final fields, as summary.json reports them
};

/// Runs `case_text` (an unsteady case without end_time) to `end_time` in a scratch folder.
inline EndedRun run_to(const std::string& case_text, double end_time) {
    const std::filesystem::path dir = std::filesystem::temp_directory_path() /
                                      ("veer_last_step_" + std::to_string(::getpid()) + "_" +
                                       std::to_string(static_cast<long>(end_time * 1000)));
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    const CaseSpec spec = parse_case_text(
        case_text + "end_time = " + std::to_string(end_time) + "\ncheckpoint_every = 1000000\n",
        "last_step.toml", dir);
    EndedRun out;
    SimulationOptions o;
    o.progress = false;
    o.stop_early = [&out](const StepReport& r, double, const SurfaceForces& f) {
        out.trace.time.push_back(r.time);
        out.trace.cl.push_back(f.cl.total);
        out.trace.cd.push_back(f.cd.total);
        return false;
    };
    {
        Simulation sim(spec, build_mesh(spec).grid, dir, o);
        EXPECT_EQ(sim.run().status, RunStatus::end_time);
        out.analysis = analyse_run(sim);
    }
    std::filesystem::remove_all(dir);
    return out;
}

/// Linear interpolation of a trace at time t (t inside the trace).
inline double value_at(const std::vector<double>& time, const std::vector<double>& q, double t) {
    for (std::size_t k = 1; k < time.size(); ++k)
        if (time[k] >= t) {
            const double w = (t - time[k - 1]) / (time[k] - time[k - 1]);
            return q[k - 1] + w * (q[k] - q[k - 1]);
        }
    ADD_FAILURE() << "time " << t << " lies beyond the trace";
    return 0.0;
}

/// The case ended at `end` (last steps shortened) against the same case continued past it with
/// full steps and interpolated to `end`: the same trajectory up to the landing, then Cl, Cd and
/// the final analysis within `relative` of the full-step values. Returns the relative Cl change.
inline double compare_landing(const std::string& case_text, double end, double relative) {
    const EndedRun landed = run_to(case_text, end);
    const EndedRun onward = run_to(case_text, end + 0.5);
    const Trace &a = landed.trace, &b = onward.trace;
    EXPECT_GE(a.time.size(), 100u);
    EXPECT_DOUBLE_EQ(a.time.back(), end);
    // The same run: every step before the (at most two) shortened ones is identical.
    const std::size_t full = a.time.size() - 2;
    EXPECT_GT(b.time.size(), a.time.size());
    for (std::size_t k = 0; k < full; ++k) EXPECT_EQ(a.cl[k], b.cl[k]) << "step " << k + 1;
    const double full_step = b.time[a.time.size() - 1] - b.time[a.time.size() - 2];
    EXPECT_LT(a.time.back() - a.time[a.time.size() - 2], 0.99 * full_step);
    const double cl = value_at(b.time, b.cl, end), cd = value_at(b.time, b.cd, end);
    std::cout << "t = " << end << ": Cl shortened " << a.cl.back() << ", full steps " << cl
              << "; Cd " << a.cd.back() << ", " << cd << "\n";
    EXPECT_LT(std::abs(a.cl.back() - cl), relative * std::abs(cl));
    EXPECT_LT(std::abs(a.cd.back() - cd), relative * std::abs(cd));
    for (std::size_t k = full; k < a.time.size(); ++k)  // every step of the landing
        EXPECT_LT(std::abs(a.cl[k] - value_at(b.time, b.cl, a.time[k])), relative * std::abs(cl))
            << "t = " << a.time[k];
    EXPECT_LT(std::abs(landed.analysis.forces.cl.total - cl), relative * std::abs(cl));
    return std::abs(a.cl.back() - cl) / std::abs(cl);
}

}  // namespace veer::test
