#pragma once
/// SA-AFT2017b behind the model interface (flow_model.hpp): Spalart-Allmaras with its trip term
/// f_t2 driven by the intermittency (Coder, Pulliam & Jensen, AIAA 2018-1039; equations and
/// constants in transition_correlations.hpp), registry entry "sa-aft". Three transported
/// variables: nu_tilde ("nu~", far field 0.1 nu), the amplification factor n~
/// ("amplification", far field 0, zero normal gradient at walls, kept >= 0) and the
/// log-intermittency g~ ("log_intermittency", far field 0, zero normal gradient at walls, kept
/// <= 0); output fields "intermittency" = exp(g~) (1 behind a trip) and
/// "shape_factor_estimate", the H12 the correlations read (from H_L of the last step).
///
/// One step: f_t2 = c_t3 (1 - exp(g~)) per cell (0 behind a trip: whichever of the trip and free
/// transition comes first), the nu_tilde step, then Omega, S and H_L from the new velocity and
/// one implicit step each of n~ (source explicit: it is a pure gain) and g~ (its loss on the
/// diagonal by Newton's linearisation), both with nu_tilde's pseudo-time step scale.
#include "solver/flow_model.hpp"
#include "solver/spalart_allmaras_settings.hpp"

namespace veer {

/// The registry entry "sa-aft"; `settings` as for spalart_allmaras_descriptor (its
/// free_stream_ratio is replaced by the model's 0.1).
ModelDescriptor sa_aft_descriptor(const SpalartAllmarasSettings& settings = {});

}  // namespace veer
