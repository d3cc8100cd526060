#pragma once
/// Alternating-direction line relaxation of the momentum system: coloured sweeps of tridiagonal
/// solves along j-lines (wall-normal on a C-grid, where thin wall cells couple strongly;
/// wall_normal_lines.hpp, optionally folded across the wake cut), then red-black sweeps along
/// i-lines. Couplings across the wake cut (outside a folded line) and periodic sides are taken
/// from the ghosts, refreshed between colours. Lines of one colour are independent, so the
/// result does not depend on the thread count.
#include <vector>

#include "solver/cell_field.hpp"
#include "solver/connectivity.hpp"
#include "solver/momentum_system.hpp"
#include "solver/wall_normal_lines.hpp"

namespace veer {

/// Scratch space and j-line plan of the line solves (prepared once per block).
struct LineWork : LineScratch {
    WallNormalLines j_lines;
    /// Sizes the scratch space for the block of `c` and plans its j-lines; `fold_wake_cut`
    /// joins each wake column with its mirror across the cut in one line.
    void prepare(const Connectivity& c, bool fold_wake_cut);
};

/// What a relaxation did.
struct RelaxationStats {
    int sweeps = 0;
    double initial_residual = 0.0;  ///< ||rhs - A q||_2 of both components at entry
    double final_residual = 0.0;    ///< the same at exit (computed only when rel_tol > 0)
};

/// Up to max_sweeps sweeps (j-lines then i-lines) on (u, v), which hold the initial guess; stops
/// early once the residual falls below rel_tol times its initial value (rel_tol = 0: exactly
/// max_sweeps sweeps and no residual evaluation).
RelaxationStats relax_momentum(const MomentumSystem& sys, const Connectivity& c, CellView u,
                               CellView v, int max_sweeps, double rel_tol, LineWork& work);

/// ||rhs - A q||_2 over both components (rows summed in a fixed order).
double momentum_residual(const MomentumSystem& sys, const Connectivity& c, CellView u, CellView v);

}  // namespace veer
