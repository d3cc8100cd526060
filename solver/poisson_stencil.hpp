#pragma once
/// A symmetric 5-point finite-volume Laplacian on a structured block, the operator the pressure
/// solvers invert. Non-orthogonal parts of the full operator are deferred to the right-hand side.
///
///   L(p)_P = sum over faces f of P:  coef_f * (p_nb(f) - p_P)
///
/// where p_nb is the neighbour across the face: the next cell in the block, the mirrored cell
/// across the C-grid wake cut (j = 0, i < wake or i >= wake + around: neighbour (ni-1-i, 0)), the
/// cell on the opposite side of a periodic block, or, on a boundary face flagged Dirichlet, the
/// value 0 (the boundary value of a pressure increment). Boundary faces not flagged Dirichlet are
/// Neumann (no flux). Where nothing is Dirichlet, L is singular: solvers return the zero-mean
/// solution and project the right-hand side onto the range first.
#include <cstdint>
#include <optional>
#include <vector>

#include "mesh/structured_grid.hpp"

namespace veer {

struct PoissonStencil {
    int ni = 0;
    int nj = 0;
    std::vector<double> coef_i;  ///< >= 0, on i-faces, (ni+1) * nj, index fi + (ni+1) * j
    std::vector<double> coef_j;  ///< >= 0, on j-faces, ni * (nj+1), index i + ni * fj
    /// 1 on boundary faces with a Dirichlet (zero) value; same layouts as coef_i / coef_j.
    std::vector<std::uint8_t> dirichlet_i;
    std::vector<std::uint8_t> dirichlet_j;
    bool periodic_i = false;  ///< face 0 and face ni are the same face (coef_i on face 0 is used)
    bool periodic_j = false;  ///< face 0 and face nj are the same face (coef_j on face 0 is used)
    std::optional<CGridLayout> wake_cut;  ///< j = 0 faces in the wake connect i with ni-1-i

    bool has_dirichlet() const;
};

}  // namespace veer
