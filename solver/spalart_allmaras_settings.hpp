#pragma once
/// Numerical choices of the Spalart-Allmaras model (spalart_allmaras.hpp), apart so that the
/// solver settings can hold them without the model's headers.
#include <functional>

#include "mesh/vec2.hpp"

namespace veer {

/// Numerical choices of the model.
struct SpalartAllmarasSettings {
    /// nu_tilde_inf / nu at inflow and as the initial value: 3, common practice in the NASA
    /// Turbulence Modeling Resource (and its NACA 0012 and flat-plate cases).
    double free_stream_ratio = 3.0;
    bool second_order_convection = true;  ///< van Leer deferred correction (else first order)
    int sweeps = 2;                       ///< line-relaxation sweeps per step
    /// Steady: nu_tilde's pseudo-time step = scale x the flow's local step (the converged state
    /// does not depend on it). 10 left a two-step odd-even cycle of nu_tilde at the outer edge
    /// of the wake (NACA 0012, Re 6e6, alpha 15, 384 x 128: x 6-10 chords, y 0.6-1.2, nu_tilde
    /// changing by 1e-2 of itself every step, no cell below zero; pseudo CFL 2), so its residual
    /// fell only 12% per 100 steps (1.3e-6 of its reference after 4400 steps). With 3 that case
    /// converges in 1727 steps, alpha 15 on 512 x 160 (pseudo CFL 3) in 1698, alpha 10 on
    /// 384 x 128 in 1348 (1334 with 10). Probably the explicit parts (deferred-correction
    /// convection, production) bound the stable step.
    double time_step_scale = 3.0;
    /// The j-lines of the line relaxation continue across the wake cut (wall_normal_lines.hpp);
    /// the flow solver sets it through FlowModel::fold_wake_cut_lines for the steady schemes
    /// that fold them.
    bool fold_wake_cut_lines = false;
    /// Off only in the transport-operator verification (manufactured solutions).
    bool model_sources = true;
    /// Value on prescribed-velocity faces (manufactured solutions); empty: 0 (moving walls).
    std::function<double(Vec2 x)> prescribed_value;
    /// Extra source per unit volume at the cell centroid (manufactured solutions); may be empty.
    std::function<double(Vec2 x)> manufactured_source;
};

}  // namespace veer
