#include "app/free_stream_reference.hpp"

#include <algorithm>

namespace veer {

std::array<double, ConvergenceMonitor::residual_count> free_stream_references(
    const StructuredGrid& grid, const FlowConditions& conditions, const SolverSettings& settings,
    int steps) {
    FlowSolver fresh(grid, conditions, settings);
    std::array<double, ConvergenceMonitor::residual_count> largest{};
    for (int n = 0; n < steps; ++n) {
        const StepReport r = fresh.advance_pseudo_time();
        if (!r.finite) break;  // the references so far stand; the real run will judge itself
        const double now[] = {r.residual_u, r.residual_v, r.residual_continuity,
                              r.residual_nu_tilde};
        for (std::size_t k = 0; k < largest.size(); ++k) largest[k] = std::max(largest[k], now[k]);
    }
    return largest;
}

}  // namespace veer
