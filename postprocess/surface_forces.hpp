#pragma once
/// Surface route to the forces: F = sum over wall faces of (-p n + tau_w t) ds, n the unit normal
/// into the fluid, t the unit tangent, tau_w the wall shear (see wall_faces.hpp). Coefficients use
/// q_inf = 1/2 and chord 1: cl = 2 F.e_lift, cd = 2 F.e_drag with e_drag = (cos a, sin a) and
/// e_lift = (-sin a, cos a); cm = -2 sum (r - r_ref) x dF about r_ref = (0.25, 0), nose-up
/// positive.
#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"
#include "postprocess/wall_faces.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// One force or moment coefficient and its split into pressure and friction parts.
struct CoefficientParts {
    double total = 0.0;
    double pressure = 0.0;
    double friction = 0.0;
};

/// Force and moment coefficients of the section from surface integration.
struct SurfaceForces {
    CoefficientParts cl;  ///< lift, normal to the free stream
    CoefficientParts cd;  ///< drag, along the free stream
    CoefficientParts cm;  ///< pitching moment about the reference point, nose-up positive
    Vec2 force_pressure;  ///< pressure force on the section, chord frame (per unit span, rho = 1)
    Vec2 force_friction;  ///< friction force on the section, chord frame
};

/// Choices of the surface integration; the defaults are what the issue asks for.
struct SurfaceForceOptions {
    Vec2 moment_reference{0.25, 0.0};  ///< quarter chord
    WallPressure wall_pressure = WallPressure::extrapolated;
};

/// Cl, Cd, Cm of the section by integration over the wall faces (j = 0, the section's i range).
SurfaceForces integrate_surface_forces(const StructuredGrid& grid, const GridMetrics& metrics,
                                       const FlowFields& fields, const FlowConditions& conditions,
                                       const SurfaceForceOptions& options = {});

/// The same integration from wall states already evaluated (lets callers reuse them).
SurfaceForces integrate_surface_forces(const std::vector<WallFaceState>& wall,
                                       const FlowConditions& conditions,
                                       const SurfaceForceOptions& options = {});

}  // namespace veer
