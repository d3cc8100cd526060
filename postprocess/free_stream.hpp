#pragma once
/// Directions of the free stream, lift and drag for an angle of attack (chord frame, x along the
/// chord from the leading edge, y up). The free stream is (cos a, sin a) with U_inf = 1.
#include <cmath>
#include <numbers>

#include "mesh/vec2.hpp"

namespace veer {

/// Angle of attack in radians from degrees.
inline double alpha_radians(double alpha_deg) { return alpha_deg * std::numbers::pi / 180.0; }

/// Unit vector along the free stream: drag acts along it.
inline Vec2 drag_direction(double alpha_deg) {
    const double a = alpha_radians(alpha_deg);
    return {std::cos(a), std::sin(a)};
}

/// Unit vector normal to the free stream, rotated +90 degrees from it: lift acts along it.
inline Vec2 lift_direction(double alpha_deg) { return rotate_ccw(drag_direction(alpha_deg)); }

/// Dynamic pressure of the free stream, 0.5 rho U_inf^2 with rho = U_inf = 1.
inline constexpr double free_stream_dynamic_pressure = 0.5;

}  // namespace veer
