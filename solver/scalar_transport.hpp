#pragma once
/// The implicit transport equation of a passive model scalar q (a transition model's n~ or
/// log-intermittency) for one pseudo-time (or time) step, in the matrix layout of the momentum
/// equations so that the solver's line relaxation solves it:
///
///   V (q_P - q_P^n) / dt + sum_f F_f,out (q_f - q_P)
///     = sum_f mu_f grad q . A_f,out + V (explicit - implicit q_P)
///
/// Convection in the non-conservative form u . grad q as for nu_tilde (upwind implicit, a van
/// Leer-limited deferred correction; van Leer 1974, Khosla & Rubin 1974), diffusion in
/// conservative form with a diffusivity mu_f given per face (compact part implicit,
/// non-orthogonal part explicit, face_geometry.hpp), the source split by the model (losses on
/// the diagonal). Physical faces are folded into the diagonal and right-hand side from the
/// variable's boundary column.
#include <vector>

#include "solver/boundary_faces.hpp"
#include "solver/boundary_ghosts.hpp"
#include "solver/cell_field.hpp"
#include "solver/face_geometry.hpp"
#include "solver/momentum_system.hpp"

namespace veer {

/// What the assembly reads. Views must have their ghosts filled.
struct ScalarTransportInputs {
    const std::vector<double>* flux_i = nullptr;  ///< convecting face fluxes
    const std::vector<double>* flux_j = nullptr;
    CellView q;               ///< level n, ghosts filled
    CellView grad_x, grad_y;  ///< Green-Gauss gradient of q (ghosts copied)
    /// Diffusivity on the i- and j-faces (FaceGeometry layouts).
    const std::vector<double>* mu_i = nullptr;
    const std::vector<double>* mu_j = nullptr;
    bool second_order = true;                              ///< van Leer deferred correction
    const std::vector<double>* time_diag = nullptr;        ///< V / dt per cell
    const std::vector<double>* source_explicit = nullptr;  ///< per unit volume
    const std::vector<double>* source_implicit = nullptr;  ///< 1 / time, >= 0
};

/// Face work of the assembly: mu_f skew . grad q and the deferred convective correction.
struct ScalarFaceWork {
    std::vector<double> skew_i, skew_j, conv_i, conv_j;
    void resize(const FaceGeometry& g);
};

/// Assembles the system of q into `sys` (rhs_u; rhs_v zeroed).
void assemble_scalar(const FaceGeometry& g, const std::vector<BoundaryFace>& faces,
                     const std::vector<ScalarFaceCondition>& conditions,
                     const ScalarTransportInputs& in, ScalarFaceWork& work, MomentumSystem& sys);

/// Neumann faces carry no non-orthogonal diffusion (zero normal gradient): clears their skew
/// terms in the i- and j-face arrays.
void clear_neumann_skew(const std::vector<BoundaryFace>& faces,
                        const std::vector<ScalarFaceCondition>& conditions,
                        std::vector<double>& skew_i, std::vector<double>& skew_j);

/// Replaces the ghost neighbour of each physical face by its condition: Dirichlet ghosts
/// 2 q_b - q_P in diffusion with the inflowing value q_b itself, Neumann ghosts q_P.
void fold_scalar_boundaries(const FaceGeometry& g, const std::vector<BoundaryFace>& faces,
                            const std::vector<ScalarFaceCondition>& conditions,
                            const std::vector<double>& flux_i, const std::vector<double>& flux_j,
                            MomentumSystem& s);

}  // namespace veer
