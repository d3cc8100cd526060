#pragma once
/// Point-vortex far-field correction for lifting sections (Thomas & Salas 1986, AIAA J. 24(7),
/// 1074-1080, in its incompressible form): the far-field velocity is the free stream plus the
/// velocity of a point vortex at the quarter chord whose circulation gives the section's lift,
/// Gamma = L' / (rho U_inf) = Cl U_inf c / 2 (Kutta-Joukowski).
#include <vector>

#include "mesh/vec2.hpp"
#include "solver/boundary_faces.hpp"
#include "solver/cell_field.hpp"
#include "solver/face_geometry.hpp"

namespace veer {

/// Velocity induced at x by a vortex at `center` with clockwise circulation `gamma` (positive
/// for positive lift in a free stream from the left): (gamma / 2 pi r^2) (y - y_c, -(x - x_c)).
Vec2 point_vortex_velocity(Vec2 x, Vec2 center, double gamma);

/// Force on the walls per unit span (rho = 1) from the pressure at the wall cells and the
/// one-sided wall shear nu (u_P - u_wall) / h, summed over the faces of role wall (chord frame).
Vec2 wall_force(const FaceGeometry& g, const std::vector<BoundaryFace>& faces, CellView u,
                CellView v, CellView p, double nu);

}  // namespace veer
