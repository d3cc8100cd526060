#pragma once
/// Internal state of FlowSolver (shared by flow_solver.cpp, projection_step.cpp and
/// solver_state.cpp; not part of the public API).
#include <memory>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "solver/boundary_faces.hpp"
#include "solver/cell_field.hpp"
#include "solver/connectivity.hpp"
#include "solver/face_geometry.hpp"
#include "solver/flow_model.hpp"
#include "solver/flow_solver.hpp"
#include "solver/line_relaxation.hpp"
#include "solver/momentum_system.hpp"
#include "solver/pressure_solver.hpp"
#include "solver/stall_guard.hpp"

namespace veer {

struct FlowSolverCore {
    StructuredGrid grid;
    FlowConditions conditions;
    SolverSettings settings;
    double nu = 0.0;
    Vec2 free_stream;
    bool vortex_active = false;

    Connectivity connectivity;
    std::vector<BoundaryFace> faces;
    FaceGeometry geom;
    std::vector<Vec2> centroids;

    // Time levels n and n-1, the new level and the lagged (extrapolated) velocity.
    VelocityField vel, vel_old, vel_new, vel_lag;
    CellField pressure, increment;
    CellField ux, uy, vx, vy, px, py, phix, phiy;
    CellField local_dt;  ///< steady mode: pseudo-time step per cell (ghosts copied)

    std::vector<double> flux_i, flux_j, flux_i_old, flux_j_old, flux_i_new, flux_j_new;
    std::vector<double> gamma_i, gamma_j, rc_i, rc_j;
    std::vector<double> time_diag, time_rhs_u, time_rhs_v, source_u, source_v;
    std::vector<double> outflow, rhs, phi;
    MomentumSystem system;
    LineWork line_work;
    std::unique_ptr<PressureSolver> pressure_solver;
    std::unique_ptr<FlowModel> model;                  ///< the turbulence model (laminar: none)
    std::vector<double> eddy_i, eddy_j;                ///< face eddy viscosity of the current step
    std::vector<double> eddy_target_i, eddy_target_j;  ///< the model's, before relaxation
    StallGuard stall_guard;         ///< "fast" hands over to "classic" when it stalls
    long scheme_fallback_step = 0;  ///< the step of that hand-over (0: none)
    SteadyScheme requested_scheme = SteadyScheme::classic;  ///< the settings' scheme

    double time = 0.0;
    double dt_previous = 0.0;
    long steps = 0;
    double circulation = 0.0;

    FlowSolverCore(const StructuredGrid& g, const FlowConditions& c, const SolverSettings& s);
    void allocate();
    void reset_history();
    void update_boundary_values(double t);
    /// Steady schemes that fold the j-lines of the line relaxation across the wake cut.
    bool folds_wake_cut_lines() const;
    void refresh_local_steps();
    void apply_local_steps();
    void setup_uniform_pressure();
    StepReport step(double dt, bool steady, double nominal_dt = 0.0);
    void update_vortex();
    void advance_model(double dt, bool steady, StepReport& r);
    void update_face_eddy_viscosity();
    /// A steady scheme that under-relaxes the eddy viscosity of a turbulence model (the relaxed
    /// face values are then part of the state).
    bool relaxes_eddy_viscosity() const;
    /// Steady "fast": feeds the step's residuals to the stall guard; on a stall the rest of the
    /// run takes the numbers of "classic".
    void watch_progress(const StepReport& r);
    void fall_back_to_classic();
    /// Switches the line plans (flow and model) to `scheme`'s; the local steps are not renewed.
    void use_scheme(SteadyScheme scheme);
};

}  // namespace veer
