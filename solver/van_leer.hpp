#pragma once
/// The explicit part of second-order convection, shared by the momentum equations
/// (momentum_system.hpp) and the transported variables of the models: on a face with flux F, the
/// difference between a van Leer-limited upwind-biased face value (van Leer 1974, J. Comput.
/// Phys. 14, 361-370) and the first-order upwind value, applied as a deferred correction
/// (Khosla & Rubin 1974, Computers & Fluids 2, 207-209) to an implicit upwind operator.

namespace veer {

/// F * (limited upwind-biased value - upwind value) on a face between cells l and r whose flux F
/// points from l to r when positive; q_far_l and q_far_r are the next cells outward on each side.
inline double van_leer_correction(double flux, double q_far_l, double q_l, double q_r,
                                  double q_far_r) {
    const double up = flux >= 0.0 ? q_l : q_r;
    const double far = flux >= 0.0 ? q_far_l : q_far_r;
    const double down = flux >= 0.0 ? q_r : q_l;
    const double a = up - far, b = down - up;
    const double slope = a * b > 0.0 ? 2.0 * a * b / (a + b) : 0.0;
    return flux * 0.5 * slope;
}

}  // namespace veer
