#pragma once
/// Control-volume route to the forces: the momentum balance of the fluid inside a closed grid
/// contour S (grid_contour.hpp) gives the force on the section,
///
///   F = - sum over faces of S [ p A + u (u.A) - tau.A ] - d/dt sum over cells inside of u V,
///
/// A the face area vector out of S, tau = nu_eff (grad u + grad u^T), nu_eff = 1/Re + eddy
/// viscosity, rho = 1. Face values are reconstructed from the two cells a face separates with
/// their least-squares gradients (contour_sampling.hpp).
/// Free-stream parts cancel exactly: the area vectors of a closed contour sum to zero.
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"
#include "postprocess/grid_contour.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// A coefficient from the momentum balance and its four parts.
struct MomentumParts {
    double total = 0.0;
    double pressure = 0.0;       ///< from - sum p A
    double momentum_flux = 0.0;  ///< from - sum u (u.A)
    double viscous = 0.0;        ///< from + sum tau.A
    double unsteady = 0.0;       ///< from - d/dt of the momentum inside (0 when steady)
};

/// Lift and drag coefficients of the section from one contour.
struct ContourForces {
    GridContour contour;
    MomentumParts cl;  ///< normal to the free stream, 2 F.e_lift
    MomentumParts cd;  ///< along the free stream, 2 F.e_drag
    Vec2 force;        ///< force on the section, chord frame (per unit span)
};

/// The rate-of-change term of time-accurate runs: the fields one step `dt` earlier.
struct ControlVolumeOptions {
    const FlowFields* previous = nullptr;  ///< null for steady runs
    double dt = 0.0;                       ///< time step (chords / U_inf) between the two
};

/// Momentum balance on one contour.
ContourForces contour_forces(const StructuredGrid& grid, const GridMetrics& metrics,
                             const FlowFields& fields, const FlowConditions& conditions,
                             const GridContour& contour, const ControlVolumeOptions& options = {});

/// The momentum inside a contour, sum of u V over its cells (chord frame, rho = 1): the
/// rate-of-change term is its time derivative, so its time mean over a window is the change of
/// this sum over the window divided by the window's length.
Vec2 contour_momentum(const GridMetrics& metrics, const StructuredGrid& grid,
                      const FlowFields& fields, const GridContour& contour);

/// Momentum balance on each of several contours.
std::vector<ContourForces> contour_forces(const StructuredGrid& grid, const GridMetrics& metrics,
                                          const FlowFields& fields,
                                          const FlowConditions& conditions,
                                          const std::vector<GridContour>& contours,
                                          const ControlVolumeOptions& options = {});

}  // namespace veer
