// A turbulent angle-of-attack sweep: cases/wind-turbine-sweep-sa.toml (NACA 0012, Re 6e6,
// Spalart-Allmaras, 384 x 128 cells: 256 on the surface, 64 along each side of the wake cut, 128
// normal, first cell at y+ 1, far field 100 chords), 0 to 18 degrees in 2-degree steps, run as
// `veer sweep` runs it (each point from the previous one, the stall detector, the stability check
// of separated points) on 2 threads: wall time per point (steady attempt plus any time-accurate
// run), the 0-18 deg points' sum (target: under 4 minutes) and the total with the stall search
// beyond 18 deg (target: under 30 minutes), and the sweep's summary figures. Prints figures; it
// is not a test.
//
//   bench_sweep_turbulent [WORK_DIR [STABILITY_TIME [--each-from-free-stream] [TABLE.KEY=VALUE
//   ...]]]
// WORK_DIR: kept (default: a folder under the system temp dir, removed after); STABILITY_TIME:
// as --stability-time (default: veer sweep's); --each-from-free-stream: every point started
// from the free stream (--point-index K for each K, then --gather), not from the previous one;
// the rest: --set items applied to every point.
#include <fmt/format.h>
#include <fmt/ranges.h>
#include <omp.h>

#include <algorithm>
#include <chrono>
#include <cstdlib>
#include <filesystem>
#include <nlohmann/json.hpp>
#include <string>

#include "app/commands.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_record.hpp"
#include "app/wait_policy.hpp"
#include "bench/sweep_point_table.hpp"
#include "io/json_writer.hpp"

namespace {
namespace fs = std::filesystem;

/// The shipped case, so that the benchmark times what the case file gives users.
const fs::path sweep_case = fs::path(VEER_SOURCE_DIR) / "cases" / "wind-turbine-sweep-sa.toml";
constexpr const char* angles = "0:18:2";

std::string number_or_null(const nlohmann::json& j, const char* key, const char* format) {
    if (!j.contains(key) || j[key].is_null()) return "null";
    return fmt::format(fmt::runtime(format), j[key].get<double>());
}

}  // namespace

int main(int argc, char** argv) {
    veer::restart_with_passive_waits(argv);
    const bool keep = argc > 1;
    const fs::path work =
        keep ? fs::path(argv[1]) : fs::temp_directory_path() / "veer_bench_sweep_turbulent";
    if (!keep) fs::remove_all(work);
    fs::create_directories(work);

    omp_set_num_threads(2);
    veer::SweepOptions o;
    o.input.case_file = sweep_case;
    o.alpha = angles;
    o.out_dir = work / "sweep";
    o.quiet = true;
    o.force = true;
    if (argc > 2) o.stability_time = std::atof(argv[2]);
    bool from_free_stream = false;
    for (int k = 3; k < argc; ++k) {
        if (std::string(argv[k]) == "--each-from-free-stream")
            from_free_stream = true;
        else
            o.input.overrides.emplace_back(argv[k]);
    }
    const auto t0 = std::chrono::steady_clock::now();
    int status = 0;
    if (from_free_stream) {
        // As a job array runs it: every point from the free stream, then gathered.
        const long count = static_cast<long>(veer::parse_sweep_angles(angles).size());
        for (o.point_index = 0; o.point_index < count; ++o.point_index)
            status = std::max(status, veer::run_sweep_command(o));
        o.point_index = -1;
        o.gather = true;
        status = std::max(status, veer::run_sweep_command(o));
    } else {
        status = veer::run_sweep_command(o);
    }
    const double total =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();

    fmt::print(
        "turbulent sweep, {} (NACA 0012, Re 6e6, Spalart-Allmaras, 384 x 128), "
        "2 threads, stability check {} time units, --set [{}]{}:\n",
        sweep_case.filename().string(), o.stability_time, fmt::join(o.input.overrides, " "),
        from_free_stream ? ", each point from the free stream" : "");
    const double requested = veer::bench::print_point_table(o.out_dir, angles);
    const fs::path summary = o.out_dir / "summary.json";
    if (fs::exists(summary)) {
        const nlohmann::json s = veer::read_json_file(summary);
        fmt::print(
            "summary: lift slope {} /deg over {}, alpha zero lift {}, cl_max {} at {} deg "
            "(stall in range: {}), separation onset {} deg, cd_min {}\n",
            number_or_null(s, "lift_slope_per_deg", "{:.5f}"),
            s.contains("linear_range") ? s["linear_range"].dump() : "null",
            number_or_null(s, "alpha_zero_lift", "{:.3f}"), number_or_null(s, "cl_max", "{:.4f}"),
            number_or_null(s, "alpha_cl_max", "{:g}"),
            s.contains("stall_in_range") ? s["stall_in_range"].dump() : "null",
            number_or_null(s, "alpha_separation_onset", "{:g}"),
            number_or_null(s, "cd_min", "{:.5f}"));
    }
    // The 0-18 deg points alone (steady attempts and their stability checks) against the
    // steps target; the rest is the stall search beyond them (added points).
    fmt::print(
        "0-18 deg points: {:.1f} s ({:.1f} min; target < 4 min); stall search beyond them: "
        "{:.1f} s\n",
        requested, requested / 60, total - requested);
    fmt::print("total {:.1f} s ({:.1f} min; target < 30 min), sweep exit status {}\n", total,
               total / 60, status);
    if (!keep) fs::remove_all(work);
    return 0;
}
