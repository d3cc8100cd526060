#pragma once
/// Opens the wall-normal spacing of a C-grid over its wake cut.
///
/// The marching gives every i line the same wall-normal steps, so without this the cells on the
/// wake centreline keep the wall's first-cell height (y+ ~ 1, 5e-6 chords at Re 6e6) all the
/// way to the outlet, with streamwise widths of chords: aspect ratios near 1e6, whose viscous
/// pseudo-time steps are so small that steady turbulent runs stall on them. There is no wall in
/// the wake to resolve, so the first cell is let grow with the streamwise cell width.
#include "mesh/structured_grid.hpp"

namespace veer {

/// Re-places the nodes j = 1 .. nj - 1 of every wake-cut i line (i < wake and its mirror
/// ni - i) along that line's own polyline, so that its first step is
/// max(first_cell, streamwise spacing / max_aspect) and the steps grow geometrically to the far
/// field (which stays where it is). Lines whose first step stays first_cell are left untouched,
/// so the grid round the section and its trailing edge is unchanged; the two sides of the cut
/// get the same steps, so the cells across it match.
void open_wake_spacing(StructuredGrid& grid, int wake, double first_cell, double max_aspect);

}  // namespace veer
