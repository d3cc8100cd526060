#pragma once
/// The one place where the pressure solvers use OpenMP: a parallel loop over [0, n) with a static
/// schedule (each index's work is independent, so results do not depend on the thread count).
/// Short loops run serially: below `min_parallel` the fork costs more than the work.
#include <algorithm>
#include <cstddef>
#include <vector>

#include "solver/loops.hpp"

namespace veer {

template <class Kernel>
void parallel_for(int n, int min_parallel, Kernel&& kernel) {
#pragma omp parallel for schedule(static) if (n >= min_parallel)
    for (int k = 0; k < n; ++k) kernel(k);
}

/// Sum of term(k) over [0, n): fixed blocks of 2048 summed in parallel, block sums added in block
/// order, so the result is bitwise the same for any thread count. term may also update arrays at
/// index k (fused vector updates).
template <class Term>
double ordered_block_sum(std::size_t n, Term&& term) {
    constexpr std::size_t block = 2048;
    const std::size_t blocks = (n + block - 1) / block;
    std::vector<double> partial(blocks, 0.0);
    const int min_parallel_blocks = parallel_cell_threshold / static_cast<int>(block);
    parallel_for(static_cast<int>(blocks), min_parallel_blocks, [&](int b) {
        const std::size_t k0 = static_cast<std::size_t>(b) * block;
        const std::size_t k1 = std::min(n, k0 + block);
        double s = 0.0;
        for (std::size_t k = k0; k < k1; ++k) s += term(k);
        partial[static_cast<std::size_t>(b)] = s;
    });
    double total = 0.0;
    for (double s : partial) total += s;
    return total;
}

}  // namespace veer
