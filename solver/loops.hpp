#pragma once
/// Loop helpers: the only place where OpenMP appears in the solver.
///
/// Where (an IndexRange), what (views captured by the kernel), how (the kernel, a pure inline
/// function of (i, j)). Every helper splits work statically by rows or lines, and sums are formed
/// per row and added serially in row order, so results do not depend on the thread count.
#include <vector>

namespace veer {

/// Loops over fewer cells than this run on one thread: below it the fork and join of the
/// threads cost more than the work (the pressure solvers' loops too, pressure_loops.hpp;
/// measured on 2 cores: NACA 0012 at 352 x 64, 2 threads were slower than 1 with every momentum
/// loop parallel).
inline constexpr int parallel_cell_threshold = 16384;

/// Half-open index range [i0, i1) x [j0, j1).
struct IndexRange {
    int i0 = 0;
    int i1 = 0;
    int j0 = 0;
    int j1 = 0;
};

/// kernel(i, j) for every cell of r (rows in parallel).
template <class Kernel>
void for_each_cell(IndexRange r, Kernel&& kernel) {
    const long cells = static_cast<long>(r.i1 - r.i0) * (r.j1 - r.j0);
#pragma omp parallel for schedule(static) if (cells >= parallel_cell_threshold)
    for (int j = r.j0; j < r.j1; ++j)
        for (int i = r.i0; i < r.i1; ++i) kernel(i, j);
}

/// kernel(k) for k in [begin, end), with stride `step` (used for red-black line relaxation);
/// `cells` is the work of the whole loop, for the serial limit.
template <class Kernel>
void for_each_line(int begin, int end, int step, long cells, Kernel&& kernel) {
    const int count = end > begin ? (end - begin + step - 1) / step : 0;
#pragma omp parallel for schedule(static) if (cells >= parallel_cell_threshold)
    for (int n = 0; n < count; ++n) kernel(begin + n * step);
}

/// Sum of kernel(i, j) over r: per-row partial sums in parallel, rows added serially in order.
template <class Kernel>
double sum_over_cells(IndexRange r, Kernel&& kernel) {
    const int rows = r.j1 - r.j0;
    if (rows <= 0) return 0.0;
    std::vector<double> partial(static_cast<std::size_t>(rows), 0.0);
    const long cells = static_cast<long>(r.i1 - r.i0) * rows;
#pragma omp parallel for schedule(static) if (cells >= parallel_cell_threshold)
    for (int j = r.j0; j < r.j1; ++j) {
        double s = 0.0;
        for (int i = r.i0; i < r.i1; ++i) s += kernel(i, j);
        partial[static_cast<std::size_t>(j - r.j0)] = s;
    }
    double total = 0.0;
    for (double s : partial) total += s;
    return total;
}

}  // namespace veer

namespace veer {

/// Minimum of kernel(i, j) over r (rows in parallel, row minima combined serially).
template <class Kernel>
double min_over_cells(IndexRange r, double start, Kernel&& kernel) {
    const int rows = r.j1 - r.j0;
    if (rows <= 0) return start;
    std::vector<double> partial(static_cast<std::size_t>(rows), start);
    const long cells = static_cast<long>(r.i1 - r.i0) * rows;
#pragma omp parallel for schedule(static) if (cells >= parallel_cell_threshold)
    for (int j = r.j0; j < r.j1; ++j) {
        double m = start;
        for (int i = r.i0; i < r.i1; ++i) {
            const double x = kernel(i, j);
            m = x < m ? x : m;
        }
        partial[static_cast<std::size_t>(j - r.j0)] = m;
    }
    double total = start;
    for (double m : partial) total = m < total ? m : total;
    return total;
}

}  // namespace veer
