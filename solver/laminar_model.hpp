#pragma once
/// No turbulence model: no transported variable, no eddy viscosity.
#include "solver/flow_model.hpp"

namespace veer {

/// Steady laminar runs: pseudo CFL 5 (solver/README.md, "Local pseudo-time steps").
constexpr double laminar_pseudo_cfl = 5.0;

/// The registry entry "laminar".
ModelDescriptor laminar_descriptor();

}  // namespace veer
