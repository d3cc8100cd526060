#pragma once
/// The Spalart-Allmaras zero-pressure-gradient flat plate of the NASA Turbulence Modeling Resource
/// ("2D Zero Pressure Gradient Flat Plate": Re = 5e6 per unit length, plate from x = 0 to 2;
/// tests/reference/tmr_flat_plate_sa.csv) on a plate_grid.hpp block one unit high, run to veer
/// run's convergence criteria, its skin friction from the report's wall-face evaluation.
///
/// Differences from the resource's set-up, stated: upstream of the plate (x from -0.33 to 0) the
/// lower side carries the free stream (u = 1, v = 0, nu_tilde = 3 nu) in place of its symmetry
/// plane; inflow on the left, outflow on the right, the top a far field; incompressible (the
/// resource runs M = 0.2 and says an incompressible code lands close to, not on, its value).
#include <algorithm>
#include <cmath>
#include <iostream>
#include <optional>
#include <vector>

#include "app/convergence.hpp"
#include "mesh/grid_metrics.hpp"
#include "plate_grid.hpp"
#include "postprocess/wall_faces.hpp"
#include "solver/flow_solver.hpp"
#include "solver/sa_aft_model.hpp"
#include "solver/spalart_allmaras_model.hpp"
#include "solver/transition_correlations.hpp"

namespace veer::test {

constexpr double sa_plate_reynolds = 5e6;  ///< per unit length (tmr_flat_plate_sa.csv)

/// The plate grid family of the SA checks: `upstream` + `on_plate` cells along (clustered to the
/// leading edge), `normal` across, the first cell `first_cell` high.
inline PlateGridSpec sa_plate_spec(int upstream, int on_plate, int normal, double first_cell) {
    PlateGridSpec s;
    s.plate_length = 2.0;
    s.upstream_length = 0.33;
    s.height = 1.0;
    s.upstream = upstream;
    s.on_plate = on_plate;
    s.normal = normal;
    s.first_cell = first_cell;
    s.clustering = 4.0;
    return s;
}

struct SaPlateResult {
    bool converged = false;
    long steps = 0;
    std::vector<double> x, cf;  ///< wall-face centres along the plate and their Cf

    /// Cf at `station` by linear interpolation between the faces around it.
    double cf_at(double station) const {
        const auto it = std::upper_bound(x.begin(), x.end(), station);
        const auto k = static_cast<std::size_t>(
            std::clamp<long>(it - x.begin(), 1, static_cast<long>(x.size()) - 1));
        const double t = (station - x[k - 1]) / (x[k] - x[k - 1]);
        return (1.0 - t) * cf[k - 1] + t * cf[k];
    }
};

/// Steady run until every residual (u, v, continuity, nu_tilde) is 1e-6 of its reference (the
/// largest of the first 20 steps: veer run's own ConvergenceMonitor; the plate has no lift or
/// drag to settle, so only the residuals decide), at most `max_steps` steps.
/// `transition`: SA-AFT2017b with these [flow] options (its free stream, nu_tilde = 0.1 nu,
/// upstream of the plate too) in place of fully turbulent SA.
inline SaPlateResult run_sa_plate(const PlateGridSpec& spec, long max_steps,
                                  std::optional<ModelOptions> transition = std::nullopt) {
    const StructuredGrid grid = flat_plate_grid(spec);
    SolverSettings s;
    s.mode = TimeMode::steady;
    SpalartAllmarasSettings sa;
    const double ratio = transition ? AftConstants::free_stream_ratio : 3.0;
    sa.prescribed_value = [ratio](Vec2) { return ratio / sa_plate_reynolds; };
    s.model = transition ? sa_aft_descriptor(sa) : spalart_allmaras_descriptor(sa);
    if (transition) s.model.options = *transition;
    s.velocity_overrides.push_back(moving_wall("upstream", {1.0, 0.0}));
    const FlowConditions conditions{sa_plate_reynolds, 0.0};
    FlowSolver solver(grid, conditions, s);
    SaPlateResult out;
    ConvergenceMonitor monitor{ConvergenceCriteria{}};
    for (long n = 0; n < max_steps && !out.converged; ++n) {
        const StepReport r = solver.advance_pseudo_time();
        if (!r.finite) {
            std::cout << "non-finite " << r.worst_variable << " at (" << r.worst_i << ", "
                      << r.worst_j << "), step " << n << "\n";
            break;
        }
        out.steps = n + 1;
        out.converged = monitor.add({step_residuals(r), 0.0, 0.0});
    }
    const GridMetrics m = compute_metrics(grid);
    for (const WallFaceState& f :
         evaluate_wall_faces(grid, m, solver.fields(), conditions, WallPressure::extrapolated)) {
        out.x.push_back(f.center.x);
        out.cf.push_back(2.0 * f.shear);  // q_inf = 1/2; +i runs downstream along the plate
    }
    return out;
}

}  // namespace veer::test
