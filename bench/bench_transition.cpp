// Transition-model cost: NACA 0012, Re 1e6, alpha 4 on the 384x128 grid of the turbulent
// benchmark (256 cells on the surface, 64 along each side of the wake cut, 128 normal, first
// cell at y+ = 1, far field 100), fully turbulent Spalart-Allmaras and SA-AFT2017b (N_crit 9)
// each run to convergence through the Simulation, one after the other in this process. Prints
// steps, wall and processor time of each and the ratios (target: SA-AFT at most twice SA in
// steps and time). Wall times on a shared machine are noisy: compare the steps and processor
// times. Not a test.
//   bench_transition [threads]
#include <fmt/format.h>
#include <omp.h>

#include <cstdlib>
#include <ctime>
#include <filesystem>

#include "app/wait_policy.hpp"
#include "bench/measured_run.hpp"

namespace {

struct Timed {
    veer::bench::MeasuredRun run;
    double processor_seconds = 0.0;
};

Timed timed(const std::vector<std::string>& overrides) {
    const std::clock_t start = std::clock();
    Timed t{
        veer::bench::measured_run(veer::bench::naca0012_sa_case(4.0, overrides),
                                  std::filesystem::temp_directory_path() / "veer_bench_transition"),
        0.0};
    t.processor_seconds = static_cast<double>(std::clock() - start) / CLOCKS_PER_SEC;
    return t;
}

void print(const char* what, const Timed& t) {
    const veer::RunResult& r = t.run.result;
    fmt::print("{}: {} ({} steps), {:.1f} s wall, {:.1f} s processor; Cl {:.5f} Cd {:.5f}\n", what,
               r.status == veer::RunStatus::converged ? "converged" : "NOT converged", r.steps,
               r.wall_seconds, t.processor_seconds, r.forces.cl.total, r.forces.cd.total);
}

}  // namespace

int main(int argc, char** argv) {
    veer::restart_with_passive_waits(argv);
    const int threads = argc > 1 ? std::atoi(argv[1]) : 2;
    omp_set_num_threads(threads);
    const Timed sa = timed({"flow.reynolds=1e6"});
    const Timed aft =
        timed({"flow.reynolds=1e6", "flow.model=sa-aft", "flow.critical_amplification=9"});
    fmt::print("NACA 0012 Re 1e6 alpha 4, 384x128, {} threads\n", threads);
    print("  fully turbulent SA", sa);
    print("  SA-AFT2017b       ", aft);
    const double steps =
        static_cast<double>(aft.run.result.steps) / static_cast<double>(sa.run.result.steps);
    fmt::print(
        "  ratio SA-AFT / SA: steps {:.2f}, processor time {:.2f}, wall time {:.2f} (target "
        "<= 2)\n",
        steps, aft.processor_seconds / sa.processor_seconds,
        aft.run.result.wall_seconds / sa.run.result.wall_seconds);
    const bool both = sa.run.result.status == veer::RunStatus::converged &&
                      aft.run.result.status == veer::RunStatus::converged;
    return both ? 0 : 1;
}
