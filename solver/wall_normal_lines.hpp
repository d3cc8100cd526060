#pragma once
/// The wall-normal (j) lines of the momentum and model line relaxation (line_relaxation.hpp),
/// grouped for solving: which cells form a line, which lines may be relaxed at the same time, and
/// the tridiagonal solve of a group of lines side by side.
///
/// A line is a column i, (i, 0) .. (i, nj-1). With the wake cut folded, a wake column i and its
/// mirror m = ni-1-i form one line of 2 nj cells, down one side and up the other:
///
///     (i, nj-1) ... (i, 0) | (m, 0) ... (m, nj-1)        (| = the wake cut)
///
/// so the coupling through the thin cells on both sides of the cut is inside the tridiagonal
/// solve instead of being taken from the other side's last values (the pressure multigrid's
/// lines do the same, multigrid_lines.hpp). Lines are coloured so that no two lines of one colour
/// touch as interior neighbours (couplings through ghosts, which are refreshed between colours,
/// may join lines of one colour): two colours, or three on a folded C-grid, whose section columns
/// and last folded line form a cycle of odd length (around + 1 lines).
#include <vector>

#include "solver/cell_field.hpp"
#include "solver/connectivity.hpp"
#include "solver/momentum_system.hpp"

namespace veer {

/// Lines relaxed side by side: columns (the first column of each line) and whether they fold.
struct LineChunk {
    std::vector<int> columns;
    bool folded = false;
};

/// The j-lines of a block, by colour.
struct WallNormalLines {
    std::vector<std::vector<LineChunk>> colours;
};

/// The lines of the block `c` describes; `fold_wake_cut` joins each wake column with its mirror.
WallNormalLines plan_wall_normal_lines(const Connectivity& c, bool fold_wake_cut);

/// Thomas scratch space, one value per cell (ni * nj, i fastest).
struct LineScratch {
    std::vector<double> c_prime, d_u, d_v;
};

/// Solves the lines of `chunk` for (u, v) of `s`, neighbours off the lines from the current
/// values and ghosts.
void relax_line_chunk(const MomentumSystem& s, const Connectivity& con, const LineChunk& chunk,
                      CellView u, CellView v, LineScratch& w);

}  // namespace veer
