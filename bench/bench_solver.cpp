// Whole-solver figures on the default grid (256x64, wake 48 each side, far field 30 chords):
// time steps per second and cell-steps per second at 1 and 2 threads (time-accurate and steady
// pseudo-time steps), the speed-up measured in the same run, and a larger grid for comparison.
// Prints figures; it is not a test.
#include <fmt/format.h>
#include <omp.h>

#include <chrono>
#include <filesystem>

#include "app/mesh_pipeline.hpp"
#include "app/simulation.hpp"
#include "app/wait_policy.hpp"
#include "io/case_file.hpp"
#include "solver/flow_solver.hpp"

namespace {

veer::CaseSpec grid_case(int around, int normal, double first_cell) {
    return veer::parse_case_text(
        fmt::format("[geometry]\nnaca = \"0012\"\n[mesh]\naround = {}\nnormal = {}\nwake = {}\n"
                    "far_field = 30\nfirst_cell = {}\n[flow]\nreynolds = 1000\nalpha = 4\n",
                    around, normal, 3 * around / 16, first_cell),
        "bench", ".");
}

/// Seconds per step of `steps` steps after `warm` unmeasured ones.
double seconds_per_step(const veer::StructuredGrid& grid, veer::TimeMode mode, int threads,
                        int warm, int steps) {
    omp_set_num_threads(threads);
    veer::SolverSettings settings;
    settings.mode = mode;
    veer::FlowSolver solver(grid, {1000.0, 4.0}, settings);
    auto step = [&] {
        if (mode == veer::TimeMode::steady)
            solver.advance_pseudo_time();
        else
            solver.advance(solver.time_step_for_cfl(0.8));
    };
    for (int k = 0; k < warm; ++k) step();
    const auto t0 = std::chrono::steady_clock::now();
    for (int k = 0; k < steps; ++k) step();
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count() / steps;
}

void report(const char* label, const veer::StructuredGrid& grid, veer::TimeMode mode) {
    const double cells = grid.cell_count();
    const double one = seconds_per_step(grid, mode, 1, 5, 30);
    const double two = seconds_per_step(grid, mode, 2, 5, 30);
    fmt::print(
        "{:<34} {:>8} cells | 1 thread {:7.2f} steps/s {:9.3g} cell-steps/s | 2 threads "
        "{:7.2f} steps/s {:9.3g} cell-steps/s | speed-up {:.2f}x\n",
        label, grid.cell_count(), 1 / one, cells / one, 1 / two, cells / two, one / two);
}

/// Wall time of the steady laminar acceptance case run to convergence through the Simulation.
void steady_to_convergence() {
    omp_set_num_threads(2);
    const veer::CaseSpec spec = grid_case(256, 64, 2e-3);
    const auto dir = std::filesystem::temp_directory_path() / "veer_bench_steady";
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    veer::SimulationOptions quiet;
    quiet.progress = false;
    veer::Simulation sim(spec, veer::build_mesh(spec).grid, dir, quiet);
    const veer::RunResult r = sim.run();
    fmt::print(
        "steady 256x64 to convergence, 2 threads: {} iterations, {:.1f} s wall ({}; "
        "target < 60 s), Cl {:.5f}, Cd {:.5f}\n",
        r.steps, r.wall_seconds,
        r.status == veer::RunStatus::converged ? "converged" : "NOT converged", r.forces.cl.total,
        r.forces.cd.total);
    std::filesystem::remove_all(dir);
}

}  // namespace

int main(int, char** argv) {
    veer::restart_with_passive_waits(argv);
    const veer::StructuredGrid small = veer::build_mesh(grid_case(256, 64, 2e-3)).grid;
    const veer::StructuredGrid large = veer::build_mesh(grid_case(512, 128, 1e-3)).grid;
    fmt::print(
        "veer solver benchmark (NACA 0012, Re 1000, alpha 4; target: 2 threads >= 1.6x "
        "one thread on grids that fit in cache)\n");
    report("256x64 time-accurate (BDF2)", small, veer::TimeMode::time_accurate);
    report("256x64 steady pseudo-time", small, veer::TimeMode::steady);
    report("512x128 time-accurate (BDF2)", large, veer::TimeMode::time_accurate);
    report("512x128 steady pseudo-time", large, veer::TimeMode::steady);
    steady_to_convergence();
    return 0;
}
