#pragma once
/// The implicit nu_tilde transport equation of one pseudo-time (or time) step, in the matrix
/// layout of the momentum equations so that the solver's line relaxation solves it:
///
///   diag_P q_P - west_P q_W - east_P q_E - south_P q_S - north_P q_N = rhs_P   (q = nu_tilde)
///
/// Finite volumes on the curvilinear grid, per cell of volume V with faces f (area A_f):
///   V (q_P - q_P^n) / dt + sum_f F_f,out (q_f - q_P)
///     = sum_f mu_f grad q . A_f,out + V [c_b2 / sigma |grad q|^2 + source]
/// - convection in the non-conservative form u . grad q (F_f the solver's face fluxes): the
///   upwind part is implicit (a non-negative matrix with a dominant diagonal: no new extrema),
///   the difference to a van Leer-limited upwind-biased face value is a deferred correction
///   (van Leer 1974, J. Comput. Phys. 14, 361-370; Khosla & Rubin 1974, Computers & Fluids 2,
///   207-209), as the momentum equations do it;
/// - diffusion in conservative form with mu_f = (nu + q_f f_n(q_f)) / sigma at the face mean
///   q_f, the compact part implicit, the non-orthogonal part explicit (face_geometry.hpp);
/// - the c_b2 term: where q >= 0 on the cell and its faces (f_n = 1, mu = (nu + q) / sigma),
///   c_b2 / sigma |grad q|^2 = c_b2 grad mu . grad q is discretised on the faces as
///   c_b2 sum_f (mu_f - mu_P) grad q . A_f,out, whose compact part joins the implicit
///   neighbour coefficient: (1 + c_b2) mu_f - c_b2 mu_P >= 0 for q >= 0 (the form Spalart &
///   Allmaras 1994 give for positivity), any negative remainder explicit. An explicit
///   |grad q|^2 with the large local steps of a steady run overshoots near steep gradients.
///   Elsewhere (SA-neg cells) c_b2 / sigma |grad q|^2 from Green-Gauss gradients, explicit;
/// - the model source split as sa_source() does: gains explicit, losses on the diagonal.
/// Physical faces are folded into the diagonal and right-hand side (nu_tilde_column()).
#include <functional>
#include <vector>

#include "solver/boundary_faces.hpp"
#include "solver/boundary_ghosts.hpp"
#include "solver/boundary_table.hpp"
#include "solver/cell_field.hpp"
#include "solver/face_geometry.hpp"
#include "solver/momentum_system.hpp"

namespace veer {

/// The nu_tilde column of the boundary table (boundary_table.hpp):
/// | role                | nu_tilde                                                 |
/// |---------------------|----------------------------------------------------------|
/// | wall                | Dirichlet 0                                              |
/// | inflow (far field)  | Dirichlet nu_tilde_inf (3 nu: common practice, NASA TMR) |
/// | outflow             | Neumann, zero normal gradient                            |
/// | prescribed velocity | Dirichlet: the prescribed value (0 on moving walls)      |
/// | wake cut, periodic  | connectivity                                             |
/// `prescribed(x)` gives the value on prescribed-velocity faces (empty: 0, a moving wall).
ScalarColumn nu_tilde_column(double free_stream_nu_tilde,
                             const std::function<double(Vec2)>& prescribed);

/// What the assembly reads. Views must have their ghosts filled.
struct NuTildeInputs {
    double nu = 0.0;                    ///< molecular kinematic viscosity (1/Re)
    const std::vector<double>* flux_i;  ///< convecting face fluxes (chords^2 per time unit)
    const std::vector<double>* flux_j;
    CellView nu_tilde;         ///< level n, ghosts filled from the conditions and connectivity
    CellView grad_x, grad_y;   ///< Green-Gauss gradient of nu_tilde (ghosts copied)
    bool second_order = true;  ///< van Leer deferred correction of convection
    /// Per cell: V / dt (the time-derivative diagonal); ni * nj.
    const std::vector<double>* time_diag;
    /// Per cell, per unit volume: explicit source and implicit loss coefficient (1/time); ni * nj.
    const std::vector<double>* source_explicit;
    const std::vector<double>* source_implicit;
};

/// Face work arrays of the assembly (i-face and j-face layouts of FaceGeometry).
struct NuTildeFaceWork {
    std::vector<double> mu_i, mu_j;      ///< (nu + q_f f_n) / sigma
    std::vector<double> skew_i, skew_j;  ///< mu_f skew . grad q (towards +i / +j)
    std::vector<double> conv_i, conv_j;  ///< deferred convective correction (towards +i / +j)
    void resize(const FaceGeometry& g);
};

/// Assembles the nu_tilde system into `sys` (rhs_u; rhs_v is zeroed).
void assemble_nu_tilde(const FaceGeometry& g, const std::vector<BoundaryFace>& faces,
                       const std::vector<ScalarFaceCondition>& conditions, const NuTildeInputs& in,
                       NuTildeFaceWork& work, MomentumSystem& sys);

}  // namespace veer
