// Shedding benchmark: the shipped cylinder case (cases/cylinder-shedding.toml: Re 100, 192 x 144
// O-grid, CFL 4) run through the Simulation, as `veer run` runs it, until 20 whole shedding
// cycles of the lift have passed. Prints the wall time to them on the requested threads (default
// 2), the steps and time units taken, the time per step and cell, and the statistics of the last
// 5 cycles (postprocess/time_average.hpp). Cycles are counted at upward crossings of Cl = 0 (the
// mean lift of the circle) after it has fallen below -0.05, so the first cycle begins with the
// shedding that the start spin sets off. Not a test; machine load changes the times.
//   bench_cylinder [threads] [case file]
#include <fmt/format.h>
#include <omp.h>

#include <chrono>
#include <cstdlib>
#include <filesystem>
#include <string>
#include <vector>

#include "app/mesh_pipeline.hpp"
#include "app/simulation.hpp"
#include "app/wait_policy.hpp"
#include "io/case_file.hpp"
#include "postprocess/time_average.hpp"

namespace {

constexpr int cycles_wanted = 20;

struct CycleCounter {
    std::vector<double> time, cl, cd, cm, crossings;
    bool armed = false;
    double wall_at_20 = 0.0;

    /// Records a step; true once the 20th whole cycle is complete.
    bool add(double t, double l, double d, double m, double wall) {
        if (!cl.empty() && armed && cl.back() < 0.0 && l >= 0.0) {
            crossings.push_back(time.back() + (t - time.back()) * (-cl.back()) / (l - cl.back()));
            armed = false;
        }
        if (l < -0.05) armed = true;
        time.push_back(t);
        cl.push_back(l);
        cd.push_back(d);
        cm.push_back(m);
        if (static_cast<int>(crossings.size()) > cycles_wanted) {
            wall_at_20 = wall;
            return true;
        }
        return false;
    }
};

}  // namespace

int main(int argc, char** argv) {
    veer::restart_with_passive_waits(argv);
    const int threads = argc > 1 ? std::atoi(argv[1]) : 2;
    const std::filesystem::path case_file =
        argc > 2 ? std::filesystem::path(argv[2])
                 : std::filesystem::path(VEER_SOURCE_DIR) / "cases" / "cylinder-shedding.toml";
    omp_set_num_threads(threads);
    // Long enough for 20 cycles at any Strouhal number above 0.1; the counter stops the run.
    const veer::CaseSpec spec = veer::read_case_file(case_file, {"run.end_time=400"});
    const auto dir = std::filesystem::temp_directory_path() / "veer_bench_cylinder";
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);

    veer::StructuredGrid grid = veer::build_mesh(spec).grid;
    const int cells = grid.cell_count();
    CycleCounter counter;
    const auto start = std::chrono::steady_clock::now();
    veer::SimulationOptions options;
    options.progress = false;
    options.stop_early = [&](const veer::StepReport& r, double, const veer::SurfaceForces& f) {
        const double wall =
            std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
        return counter.add(r.time, f.cl.total, f.cd.total, f.cm.total, wall);
    };
    veer::Simulation sim(spec, std::move(grid), dir, options);
    const veer::RunResult r = sim.run();
    std::filesystem::remove_all(dir);
    if (counter.wall_at_20 <= 0.0) {
        fmt::print("fewer than {} cycles by t = {:.1f} ({} crossings)\n", cycles_wanted, r.time,
                   counter.crossings.size());
        return 1;
    }
    fmt::print(
        "cylinder Re {:g}, {} x {} O-grid ({} cells), {} threads: {} whole shedding cycles in "
        "{:.1f} s wall ({} steps, t = {:.2f} to {:.2f}; {:.1f} ms per step, {:.2f} us per cell "
        "and step)\n",
        spec.flow.reynolds, sim.grid().ni(), sim.grid().nj(), cells, threads, cycles_wanted,
        counter.wall_at_20, r.steps, counter.crossings.front(), counter.crossings.back(),
        1e3 * counter.wall_at_20 / static_cast<double>(r.steps),
        1e6 * counter.wall_at_20 / static_cast<double>(r.steps) / cells);
    const auto s = veer::shedding_statistics(counter.time, counter.cl, counter.cd, counter.cm, 5);
    if (s)
        fmt::print(
            "  last {} cycles: St {:.5f} ({:.1e}), mean Cd {:.5f} ({:.1e}), rms Cl {:.5f}, peak "
            "Cl {:.5f}{}\n",
            s->cycles, s->strouhal.value, s->strouhal.spread, s->cd_mean.value, s->cd_mean.spread,
            s->cl_rms.value, s->cl_peak.value, s->periodic ? "" : "; not yet periodic");
    fmt::print("  (2D, laminar; wall times depend on the machine's load)\n");
    return 0;
}
