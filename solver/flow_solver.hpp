#pragma once
/// The laminar incompressible flow solver of veer: cell-centred collocated finite volumes on a
/// structured block (C-grid with wake cut, or a general block for verification), an incremental
/// pressure-correction (projection) method with Rhie-Chow face fluxes, BDF2 in time (steady
/// mode: BDF1 pseudo-time with local steps). A Model that steps: it knows neither files nor stop
/// criteria (the app's Simulation owns those). README.md gives the equations and references.
#include <memory>
#include <string>
#include <vector>

#include "mesh/structured_grid.hpp"
#include "solver/flow_fields.hpp"
#include "solver/flow_model.hpp"
#include "solver/named_array.hpp"
#include "solver/solver_settings.hpp"

namespace veer {

struct FlowSolverCore;  // flow_solver_impl.hpp (internal)

/// What one step did. Residuals are root-mean-square over the cells: momentum as the rate of
/// change (u^{n+1} - u^n) / dt (free-stream units per time unit), continuity as the net outflow
/// of the predicted fluxes per unit cell area (before projection).
struct StepReport {
    long step = 0;           ///< steps taken, this one included
    double time = 0.0;       ///< physical time after the step (0 in steady mode)
    double time_step = 0.0;  ///< dt (steady: the smallest local step)
    double residual_u = 0.0;
    double residual_v = 0.0;
    double residual_continuity = 0.0;
    int momentum_sweeps = 0;
    int pressure_iterations = 0;
    double pressure_residual = 0.0;  ///< relative residual of the pressure solve
    double circulation = 0.0;        ///< far-field vortex circulation after the step
    /// The turbulence model's residuals, one per variable in the order of model_variables()
    /// (rms over the cells of (q_new - q) / dt; empty when laminar), for the convergence
    /// monitor.
    std::vector<double> model_residuals;
    bool finite = true;  ///< every value of u, v, p is finite
    /// The first non-finite value (cells in memory order) when !finite, else the cell with the
    /// largest momentum residual; variable is "u", "v", "pressure" or a model variable's name.
    int worst_i = 0;
    int worst_j = 0;
    std::string worst_variable = "u";
};

class FlowSolver {
public:
    /// Free stream (cos alpha, sin alpha) everywhere, pressure 0. Throws InputError for bad
    /// settings (naming the setting, the value and what is allowed).
    FlowSolver(const StructuredGrid& grid, const FlowConditions& conditions,
               const SolverSettings& settings);
    ~FlowSolver();
    FlowSolver(const FlowSolver&) = delete;
    FlowSolver& operator=(const FlowSolver&) = delete;

    /// Replaces u, v, p (cell values; and the model's variables that `initial` holds) and
    /// restarts the history: time 0, step 0, first step BDF1, face fluxes interpolated from the
    /// new velocity.
    void initialize(const FlowFields& initial);

    /// One time-accurate step of size dt (time_accurate mode). `nominal_dt` is the step the run
    /// would take if it were not landing on an end time (0: dt): it sets the pressure smoothing
    /// of the predicted face fluxes (Rhie-Chow coefficient), so that a last step shortened to
    /// land on an end time does not change the face fluxes of a flow that is not changing.
    StepReport advance(double dt, double nominal_dt = 0.0);
    /// One pseudo-time step with local time steps (steady mode).
    StepReport advance_pseudo_time();

    /// Largest uniform dt with convective CFL number `cfl` (diffusion is implicit).
    double time_step_for_cfl(double cfl) const;

    FlowFields fields() const;
    double time() const;
    long step_count() const;
    /// Circulation of the far-field point vortex (clockwise positive, = Cl / 2 for U = c = 1).
    double far_field_circulation() const;
    /// The turbulence model's transported variables (empty when laminar).
    const std::vector<ModelVariable>& model_variables() const;
    /// Steady "fast" runs: the step after which the run went on with "classic" because "fast"
    /// had stopped converging (steady_scheme.hpp); 0 when it has not.
    long scheme_fallback_step() const;

    /// Everything a restart needs to continue bit for bit: fields at two time levels, face
    /// fluxes at two levels, pressure, local time steps, counters, time-step history, vortex.
    std::vector<NamedArray> state() const;
    /// Restores a state() of a solver built on the same grid and settings (the model's
    /// variables under their names); throws InputError naming a missing or mis-sized array.
    void restore(const std::vector<NamedArray>& state);

private:
    std::unique_ptr<FlowSolverCore> m_impl;
};

}  // namespace veer
