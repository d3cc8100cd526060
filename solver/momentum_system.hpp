#pragma once
/// The implicit momentum equations of one step, both components sharing one matrix:
///
///   diag_P q_P - west_P q_W - east_P q_E - south_P q_S - north_P q_N = rhs_P
///
/// Implicit: the time derivative (BDF1/BDF2 diagonal), first-order upwind convection with the
/// given face fluxes and the compact (orthogonal) part of diffusion. Explicit (deferred
/// correction, Khosla & Rubin 1974, Computers & Fluids 2, 207-209): the difference between a
/// van Leer-limited upwind-biased face value (van Leer 1974, J. Comput. Phys. 14, 361-370) and
/// the upwind value, and the non-orthogonal part of diffusion. Physical boundary faces are
/// folded into the diagonal and right-hand side (boundary_table.hpp), so the neighbour
/// coefficient behind them is zero; connected faces keep theirs and read the ghosts.
#include <vector>

#include "solver/boundary_faces.hpp"
#include "solver/cell_field.hpp"
#include "solver/face_geometry.hpp"

namespace veer {

/// Matrix and right-hand sides, interior cells, i fastest.
struct MomentumSystem {
    std::vector<double> diag, west, east, south, north;
    std::vector<double> rhs_u, rhs_v;
    // Work arrays of the face pass (explicit face fluxes towards +i / +j).
    std::vector<double> explicit_i_u, explicit_i_v, explicit_j_u, explicit_j_v;

    void resize(int ni, int nj);
};

/// What the assembly reads. Views must have their ghosts filled.
struct MomentumInputs {
    double nu = 0.0;                    ///< kinematic viscosity (1/Re)
    const std::vector<double>* flux_i;  ///< convecting face fluxes (chords^2 per time unit)
    const std::vector<double>* flux_j;
    CellView u_lag, v_lag;      ///< velocity for the deferred corrections
    CellView ux, uy, vx, vy;    ///< gradients of u_lag, v_lag (ghosts copied)
    CellView grad_px, grad_py;  ///< pressure gradient at the cells
    CellView u_now, v_now;      ///< velocity at time level n (outflow backflow value)
    /// Time derivative: diag += time_diag_P; rhs += time_rhs_P (per cell, already x volume).
    const std::vector<double>* time_diag;
    const std::vector<double>* time_rhs_u;
    const std::vector<double>* time_rhs_v;
    /// Eddy viscosity on the faces (turbulence models), added to nu; null for laminar flow.
    const std::vector<double>* eddy_i = nullptr;
    const std::vector<double>* eddy_j = nullptr;
    /// Body force per unit volume x volume (manufactured solutions); null where none.
    const std::vector<double>* source_u = nullptr;
    const std::vector<double>* source_v = nullptr;
};

/// Assembles `sys` for the grid `g` and its physical boundary faces.
void assemble_momentum(const FaceGeometry& g, const std::vector<BoundaryFace>& faces,
                       const MomentumInputs& in, MomentumSystem& sys);

}  // namespace veer
