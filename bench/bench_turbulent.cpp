// Spalart-Allmaras benchmark: NACA 0012, Re 6e6, alpha 10 on the 384x128 grid (256 cells on the
// surface, 64 along each side of the wake cut, 128 normal, first cell at y+ = 1, far field 100
// chords), run to a converged steady state through the Simulation, as `veer run` does.
// Prints the wall time on the requested threads (default 2; target < 3 minutes) and the memory
// per cell (peak resident set growth over the run / cells; target < 2 KB). Not a test.
//   bench_turbulent [threads] [alpha]
#include <fmt/format.h>
#include <omp.h>

#include <cstdlib>
#include <filesystem>

#include "app/wait_policy.hpp"
#include "bench/measured_run.hpp"

int main(int argc, char** argv) {
    veer::restart_with_passive_waits(argv);
    const int threads = argc > 1 ? std::atoi(argv[1]) : 2;
    const double alpha = argc > 2 ? std::atof(argv[2]) : 10.0;
    omp_set_num_threads(threads);
    const veer::bench::MeasuredRun m =
        veer::bench::measured_run(veer::bench::naca0012_sa_case(alpha),
                                  std::filesystem::temp_directory_path() / "veer_bench_turbulent");
    const veer::RunResult& r = m.result;
    const int cells = m.cells;
    const double bytes_per_cell = 1024.0 * m.peak_growth_kb / static_cast<double>(cells);
    fmt::print(
        "SA NACA 0012 Re 6e6 alpha {} on 384x128 ({} cells), {} threads: {} ({} steps), "
        "{:.1f} s wall (target < 180 s)\n",
        alpha, cells, threads,
        r.status == veer::RunStatus::converged ? "converged" : "NOT converged", r.steps,
        r.wall_seconds);
    fmt::print("  Cl {:.5f}  Cd {:.5f} (pressure {:.5f}, friction {:.5f})  Cm {:.5f}\n",
               r.forces.cl.total, r.forces.cd.total, r.forces.cd.pressure, r.forces.cd.friction,
               r.forces.cm.total);
    fmt::print("  memory: peak resident growth {:.1f} MB, {:.2f} KB per cell (target < 2 KB)\n",
               m.peak_growth_kb / 1024.0, bytes_per_cell / 1024.0);
    return r.status == veer::RunStatus::converged ? 0 : 1;
}
