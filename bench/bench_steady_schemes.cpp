// The steady schemes side by side (solver/steady_scheme.hpp): each point run to convergence
// through the Simulation, as `veer run` runs it, each run in a process of its own (so that its
// peak memory is its own): "classic" and "fast-window" stopped by the 100-step force window
// alone (`settle_estimate = false`, the criterion before the estimate), "fast" as `veer run`
// runs it (the window or the remaining-change estimate, app/geometric_tail.hpp). Prints per
// point and run: steps, wall and processor time, Cl, Cd, memory per cell; then the ratios
// classic / fast and the Cl, Cd differences from classic (those of "fast-window" show what the
// estimate's earlier stop costs). Targets (issue 20): NACA 0012 alpha 10 in at most a quarter of
// the classic steps and 15 s on 2 cores, Cl and Cd within 0.1 %; no point slower; memory under 2 KB
// per cell. Prints figures; it is not a test. Wall times depend on what else runs on the machine:
// compare the ratios of one run, and the processor times.
//
//   bench_steady_schemes [POINT ...]      points: a0 a10 a15 (NACA 0012, Re 6e6, 384 x 128, y+ 1,
//                                         far field 100), turbine (cases/wind-turbine-section-
//                                         sa.toml), demo (cases/indoor-flyer-laminar.toml);
//                                         default: all
//   bench_steady_schemes --one SCHEME POINT RESULT_FILE   (one run; used by the above)
#include <fmt/format.h>
#include <omp.h>
#include <sys/resource.h>

#include <chrono>
#include <cmath>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <map>
#include <string>
#include <vector>

#include "app/wait_policy.hpp"
#include "bench/measured_run.hpp"

namespace {
namespace fs = std::filesystem;

const fs::path cases_dir = fs::path(VEER_SOURCE_DIR) / "cases";
const std::vector<std::string> all_points = {"a0", "a10", "a15", "turbine", "demo"};

/// "classic", "fast-window" (both stopped by the force window alone) or "fast".
veer::CaseSpec point_case(const std::string& point, const std::string& run) {
    const bool window_only = run != "fast";
    const std::string scheme = run == "classic" ? "classic" : "fast";
    const std::vector<std::string> set = {
        "run.steady_scheme=\"" + scheme + "\"",
        std::string("run.settle_estimate=") + (window_only ? "false" : "true")};
    if (point == "turbine")
        return veer::read_case_file(cases_dir / "wind-turbine-section-sa.toml", set);
    if (point == "demo") return veer::read_case_file(cases_dir / "indoor-flyer-laminar.toml", set);
    return veer::bench::naca0012_sa_case(std::atof(point.c_str() + 1), set);
}

double processor_seconds() {
    rusage u{};
    getrusage(RUSAGE_SELF, &u);
    auto s = [](timeval t) {
        return static_cast<double>(t.tv_sec) + 1e-6 * static_cast<double>(t.tv_usec);
    };
    return s(u.ru_utime) + s(u.ru_stime);
}

struct RunFigures {
    bool converged = false;
    long steps = 0;
    long fallback_step = 0;  ///< "fast" handed over to "classic" after this step (0: never)
    double wall = 0.0, processor = 0.0, cl = 0.0, cd = 0.0, kb_per_cell = 0.0;
};

/// One run in this process; writes the figures to `result_file`.
int run_one(const std::string& scheme, const std::string& point, const fs::path& result_file) {
    omp_set_num_threads(2);
    const veer::CaseSpec spec = point_case(point, scheme);
    const double cpu0 = processor_seconds();
    const veer::bench::MeasuredRun m = veer::bench::measured_run(
        spec, fs::temp_directory_path() / ("veer_bench_schemes_" + point + scheme));
    const veer::RunResult& r = m.result;
    const double kb = m.peak_growth_kb / static_cast<double>(m.cells);
    const double cpu = processor_seconds() - cpu0;
    std::ofstream(result_file) << (r.status == veer::RunStatus::converged) << " " << r.steps << " "
                               << fmt::format("{:.3f} {:.3f} {:.9f} {:.9f} {:.4f} ", r.wall_seconds,
                                              cpu, r.forces.cl.total, r.forces.cd.total, kb)
                               << r.scheme_fallback_step << "\n";
    return 0;
}

RunFigures run_child(const char* self, const std::string& scheme, const std::string& point) {
    const fs::path file = fs::temp_directory_path() / ("veer_bench_schemes_" + point + scheme);
    const std::string cmd =
        fmt::format("'{}' --one {} {} '{}.txt'", self, scheme, point, file.string());
    RunFigures f;
    if (std::system(cmd.c_str()) != 0) return f;
    std::ifstream in(file.string() + ".txt");
    in >> f.converged >> f.steps >> f.wall >> f.processor >> f.cl >> f.cd >> f.kb_per_cell >>
        f.fallback_step;
    fs::remove(file.string() + ".txt");
    return f;
}

void print_run(const std::string& scheme, const RunFigures& f) {
    fmt::print(
        "  {:11} {:>15} {:6} steps {:7.1f} s wall {:7.1f} s cpu  Cl {:.5f}  Cd {:.6f}  "
        "{:.2f} KB/cell{}\n",
        scheme, f.converged ? "converged" : "NOT converged", f.steps, f.wall, f.processor, f.cl,
        f.cd, f.kb_per_cell,
        f.fallback_step > 0 ? fmt::format("  (classic from step {})", f.fallback_step) : "");
}

}  // namespace

int main(int argc, char** argv) {
    veer::restart_with_passive_waits(argv);
    if (argc == 5 && std::string(argv[1]) == "--one") return run_one(argv[2], argv[3], argv[4]);
    std::vector<std::string> points(argv + 1, argv + argc);
    if (points.empty()) points = all_points;
    fmt::print("steady schemes, 2 threads; wall times depend on the machine's load\n");
    int status = 0;
    for (const std::string& p : points) {
        const veer::CaseSpec c = point_case(p, "fast");
        fmt::print("{} ({} {}, alpha {}, Re {:g})\n", p, c.geometry.naca, c.model.name,
                   c.flow.alpha_deg, c.flow.reynolds);
        const RunFigures classic = run_child(argv[0], "classic", p);
        print_run("classic", classic);
        const RunFigures window = run_child(argv[0], "fast-window", p);
        print_run("fast-window", window);
        const RunFigures fast = run_child(argv[0], "fast", p);
        print_run("fast", fast);
        if (!classic.converged || !fast.converged || !window.converged || fast.steps == 0) {
            status = 1;
            continue;
        }
        // Relative differences only where the coefficient is not about zero (Cl at alpha 0).
        auto percent = [](double d, double ref) {
            return std::abs(ref) > 1e-3 ? fmt::format(" ({:+.4f} %)", 100.0 * d / ref)
                                        : std::string();
        };
        fmt::print(
            "  classic / fast: steps {:.2f}x, wall {:.2f}x, cpu {:.2f}x; fast - classic: "
            "Cl {:+.2e}{}, Cd {:+.2e}{}\n",
            static_cast<double>(classic.steps) / static_cast<double>(fast.steps),
            classic.wall / fast.wall, classic.processor / fast.processor, fast.cl - classic.cl,
            percent(fast.cl - classic.cl, classic.cl), fast.cd - classic.cd,
            percent(fast.cd - classic.cd, classic.cd));
        fmt::print("  fast-window - classic: Cl {:+.2e}{}, Cd {:+.2e}{}\n", window.cl - classic.cl,
                   percent(window.cl - classic.cl, classic.cl), window.cd - classic.cd,
                   percent(window.cd - classic.cd, classic.cd));
    }
    return status;
}
