#pragma once
/// Time-step sizes and the backward-differentiation coefficients of the stepper.
#include <vector>

#include "solver/cell_field.hpp"
#include "solver/face_geometry.hpp"

namespace veer {

/// dq/dt at t^{n+1} ~ (alpha0 q^{n+1} + alpha1 q^n + alpha2 q^{n-1}) / dt, and the extrapolation
/// q^{n+1} ~ extrap0 q^n + extrap1 q^{n-1} used for lagged (explicit) terms.
struct BdfCoefficients {
    double alpha0 = 1.0;
    double alpha1 = -1.0;
    double alpha2 = 0.0;
    double extrap0 = 1.0;
    double extrap1 = 0.0;
};

/// BDF1 (second_order false) or variable-step BDF2 with ratio dt / dt_previous (e.g. Hairer &
/// Wanner 1996, Solving ODEs II, section III.5; the fixed-step form 3/2, -2, 1/2).
BdfCoefficients bdf_coefficients(bool second_order, double dt, double dt_previous);

/// Spectral radius of cell (i, j) per unit volume: (|u.S_i| + |u.S_j|) / V, with S the mean of
/// the two opposite face area vectors, plus `viscous_weight` * 2 nu (|S_i|^2 + |S_j|^2) / V^2
/// (1 / time units). `speed_floor` keeps it positive where the flow is at rest.
double cell_spectral_radius(const FaceGeometry& g, int i, int j, double u, double v, double nu,
                            double viscous_weight, double speed_floor);

/// Local time steps cfl / radius per cell (steady pseudo-time), ni * nj.
void local_time_steps(const FaceGeometry& g, CellView u, CellView v, double nu, double cfl,
                      double viscous_weight, std::vector<double>& dt);

/// The largest uniform step with convective CFL number `cfl` everywhere (diffusion is implicit,
/// so it sets no limit); cells at rest count as moving at unit speed.
double convective_time_step(const FaceGeometry& g, CellView u, CellView v, double cfl);

}  // namespace veer
