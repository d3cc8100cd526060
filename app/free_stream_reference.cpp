#include "app/free_stream_reference.hpp"

#include <algorithm>

namespace veer {

std::vector<double> free_stream_references(const StructuredGrid& grid,
                                           const FlowConditions& conditions,
                                           const SolverSettings& settings, int steps) {
    FlowSolver fresh(grid, conditions, settings);
    std::vector<double> largest(3 + fresh.model_variables().size(), 0.0);
    for (int n = 0; n < steps; ++n) {
        const StepReport r = fresh.advance_pseudo_time();
        if (!r.finite) break;  // the references so far stand; the real run will judge itself
        const std::vector<double> now = step_residuals(r);
        for (std::size_t k = 0; k < largest.size() && k < now.size(); ++k)
            largest[k] = std::max(largest[k], now[k]);
    }
    return largest;
}

}  // namespace veer
