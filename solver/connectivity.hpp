#pragma once
/// Connectivity of a block with itself: the C-grid wake cut and periodic sides.
///
/// The wake cut is not a boundary: the ghost row below j = 0 in the wake holds the mirrored
/// interior cells, ghost (i, -1 - g) = cell (ni - 1 - i, g), copied unchanged (vectors too: the cut
/// is not a symmetry plane). A periodic side holds the cells of the opposite side. After this copy
/// every stencil reads neighbours across the cut as it does in the interior.
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/cell_field.hpp"

namespace veer {

/// Which faces of the block connect to other cells of the same block.
struct Connectivity {
    int ni = 0;
    int nj = 0;
    std::vector<int> wake_cut_i;  ///< cells i on j = 0 whose -j neighbour is (ni - 1 - i, 0)
    bool periodic_i = false;      ///< i = 0 and i = ni - 1 are neighbours
    bool periodic_j = false;      ///< j = 0 and j = nj - 1 are neighbours
    Vec2 period_i;                ///< shift from the i = 0 side to the i = ni side (chords)
    Vec2 period_j;                ///< shift from the j = 0 side to the j = nj side (chords)
};

/// Reads the wake-cut and periodic segments of `grid`. Throws InternalError where a periodic side
/// is only partly periodic or the two sides do not match.
Connectivity make_connectivity(const StructuredGrid& grid, const GridMetrics& metrics);

/// Copies interior cells into the ghosts that connectivity defines (both ghost layers).
void fill_connected_ghosts(const Connectivity& c, CellView field);

}  // namespace veer
