#pragma once
/// Choices of the projection stepper (the case file's numerics, in solver terms).
#include <functional>
#include <vector>

#include "mesh/vec2.hpp"
#include "solver/boundary_faces.hpp"
#include "solver/flow_model.hpp"
#include "solver/laminar_model.hpp"
#include "solver/pressure_solver.hpp"
#include "solver/stall_guard.hpp"
#include "solver/steady_scheme.hpp"

namespace veer {

/// time_accurate: uniform steps given by the caller, BDF2; steady: pseudo-time marching with
/// local time steps and BDF1, whose converged state does not depend on the pseudo-time steps.
enum class TimeMode { time_accurate, steady };

struct SolverSettings {
    TimeMode mode = TimeMode::steady;

    // Steady pseudo-time marching.
    /// The path to the steady state (steady_scheme.hpp); the converged state is the same.
    SteadyScheme steady_scheme = SteadyScheme::classic;
    /// Local time step = pseudo_cfl / spectral radius; 0: the default of the scheme and model
    /// (ModelDescriptor::steady_pseudo_cfl for "classic"; effective_pseudo_cfl()).
    double pseudo_cfl = 0.0;
    double viscous_weight = 0.25;  ///< weight of the viscous radius in the local step
    int local_step_interval = 20;  ///< local steps (and the Poisson set-up) renewed every N
    /// Rhie-Chow coefficient D_f = rhie_chow_scale / spectral radius (= rhie_chow_scale x local
    /// step / pseudo_cfl): part of the discretisation, the same in every scheme.
    double rhie_chow_scale = 0.5;
    /// Line-relaxation sweeps per pseudo step; 0: the scheme's (effective_momentum_sweeps()).
    int momentum_sweeps = 0;
    /// When a "fast" run counts as stalled and goes on with "classic" (stall_guard.hpp).
    StallRule stall_rule;

    // Time-accurate stepping.
    /// Relative residual of the momentum solves. 1e-6: against 1e-9 the same Strouhal number,
    /// mean Cl and Cl amplitude to four digits (NACA 0012, Re 1000, alpha 12, 256 x 64, CFL 4,
    /// 8 shedding cycles to t = 24) at half the run time; the line sweeps were 40 % of it.
    double momentum_tolerance = 1e-6;
    int momentum_max_sweeps = 60;

    // Pressure increment.
    PressureSolverKind pressure_solver = PressureSolverKind::multigrid;
    /// Relative residual per solve, time-accurate. 1e-6: against 1e-8 the same Strouhal number,
    /// mean Cl and amplitude to four digits and the final Cl to 1e-8 (the case of
    /// momentum_tolerance), 15 % less run time.
    double pressure_tolerance = 1e-6;
    /// Relative residual per solve in steady mode: the converged state does not depend on it
    /// (at the fixed point the increment is zero), so a loose solve per pseudo step suffices.
    double steady_pressure_tolerance = 1e-2;
    int pressure_max_iterations = 200;

    // Far field of lifting sections (grids with a C-grid layout).
    bool far_field_vortex = true;     ///< Thomas & Salas 1986 point-vortex correction
    Vec2 vortex_center{0.25, 0.0};    ///< quarter chord (chords)
    double vortex_relaxation = 0.05;  ///< fraction of the lift-based update taken each step

    /// The turbulence model (flow_model.hpp, model_registry.hpp): its eddy viscosity enters
    /// the momentum diffusion; its variables are advanced after each projection step.
    ModelDescriptor model = laminar_descriptor();

    /// Per-segment velocity prescriptions (manufactured solutions, moving lids).
    std::vector<VelocityOverride> velocity_overrides;
    /// Body force per unit mass f(x, t) (manufactured solutions); empty where none.
    std::function<Vec2(Vec2 x, double t)> body_force;
};

/// The numbers of the scheme a solver with these settings uses ("classic" takes the model's
/// pseudo CFL, ModelDescriptor::steady_pseudo_cfl).
inline SteadySchemeChoices steady_choices(const SolverSettings& s) {
    return steady_scheme_choices(s.steady_scheme, s.model.steady_pseudo_cfl);
}

/// The pseudo CFL number a solver with these settings uses.
inline double effective_pseudo_cfl(const SolverSettings& s) {
    return s.pseudo_cfl > 0.0 ? s.pseudo_cfl : steady_choices(s).pseudo_cfl;
}

/// Momentum line-relaxation sweeps per pseudo step.
inline int effective_momentum_sweeps(const SolverSettings& s) {
    return s.momentum_sweeps > 0 ? s.momentum_sweeps : steady_choices(s).momentum_sweeps;
}

}  // namespace veer
