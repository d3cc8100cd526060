#pragma once
/// Coarse levels of the pressure multigrid: 2 x 2 agglomeration of cells, with the coarse face
/// coefficients rediscretised from the fine ones (no geometry needed, so only the stencil is used).
///
/// A face coefficient is a conductance (flux per unit jump of p). The coarse face between coarse
/// cells A and B is crossed by two fine columns (rows); along each, the path from the middle of A
/// to the middle of B runs through half of the fine face inside A, the fine face on the coarse
/// face, and half of the fine face inside B, in series:
///
///   1 / c_path = 0.5 / c_inside_A + 1 / c_on_face + 0.5 / c_inside_B,  c_coarse = sum of c_path.
///
/// On a uniform grid this reproduces the rediscretised coefficient exactly (the Galerkin product
/// with piecewise-constant transfers would double it); on stretched grids it follows the series
/// length of the coarse centroid distance. Across the wake cut the path continues into the mirrored
/// column, across periodic sides it wraps, and on a Dirichlet face it ends at the face (1 / c_face
/// + 0.5 / c_inside). The wake cut stays on coarse faces because wake and around are even.
#include "solver/poisson_stencil.hpp"

namespace veer {

/// Whether the stencil can be coarsened once more: ni, nj (and wake, around) even, and the
/// coarse level keeps at least 2 cells each way (2 along the section).
bool can_coarsen(const PoissonStencil& fine);

/// Number of levels (>= 1) the stencil allows, at most max_levels when max_levels > 0. Coarsening
/// stops early once a level has no more than `coarsest_cells` cells (it is solved directly).
int multigrid_level_count(const PoissonStencil& fine, int max_levels, int coarsest_cells);

/// The coarse stencil (ni/2 x nj/2 cells) of a stencil for which can_coarsen holds.
PoissonStencil coarsen_stencil(const PoissonStencil& fine);

}  // namespace veer
