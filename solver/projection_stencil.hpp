#pragma once
/// The Poisson stencil of the pressure increment, built to match correct_face_flux exactly:
/// coef_f = gamma_f ortho_f on interior and connected faces, 2 gamma_f ortho_f (face-to-centroid
/// distance) on faces where the increment is Dirichlet zero (outflow), 0 on the other physical
/// faces (Neumann). Then sum of the corrected fluxes out of a cell is the residual
/// rhs - L(phi) of the pressure solve.
#include <optional>
#include <vector>

#include "mesh/structured_grid.hpp"
#include "solver/boundary_faces.hpp"
#include "solver/connectivity.hpp"
#include "solver/face_geometry.hpp"
#include "solver/poisson_stencil.hpp"

namespace veer {

PoissonStencil make_projection_stencil(const FaceGeometry& g, const Connectivity& c,
                                       const std::optional<CGridLayout>& layout,
                                       const std::vector<BoundaryFace>& faces,
                                       const std::vector<double>& gamma_i,
                                       const std::vector<double>& gamma_j);

}  // namespace veer
