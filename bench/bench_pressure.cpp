// Pressure-solver benchmark: the multigrid (MG-PCG) against the Eigen references on the same
// matrix and right-hand side, on C-grids around a 12%-thick symmetric section (a survey drone's
// wing section at cruise), sizes around x normal from 128 x 32 to 1024 x 256. Prints figures;
// asserts nothing (performance figures come only from bench/).
//
//   bench_pressure [--max-around N] [--eigen-max-around N] [--bicgstab] [--repeats R]
//                  [--cycle-index 1|2] [--smoothing-steps S] [--no-along-c-lines]
#include <omp.h>
#include <time.h>

#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <functional>
#include <memory>
#include <string>
#include <vector>

#include "app/wait_policy.hpp"
#include "mesh/cgrid.hpp"
#include "mesh/grid_metrics.hpp"
#include "mesh/naca.hpp"
#include "mesh/section_builder.hpp"
#include "mesh/surface_sampling.hpp"
#include "solver/multigrid_solver.hpp"
#include "solver/poisson_assembly.hpp"
#include "solver/pressure_operator.hpp"
#include "solver/pressure_solver.hpp"

namespace {

using namespace veer;

struct Options {
    int max_around = 1024;
    int eigen_max_around = 1024;
    bool bicgstab = false;
    int repeats = 3;
    MultigridOptions multigrid;
};

Options parse(int argc, char** argv) {
    Options o;
    for (int k = 1; k < argc; ++k) {
        auto value = [&] { return k + 1 < argc ? std::atoi(argv[++k]) : 0; };
        if (!std::strcmp(argv[k], "--max-around"))
            o.max_around = value();
        else if (!std::strcmp(argv[k], "--eigen-max-around"))
            o.eigen_max_around = value();
        else if (!std::strcmp(argv[k], "--bicgstab"))
            o.bicgstab = true;
        else if (!std::strcmp(argv[k], "--repeats"))
            o.repeats = std::max(1, value());
    }
    return o;
}

struct Problem {
    PoissonStencil stencil;
    std::vector<double> rhs;
    std::vector<double> field;  // the smooth field whose discrete Laplacian is rhs
};

/// Dirichlet (zero increment) where the flow leaves: both outlets and the far field downstream of
/// the trailing edge; Neumann on the wall and the upstream far field.
Problem make_problem(int around) {
    CGridSpec spec;
    spec.around = around;
    spec.normal = around / 4;
    spec.wake = 3 * around / 16;
    spec.far_field = 30.0;
    spec.first_cell = 1e-3;
    const Section section =
        make_section(naca_outline("0012", TrailingEdge::closed), "drone wing section");
    const StructuredGrid grid = generate_cgrid(sample_surface(section, around), spec);
    const GridMetrics m = compute_metrics(grid);
    const int ni = grid.ni(), nj = grid.nj();
    std::vector<std::uint8_t> di(static_cast<std::size_t>((ni + 1) * nj), 0);
    std::vector<std::uint8_t> dj(static_cast<std::size_t>(ni * (nj + 1)), 0);
    for (int j = 0; j < nj; ++j) di[m.face_i(0, j)] = di[m.face_i(ni, j)] = 1;
    for (int i = 0; i < ni; ++i) dj[m.face_j(i, nj)] = m.face_center_j[m.face_j(i, nj)].x > 1.0;
    Problem pb{assemble_laplacian(grid, m, di, dj), {}, {}};
    pb.field.resize(m.centroid.size());
    for (std::size_t k = 0; k < pb.field.size(); ++k) {
        const Vec2 c = m.centroid[k];
        pb.field[k] = std::exp(-0.05 * dot(c, c)) * std::cos(1.3 * c.x - 0.4 * c.y);
    }
    apply_operator(make_pressure_operator(pb.stencil), pb.field, pb.rhs);
    for (double& v : pb.rhs) v = -v;
    return pb;
}

struct Timing {
    double setup_s = 1e300, solve_s = 1e300;          // wall clock
    double setup_cpu_s = 1e300, solve_cpu_s = 1e300;  // process CPU time (all threads)
    PressureSolveStats stats;
    std::vector<double> p;
};

/// Wall-clock and process CPU seconds. On a shared, loaded machine the CPU time of a
/// single-threaded run is the better measure of the work done (the wall clock includes waiting).
struct Clock {
    std::chrono::steady_clock::time_point wall = std::chrono::steady_clock::now();
    double cpu = cpu_now();
    static double cpu_now() {
        timespec ts{};
        clock_gettime(CLOCK_PROCESS_CPUTIME_ID, &ts);
        return static_cast<double>(ts.tv_sec) + 1e-9 * static_cast<double>(ts.tv_nsec);
    }
    double wall_s() const {
        return std::chrono::duration<double>(std::chrono::steady_clock::now() - wall).count();
    }
    double cpu_s() const { return cpu_now() - cpu; }
};

/// Best of `repeats` setups and solves from a zero guess to 1e-8.
Timing time_solver(PressureSolver& solver, const Problem& pb, int repeats) {
    Timing t;
    for (int r = 0; r < repeats; ++r) {
        const Clock setup_clock;
        solver.setup(pb.stencil);
        t.setup_s = std::min(t.setup_s, setup_clock.wall_s());
        t.setup_cpu_s = std::min(t.setup_cpu_s, setup_clock.cpu_s());
        std::vector<double> p(pb.rhs.size(), 0.0);
        const Clock solve_clock;
        t.stats = solver.solve(pb.rhs, p, 1e-8, 20000);
        t.solve_s = std::min(t.solve_s, solve_clock.wall_s());
        t.solve_cpu_s = std::min(t.solve_cpu_s, solve_clock.cpu_s());
        t.p = std::move(p);
    }
    return t;
}

double max_difference(const std::vector<double>& a, const std::vector<double>& b) {
    double d = 0.0;
    for (std::size_t k = 0; k < a.size(); ++k) d = std::max(d, std::abs(a[k] - b[k]));
    return d;
}

void print_row(const char* name, const Timing& t, double cells) {
    std::printf(
        "  %-24s setup %8.4f s (cpu %8.4f)  solve %9.4f s (cpu %9.4f)  %5d it  "
        "%7.1f ns/cell (cpu %7.1f)  res %.1e\n",
        name, t.setup_s, t.setup_cpu_s, t.solve_s, t.solve_cpu_s, t.stats.iterations,
        1e9 * t.solve_s / cells, 1e9 * t.solve_cpu_s / cells, t.stats.final_residual);
}

void print_ratio(const Timing& ref, const Timing& mg) {
    std::printf(
        "  %-24s solve %.1fx (cpu %.1fx), setup + solve %.1fx (cpu %.1fx); "
        "max |p_mg - p_ref| %.1e\n",
        "  ref / multigrid", ref.solve_s / mg.solve_s, ref.solve_cpu_s / mg.solve_cpu_s,
        (ref.setup_s + ref.solve_s) / (mg.setup_s + mg.solve_s),
        (ref.setup_cpu_s + ref.solve_cpu_s) / (mg.setup_cpu_s + mg.solve_cpu_s),
        max_difference(mg.p, ref.p));
}

}  // namespace

int main(int argc, char** argv) {
    veer::restart_with_passive_waits(argv);
    const Options o = parse(argc, argv);
    std::setvbuf(stdout, nullptr, _IOLBF, 0);  // line by line, also into a file
    std::printf("pressure solve to relative residual 1e-8, %d OpenMP threads, best of %d\n",
                omp_get_max_threads(), o.repeats);
    std::printf("C-grid: wake 3 around / 16 each side, far field 30 chords, first cell 1e-3\n\n");
    std::vector<double> mg_ns_per_cell;
    for (int around = 128; around <= o.max_around; around *= 2) {
        const Problem pb = make_problem(around);
        const double cells = static_cast<double>(pb.rhs.size());
        MultigridSolver mg(o.multigrid);
        const Timing t_mg = time_solver(mg, pb, o.repeats);
        std::printf("%d x %d (ni %d, nj %d, %.0f cells, %d levels)\n", around, around / 4,
                    pb.stencil.ni, pb.stencil.nj, cells, mg.level_count());
        print_row("multigrid (MG-PCG)", t_mg, cells);
        mg_ns_per_cell.push_back(1e9 * t_mg.solve_cpu_s / cells);
        if (around > o.eigen_max_around) continue;
        std::vector<std::pair<PressureSolverKind, const char*>> refs = {
            {PressureSolverKind::eigen_cg, "Eigen CG + IC"}};
        if (o.bicgstab)
            refs.emplace_back(PressureSolverKind::eigen_bicgstab, "Eigen BiCGSTAB + ILUT");
        for (const auto& [kind, label] : refs) {
            auto ref = make_pressure_solver(kind);
            const Timing t_ref = time_solver(*ref, pb, 1);
            print_row(label, t_ref, cells);
            print_ratio(t_ref, t_mg);
        }
    }
    if (!mg_ns_per_cell.empty()) {
        const auto [lo, hi] = std::minmax_element(mg_ns_per_cell.begin(), mg_ns_per_cell.end());
        std::printf("\nmultigrid solve CPU time per cell: %.1f to %.1f ns (spread %.2fx)\n", *lo,
                    *hi, *hi / *lo);
    }
    return 0;
}
