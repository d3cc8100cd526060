#pragma once
/// Ghost filling on physical boundaries: the boundary conditions act only here (and in the
/// folding of the implicit momentum coefficients, momentum_system.hpp). Both ghost layers get the
/// same value; the second is read only by the limiter on faces inside the block.
///
/// Dirichlet value q_b: ghost = 2 q_b - q_P (the face average is q_b).
/// Neumann (zero normal gradient): ghost = q_P.
#include <vector>

#include "solver/boundary_faces.hpp"
#include "solver/cell_field.hpp"
#include "solver/connectivity.hpp"

namespace veer {

/// Velocity ghosts from the faces' roles and boundary velocities, then the connected ghosts.
void fill_velocity_ghosts(const std::vector<BoundaryFace>& faces, const Connectivity& c, CellView u,
                          CellView v);

/// Pressure ghosts: Dirichlet at outflow faces (their boundary pressure), Neumann elsewhere.
void fill_pressure_ghosts(const std::vector<BoundaryFace>& faces, const Connectivity& c,
                          CellView p);

/// Pressure-increment ghosts: Dirichlet zero at outflow faces, Neumann elsewhere.
void fill_increment_ghosts(const std::vector<BoundaryFace>& faces, const Connectivity& c,
                           CellView phi);

/// The condition of a model variable on one physical face (same order as the faces).
struct ScalarFaceCondition {
    bool dirichlet = true;
    double value = 0.0;  ///< boundary value where Dirichlet
};

/// The conditions of a model variable's column (boundary_table.hpp) on every physical face.
std::vector<ScalarFaceCondition> scalar_face_conditions(const std::vector<BoundaryFace>& faces,
                                                        const ScalarColumn& column);

/// Ghosts of a model variable from its face conditions (Dirichlet: 2 q_b - q_P; Neumann: q_P,
/// both layers), then the connected ghosts.
void fill_scalar_ghosts(const std::vector<BoundaryFace>& faces,
                        const std::vector<ScalarFaceCondition>& conditions, const Connectivity& c,
                        CellView q);

/// Ghosts equal to the interior neighbour on every physical face (for cell gradients, whose
/// face average is then the interior value), then the connected ghosts.
void fill_copy_ghosts(const std::vector<BoundaryFace>& faces, const Connectivity& c, CellView q);

}  // namespace veer
