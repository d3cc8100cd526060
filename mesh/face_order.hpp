#pragma once
/// Whether every face of a C-grid lies between the centroids of its two cells, in the order of
/// the face's normal: the flow solver's face geometry needs it (solver/face_geometry.cpp). A
/// grid can have positive cell areas everywhere and still fail it where neighbouring cells are
/// thin and sheared: NACA 0012 at 1536 x 112 cells with 64 wake cells (first cell 4.5e-6, far
/// field 100) fails at the far field behind the section; with 96 wake cells it does not.
#include <optional>

#include "mesh/grid_metrics.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// A face whose neighbouring centroids are not on its two sides in the order of its normal.
struct BackwardFace {
    bool i_face =
        false;  ///< between cells (i - 1, j) and (i, j); else between (i, j - 1) and (i, j)
    int i = 0;
    int j = 0;
    Vec2 where;  ///< the face's midpoint, chords
};

/// The first backward face between two cells of the block, or nothing. (The faces across a C-grid's
/// wake cut join the first, nearly straight layers on either side; the solver still verifies them.)
std::optional<BackwardFace> find_backward_face(const GridMetrics& m);

}  // namespace veer
