#pragma once
/// Face fluxes of the projection method (chords^2 per time unit, towards +i / +j).
///
/// Predicted flux, Rhie & Chow 1983 (AIAA J. 21(11), 1525-1532) momentum interpolation with a
/// coefficient D_f chosen apart from the time step, so that the converged steady state does not
/// depend on the time step or on relaxation (the dependence and its remedy: Majumdar 1988,
/// Numer. Heat Transfer 13, 125-132; Choi 1999, Numer. Heat Transfer A 36, 545-550 (memory)):
///
///   F*_f = A . avg(u*) - D_f ortho_f [ (p_R - p_L) - delta_f . avg(grad p) ]
///
/// with plain averages (distance weights here stalled the steady convergence on C-grids; the
/// cell gradients use them, gradients.hpp). The bracket is a third difference of p (zero for
/// linear p), and the non-orthogonal parts of the face gradient and of the interpolated
/// gradient cancel exactly (face_geometry.hpp). On physical faces F* = A . avg(u*), i.e. A . u_b
/// where the velocity is prescribed and A . u*_P where it has zero gradient (the ghosts carry the
/// condition).
///
/// Projection: F^{n+1}_f = F*_f - gamma_f ortho_f (phi_R - phi_L), with the increment's ghosts
/// (Dirichlet phi = 0: ghost -phi_P, which the doubled boundary coefficient of the Poisson stencil
/// matches; Neumann: ghost phi_P, no correction).
#include <vector>

#include "solver/cell_field.hpp"
#include "solver/face_geometry.hpp"

namespace veer {

/// F*; views must have ghosts filled (gpx, gpy: the cell pressure gradient, ghosts copied).
void predicted_face_flux(const FaceGeometry& g, CellView u, CellView v, CellView p, CellView gpx,
                         CellView gpy, const std::vector<double>& rc_i,
                         const std::vector<double>& rc_j, std::vector<double>& flux_i,
                         std::vector<double>& flux_j);

/// Net outflow of every cell, sum of F over its faces with outward sign, ni * nj.
void net_outflow(const FaceGeometry& g, const std::vector<double>& flux_i,
                 const std::vector<double>& flux_j, std::vector<double>& out);

/// F -= gamma_f ortho_f (phi_R - phi_L), phi with ghosts filled.
void correct_face_flux(const FaceGeometry& g, CellView phi, const std::vector<double>& gamma_i,
                       const std::vector<double>& gamma_j, std::vector<double>& flux_i,
                       std::vector<double>& flux_j);

/// Cell velocity change reconstructed from face-flux changes dF (Perot 2000, J. Comput. Phys.
/// 159, 58-89, (memory)): du_P = (1/V) sum_f dF_out,f (x_f - x_P), exact for uniform fields, so
/// that cell velocities are corrected consistently with the face fluxes on any cell shape.
/// dF_f = -gamma_f ortho_f (phi_R - phi_L); phi with ghosts filled.
void flux_consistent_correction(const FaceGeometry& g, CellView phi,
                                const std::vector<double>& gamma_i,
                                const std::vector<double>& gamma_j, CellView du, CellView dv);

/// F = A . avg(u) on every face (start-up fluxes, no pressure term).
void interpolated_face_flux(const FaceGeometry& g, CellView u, CellView v,
                            std::vector<double>& flux_i, std::vector<double>& flux_j);

}  // namespace veer
