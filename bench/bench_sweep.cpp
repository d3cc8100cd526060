// A laminar angle-of-attack sweep, 0 to 20 degrees in 2-degree steps at Re 1000, on the default
// grid (the case-file defaults of io/case_spec.hpp and mesh/cgrid_spec.hpp: 256 cells around,
// 64 out, 48 along each side of the wake cut, far field 40 chords), run as `veer sweep` runs it,
// on 2 threads: wall time per point (steady attempt plus any time-accurate run) and in total.
// Target: under 10 minutes in all. Prints figures; it is not a test.
//
//   bench_sweep [WORK_DIR]     (default: a folder under the system temp dir, removed after)
#include <fmt/format.h>
#include <omp.h>

#include <chrono>
#include <cstdlib>
#include <filesystem>
#include <fstream>

#include "app/commands.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_record.hpp"
#include "app/wait_policy.hpp"
#include "bench/sweep_point_table.hpp"
#include "io/json_writer.hpp"

namespace {
namespace fs = std::filesystem;

/// Only what the benchmark fixes; everything else is the case-file default.
constexpr const char* default_grid_case =
    "[geometry]\nnaca = \"0012\"\n[flow]\nreynolds = 1000\nmodel = \"laminar\"\n"
    "[run]\nmode = \"steady\"\n";

}  // namespace

int main(int argc, char** argv) {
    veer::restart_with_passive_waits(argv);
    const bool keep = argc > 1;
    const fs::path work = keep ? fs::path(argv[1]) : fs::temp_directory_path() / "veer_bench_sweep";
    if (!keep) fs::remove_all(work);
    fs::create_directories(work);
    std::ofstream(work / "case.toml") << default_grid_case;

    omp_set_num_threads(2);
    veer::SweepOptions o;
    o.input.case_file = work / "case.toml";
    o.alpha = "0:20:2";
    o.out_dir = work / "sweep";
    o.quiet = true;
    o.force = true;
    const auto t0 = std::chrono::steady_clock::now();
    const int status = veer::run_sweep_command(o);
    const double total =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();

    fmt::print("laminar sweep, NACA 0012, Re 1000, default grid, 2 threads:\n");
    veer::bench::print_point_table(o.out_dir, "0:20:2");
    fmt::print("total {:.1f} s ({:.1f} min; target < 10 min), sweep exit status {}\n", total,
               total / 60, status);
    if (!keep) fs::remove_all(work);
    return 0;
}
