#pragma once
/// The two paths of steady pseudo-time marching to the same discrete steady state (README.md,
/// "Steady schemes"). Neither changes the discretisation: the Rhie-Chow coefficient is the same
/// function of the flow state in both, so a converged state of one is a converged state of the
/// other. They differ in how far and how the iteration moves per step.
///
/// classic: pseudo CFL 5 laminar / 2 with Spalart-Allmaras, two momentum line
///   sweeps per step, j-lines ending at the wake cut, projection coefficient = the local step (the
///   pressure increment of SIMPLEC: Van Doormaal & Raithby 1984, Numer. Heat Transfer 7, 147-163
///   (memory)), the model's eddy viscosity taken as the model gives it.
/// fast: pseudo CFL 14, eight momentum sweeps, j-lines folded across the wake cut
///   (wall_normal_lines.hpp), projection coefficient 0.6 x the local step, and the face eddy
///   viscosity under-relaxed by 0.5 per step (under-relaxation of a dependent quantity between
///   segregated equations: Patankar 1980, Numerical Heat Transfer and Fluid Flow, ch. 4
///   (memory); common practice). 1.5 to 3.8 times fewer steps on attached turbulent flow; near
///   maximum lift it can stop converging, and then the flow solver hands the rest of the run to
///   classic (stall_guard.hpp). The default of case files ([run] steady_scheme); SolverSettings
///   keeps classic as its own default, so that library callers and tests choose explicitly.

namespace veer {

/// The case file's words for these: io/case_choices ([run] steady_scheme).
enum class SteadyScheme { classic, fast };

/// The numbers of one scheme.
struct SteadySchemeChoices {
    double pseudo_cfl = 2.0;     ///< default pseudo CFL (the case's [run] cfl overrides it)
    int momentum_sweeps = 2;     ///< line-relaxation sweeps of the momentum equations per step
    bool fold_wake_cut = false;  ///< j-lines of the line relaxation continue across the cut
    /// Projection coefficient gamma = projection_fraction x the local step (faces: the mean of
    /// the two cells'). 1: the increment of SIMPLEC.
    double projection_fraction = 1.0;
    /// Face eddy viscosity used by the momentum equations: old + factor (model's - old) per step.
    double eddy_viscosity_relaxation = 1.0;
};

/// The numbers of "fast", measured on NACA 0012, Re 6e6, Spalart-Allmaras, 384 x 128 cells,
/// y+ 1, far field 100 chords, alpha 10, to the default convergence criteria (steps to
/// convergence; solver/README.md, "Steady schemes"). Pseudo CFL 14: CFL 10 took 527 steps
/// (2 sweeps, fraction 1); CFL 20 380 (8 sweeps, fraction 0.7) against 366 at 14. With the
/// SIMPLEC increment (fraction 1) the Rhie-Chow (checkerboard) modes of the pressure decay by
/// 1 - D_f / gamma = 1 - rhie_chow_scale / (pseudo_cfl x projection_fraction) per step and were
/// the slowest above CFL 10: the continuity residual still at 3e-6 (CFL 20) and 5e-4 (CFL 40)
/// of its reference after 500 steps.
constexpr double fast_pseudo_cfl = 14.0;
/// Eight sweeps: 464 steps with 2, 392 with 4, 366 with 8, 361 with 12 (CFL 14, fraction 0.7).
constexpr int fast_momentum_sweeps = 8;
/// Projection coefficient 0.6 x the local step: the Rhie-Chow modes then decay by 0.94 per step
/// at CFL 14 instead of 0.964. The pressure increment grows by 1 / 0.6 against the SIMPLEC one,
/// which over-corrects the smooth pressure modes whose momentum response is the time term
/// alone (amplification 1 - 1/0.6 = -0.67); 0.5 (amplification -1) turned unstable with 4
/// momentum sweeps at CFL 20. Alpha 10: 355 steps with 0.6, 366 with 0.7 (8 sweeps).
constexpr double fast_projection_fraction = 0.6;
/// Under-relaxation of the face eddy viscosity: with 1 (the model's value at once) NACA 0012
/// at alpha 10 settled into a two-step cycle in the wall cells under the suction peak at pseudo
/// CFL 5 and 20 (u at the third cell from the wall alternating by 0.04, the SA variable by 20 % at
/// chi = 6, residuals flat): the lagged eddy viscosity and the new velocity push each other
/// across the fixed point. 0.5 removed it at CFL 5, 10, 14, 20 and 40; 0.7 converged as fast at
/// CFL 20.
constexpr double fast_eddy_viscosity_relaxation = 0.5;

/// The choices of `scheme`; `classic_pseudo_cfl` is the model's pseudo CFL of the classic scheme.
SteadySchemeChoices steady_scheme_choices(SteadyScheme scheme, double classic_pseudo_cfl);

}  // namespace veer
