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
#include <fstream>
#include <string>

#include "app/mesh_pipeline.hpp"
#include "app/simulation.hpp"
#include "app/wait_policy.hpp"
#include "io/case_file.hpp"

namespace {

/// A field of /proc/self/status in kB ("VmRSS", "VmHWM"), or -1.
long status_kb(const std::string& key) {
    std::ifstream in("/proc/self/status");
    for (std::string line; std::getline(in, line);)
        if (line.rfind(key + ":", 0) == 0) return std::atol(line.c_str() + key.size() + 1);
    return -1;
}

veer::CaseSpec benchmark_case(double alpha) {
    return veer::parse_case_text(
        fmt::format("[geometry]\nnaca = \"0012\"\n[mesh]\naround = 256\nnormal = 128\nwake = 64\n"
                    "far_field = 100\ny_plus = 1.0\n[flow]\nreynolds = 6e6\nalpha = {}\n"
                    "model = \"spalart-allmaras\"\n[run]\nmode = \"steady\"\n",
                    alpha),
        "bench_turbulent", ".");
}

}  // namespace

int main(int argc, char** argv) {
    veer::restart_with_passive_waits(argv);
    const int threads = argc > 1 ? std::atoi(argv[1]) : 2;
    const double alpha = argc > 2 ? std::atof(argv[2]) : 10.0;
    omp_set_num_threads(threads);
    const veer::CaseSpec spec = benchmark_case(alpha);
    const auto dir = std::filesystem::temp_directory_path() / "veer_bench_turbulent";
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);

    const long rss_before_kb = status_kb("VmRSS");
    veer::StructuredGrid grid = veer::build_mesh(spec).grid;
    const int cells = grid.cell_count();
    veer::SimulationOptions quiet;
    quiet.progress = false;
    veer::Simulation sim(spec, std::move(grid), dir, quiet);
    const veer::RunResult r = sim.run();
    const long peak_kb = status_kb("VmHWM");

    const double bytes_per_cell =
        1024.0 * static_cast<double>(peak_kb - rss_before_kb) / static_cast<double>(cells);
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
               static_cast<double>(peak_kb - rss_before_kb) / 1024.0, bytes_per_cell / 1024.0);
    std::filesystem::remove_all(dir);
    return r.status == veer::RunStatus::converged ? 0 : 1;
}
