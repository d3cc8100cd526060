#pragma once
/// The O-grid around a closed smooth convex section (the circle): the C-grid's body block closed
/// on itself, periodic in i, with the C-grid's wall-normal spacing rule.
///
///            j = nj  (far field, "far_field")
///        +-----------------------------------+
///        |             _______               |
///        |           /         \             |
///        |   front  |  section  | rear  =====|  i = 0 / i = ni: the seam behind the rear
///        |           \ _______ /             |  point ("seam_lower" on i_min, "seam_upper"
///        |                                   |  on i_max, periodic: cell i = -1 is ni - 1)
///        +-----------------------------------+
///   j = 0 is the wall, i running clockwise from the rear point over the lower half to the front
///   point (i = around / 2) and back over the upper half; +j points into the fluid.
///
/// The layout is CGridLayout{wake = 0, around = ni}: the wall faces are i in [0, ni) as on a
/// C-grid without its wake, and nothing in the grid is a wake cut.
#include <vector>

#include "mesh/cgrid_spec.hpp"
#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// An O-grid of `spec.around` x `spec.normal` cells (spec.wake is not used). `surface` holds
/// around + 1 wall nodes, first == last (circle_surface). Node (i, j) lies on the straight line
/// from wall node i along the normal to its central chord, at the distance first_cell (1 + r +
/// ... + r^(j-1)), r = normal_growth_ratio(spec): the first cell is exactly first_cell high and
/// every j line reaches far_field, with the growth ratio r everywhere. On a convex section the
/// lines fan out and never cross; a folded cell (a concave section) throws InputError naming it.
/// Segments: j_min "wall"; i_min "seam_lower" and i_max "seam_upper" (periodic); j_max
/// "far_field". Throws InputError for a spec value out of range, naming the key.
StructuredGrid generate_ogrid(const std::vector<Vec2>& surface, const CGridSpec& spec);

}  // namespace veer
