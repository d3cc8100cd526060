#pragma once
/// SA-BCM behind the model interface (flow_model.hpp): Spalart-Allmaras without its trip term
/// (SA-noft2) whose production is multiplied by the algebraic intermittency gamma_BC
/// (Cakmakcioglu, Bas, Mura & Kaynak, AIAA 2020-2706; transition_correlations.hpp), registry
/// entry "sa-bcm". One transported variable, nu_tilde (far field 0.02 nu, the middle of the
/// published 0.015-0.025 nu); the free-stream turbulence acts through Re_theta_c alone
/// ([flow] turbulence_percent, default 0.1 %). Output field "intermittency" = gamma_BC (1 behind
/// a trip). gamma_BC is evaluated before each nu_tilde step from the current nu_t and the flow's
/// vorticity.
#include "solver/flow_model.hpp"
#include "solver/spalart_allmaras_settings.hpp"

namespace veer {

/// The registry entry "sa-bcm"; `settings` as for spalart_allmaras_descriptor (its
/// free_stream_ratio is replaced by the model's 0.02).
ModelDescriptor sa_bcm_descriptor(const SpalartAllmarasSettings& settings = {});

}  // namespace veer
