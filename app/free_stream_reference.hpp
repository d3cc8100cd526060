#pragma once
/// The residuals a steady run would start with from the free stream, for runs that start from
/// another solution instead (ConvergenceMonitor::raise_references).
#include <vector>

#include "app/convergence.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/flow_solver.hpp"

namespace veer {

/// The largest residual of each equation (step_residuals() order: u, v, continuity, the model's
/// variables) over the first `steps` pseudo-time steps of a fresh solver of these conditions on
/// this grid, which is then thrown away: the references a single run of the case takes.
std::vector<double> free_stream_references(const StructuredGrid& grid,
                                           const FlowConditions& conditions,
                                           const SolverSettings& settings, int steps);

}  // namespace veer
