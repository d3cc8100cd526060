#pragma once
/// The one place where the pressure solvers use OpenMP: a parallel loop over [0, n) with a static
/// schedule (each index's work is independent, so results do not depend on the thread count).
/// Short loops run serially: below `min_parallel` the fork costs more than the work.
namespace veer {

template <class Kernel>
void parallel_for(int n, int min_parallel, Kernel&& kernel) {
#pragma omp parallel for schedule(static) if (n >= min_parallel)
    for (int k = 0; k < n; ++k) kernel(k);
}

/// Loops over cells: parallel above this many (about where two threads start to pay off).
inline constexpr int parallel_cell_threshold = 16384;

}  // namespace veer
