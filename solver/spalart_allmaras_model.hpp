#pragma once
/// The Spalart-Allmaras model behind the model interface (flow_model.hpp): one transported
/// variable, nu_tilde (label "nu~"), its boundary column (spalart_allmaras_transport.hpp), the
/// eddy viscosity nu~ f_v1, and the registry entry "spalart-allmaras".
#include "solver/flow_model.hpp"
#include "solver/spalart_allmaras_settings.hpp"

namespace veer {

/// Steady runs with the model: pseudo CFL 2. On y+ ~ 1 grids at Re 6e6 (NACA 0012, 384 x 128
/// cells) a pseudo-time step beyond the stability limit of the partly implicit step in the thin
/// wall cells under the suction peak leaves the steady iteration in a two-step cycle (u changing
/// by 0.04 every step, Cl by 2e-5, residuals flat; also with first-order convection and with
/// nu_tilde's step scale 1), not at a steady solution: at alpha 10 with 5 and 4; at alpha 12
/// with 3, from the free stream and from the 10-degree solution alike (residuals flat from step
/// 1000, Cl alternating 1.26460 / 1.26461). 2.5 and 2 converge at 12 (1205 and 1434 steps) and 2
/// also where 3 cycled before (alpha 15 on 384 x 128, alpha 0 on 256 x 96); 2 costs about a
/// third more steps than 3 where both converge.
constexpr double spalart_allmaras_pseudo_cfl = 2.0;

/// The registry entry "spalart-allmaras"; `settings` are the numerical choices of the model
/// (tests change them: manufactured sources, prescribed boundary values).
ModelDescriptor spalart_allmaras_descriptor(const SpalartAllmarasSettings& settings = {});

}  // namespace veer
