// The headline benchmark (issue 14): from the section name alone, the Spalart-Allmaras polar of
// a section at Re 6e6, 0 to 18 degrees in 2-degree steps and on until stall is bracketed (the
// sweep's stall search), with per-point error bars (--error-bars: every angle also on the two
// coarser members of the grid family) and the report page. Everything else is veer's default:
// the case-file grid (256 around, 64 normal, wake 48, far field 40) with the model's y+ 1 first
// cell. Prints the wall time (goal: under 20 minutes on 2 cores) and the processor time (on a
// shared machine the wall time also counts other jobs' load). Prints figures; it is not a test.
//
//   bench_headline_polar [SECTION [WORK_DIR]]      SECTION: a NACA designation, default 0012
// WORK_DIR: kept (default: a folder under the system temp dir, removed after).
//
// The points run without the disturbed time-accurate check (--stability-time 0), as the shipped
// turbulent sweep does: on a y+ 1 grid each check takes about 40 minutes (app/SWEEPS.md).
// Measured (NACA 0012, 2 threads, a shared machine): 309 s wall, 345 s processor, 15 points with
// Cl max 1.6137 at 17.5 +- 0.5 degrees bracketed (app/SWEEPS.md, "Error bars").
#include <fmt/format.h>
#include <omp.h>
#include <sys/resource.h>

#include <chrono>
#include <filesystem>
#include <fstream>
#include <nlohmann/json.hpp>
#include <string>

#include "app/commands.hpp"
#include "app/report_csv.hpp"
#include "app/wait_policy.hpp"
#include "io/json_writer.hpp"

namespace {
namespace fs = std::filesystem;

double processor_seconds() {
    rusage u{};
    getrusage(RUSAGE_SELF, &u);
    return static_cast<double>(u.ru_utime.tv_sec + u.ru_stime.tv_sec) +
           1e-6 * static_cast<double>(u.ru_utime.tv_usec + u.ru_stime.tv_usec);
}

std::string figure(const nlohmann::json& s, const char* key, const char* format) {
    if (!s.contains(key) || s[key].is_null()) return "null";
    if (s[key].is_string()) return s[key].get<std::string>();
    return fmt::format(fmt::runtime(format), s[key].get<double>());
}

void print_polar(const fs::path& dir) {
    const veer::CsvTable t = veer::CsvTable::read(dir / "polar.csv");
    const auto a = t.numbers("alpha"), cl = t.numbers("cl"), cd = t.numbers("cd");
    const auto cl_band = t.numbers("cl_grid_band"), cd_band = t.numbers("cd_grid_band");
    const auto cl_order = t.numbers("cl_grid_order");
    const auto verdict = t.text("cl_grid_verdict"), why = t.text("added_for");
    fmt::print("{:>6} {:>8} {:>9} {:>9} {:>10} {:>6}  {}\n", "alpha", "Cl", "+-Cl", "Cd", "+-Cd",
               "p(Cl)", "Cl verdict / why added");
    for (std::size_t k = 0; k < a.size(); ++k)
        fmt::print("{:>6.2f} {:>8.4f} {:>9.4f} {:>9.5f} {:>10.5f} {:>6.2f}  {} {}\n", a[k], cl[k],
                   cl_band[k], cd[k], cd_band[k], cl_order[k], verdict[k], why[k]);
}

}  // namespace

int main(int argc, char** argv) {
    veer::restart_with_passive_waits(argv);
    const std::string section = argc > 1 ? argv[1] : "0012";
    const bool keep = argc > 2;
    const fs::path work =
        keep ? fs::path(argv[2]) : fs::temp_directory_path() / "veer_bench_headline_polar";
    if (!keep) fs::remove_all(work);
    fs::create_directories(work);
    std::ofstream(work / "section.toml")
        << "[geometry]\nnaca = \"" << section
        << "\"\n[flow]\nreynolds = 6e6\nalpha = 0\nmodel = \"spalart-allmaras\"\n";

    omp_set_num_threads(2);
    veer::SweepOptions o;
    o.input.case_file = work / "section.toml";
    o.alpha = "0:18:2";
    o.out_dir = work / "polar";
    o.quiet = true;
    o.force = true;
    o.stability_time = 0.0;
    o.error_bars = true;
    const auto t0 = std::chrono::steady_clock::now();
    const double cpu0 = processor_seconds();
    const int status = veer::run_sweep_command(o);
    const int report = veer::run_report_command(veer::ReportOptions{o.out_dir});
    const double wall =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
    const double cpu = processor_seconds() - cpu0;

    fmt::print(
        "\nheadline polar: NACA {}, Re 6e6, Spalart-Allmaras, veer's default grid, "
        "0:18:2 and the stall search, error bars from two coarser grids, 2 threads\n",
        section);
    if (fs::exists(o.out_dir / "polar.csv")) print_polar(o.out_dir);
    if (fs::exists(o.out_dir / "summary.json")) {
        const nlohmann::json s = veer::read_json_file(o.out_dir / "summary.json");
        fmt::print("Cl max {} at {} +- {} deg (stall search: {}), lift slope {} /deg\n",
                   figure(s, "cl_max", "{:.4f}"), figure(s, "alpha_cl_max", "{:g}"),
                   figure(s, "alpha_cl_max_uncertainty", "{:g}"), figure(s, "stall_search", ""),
                   figure(s, "lift_slope_per_deg", "{:.5f}"));
    }
    fmt::print(
        "wall {:.1f} s ({:.1f} min; goal < 20 min on 2 cores), processor {:.1f} s "
        "(processor / wall {:.2f}: below 2 means other jobs shared the cores), sweep exit "
        "status {}, report exit status {}\n",
        wall, wall / 60, cpu, cpu / wall, status, report);
    if (!keep) fs::remove_all(work);
    return 0;
}
