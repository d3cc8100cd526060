#pragma once
/// Marching a steady-mode FlowSolver to convergence in the tests.
#include <algorithm>

#include "solver/flow_solver.hpp"

namespace veer::test {

/// Pseudo-time steps until the momentum residuals fall below `tol` (or max_steps); returns the
/// last report.
inline StepReport march_to_steady(FlowSolver& solver, double tol, long max_steps) {
    StepReport r;
    for (long n = 0; n < max_steps; ++n) {
        r = solver.advance_pseudo_time();
        if (!r.finite) break;
        if (std::max(r.residual_u, r.residual_v) < tol) break;
    }
    return r;
}

}  // namespace veer::test
