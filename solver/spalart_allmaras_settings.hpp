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
    /// Steady: nu_tilde's pseudo-time step = scale x the flow's local step. The nu_tilde step is
    /// implicit and positivity-keeping, so it takes larger steps than the flow: 10 brought the
    /// nu_tilde residual down about 3x faster than 1 on a NACA 0012 at Re 6e6 (192 x 64 cells).
    double time_step_scale = 10.0;
    /// Off only in the transport-operator verification (manufactured solutions).
    bool model_sources = true;
    /// Value on prescribed-velocity faces (manufactured solutions); empty: 0 (moving walls).
    std::function<double(Vec2 x)> prescribed_value;
    /// Extra source per unit volume at the cell centroid (manufactured solutions); may be empty.
    std::function<double(Vec2 x)> manufactured_source;
};

}  // namespace veer
