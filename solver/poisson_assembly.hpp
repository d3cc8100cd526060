#pragma once
/// The orthogonal part of the finite-volume Laplacian of a structured block, as a PoissonStencil.
///
/// The flux of w grad(p) through face f (area vector S_f) is split as
///
///   w S_f . grad(p)_f = w |S_f|^2 / (S_f . d_f) * (p_nb - p_P)        <- this stencil
///                     + w (S_f - |S_f|^2 / (S_f . d_f) d_f) . grad(p)_f  <- non-orthogonal
///                     remainder
///
/// (the "over-relaxed" decomposition, Jasak 1996, PhD thesis, Imperial College, sec. 3.3.1.3). The
/// first part is what the pressure solvers invert; the remainder, which vanishes where d_f is
/// parallel to S_f, is the caller's deferred correction on the right-hand side. d_f runs from the
/// centroid of the cell on the -i (-j) side to the centroid on the +i (+j) side: across the C-grid
/// wake cut from the mirrored cell (ni-1-i, 0) to cell (i, 0); across a periodic side from the
/// opposite cell shifted by the period (the vector between the two boundary face centres); on a
/// boundary face between the centroid and the face centre.
#include <cstdint>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/poisson_stencil.hpp"

namespace veer {

/// Stencil of the orthogonal Laplacian (coefficients in chord^0: area^2 / (area * length), times
/// the face weight). dirichlet_i / dirichlet_j: 1 on boundary faces with a zero Dirichlet value
/// (layouts of PoissonStencil; empty means none). face_weight_i / face_weight_j (optional, same
/// layouts, > 0): a coefficient per face, e.g. an interpolated 1 / a_P or time-step factor; on a
/// periodic side face 0 and on the wake cut the mean of the two coinciding faces is used.
/// Periodic sides are taken from the grid's SegmentKind::periodic segments, the wake cut from
/// grid.c_layout(). Coefficients are stored on Neumann boundary faces too; solvers ignore them.
PoissonStencil assemble_laplacian(const StructuredGrid& grid, const GridMetrics& metrics,
                                  const std::vector<std::uint8_t>& dirichlet_i,
                                  const std::vector<std::uint8_t>& dirichlet_j,
                                  const std::vector<double>* face_weight_i = nullptr,
                                  const std::vector<double>* face_weight_j = nullptr);

}  // namespace veer
