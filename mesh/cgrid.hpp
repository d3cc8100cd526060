#pragma once
/// The C-grid around a section: wake cut and surface on j = 0, layers marched out to the far field.
#include <vector>

#include "mesh/cgrid_spec.hpp"
#include "mesh/errors.hpp"
#include "mesh/normal_marching.hpp"
#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// The layers of a C-grid folded: where, and how far from the wall (its message names where
/// and the generic remedies; fold_diagnosis.hpp explains it from the outline).
class GridFoldError : public InputError {
public:
    GridFoldError(const std::string& message, MarchOutcome fold_at, double reached)
        : InputError(message), fold(fold_at), distance(reached) {}
    MarchOutcome fold;
    double distance = 0.0;  ///< distance of the folded layer's outer edge from the wall, chords
};

/// The C-grid of `spec.around` x `spec.normal` surface cells plus `spec.wake` wake cells each side
/// (ni = 2 * wake + around, nj = normal), chord units. `surface` holds around + 1 nodes from the
/// trailing edge along the lower surface to the leading edge (node around / 2) and back (first ==
/// last), as sample_surface gives them.
///
/// j = 0: nodes 0 .. wake are the lower wake cut from the outlet x = TE.x + far_field to the
/// trailing edge, wake .. wake + around the given surface nodes, the rest the upper wake cut (node
/// i and node ni - i coincide exactly for i <= wake). Every j line has the steps first_cell * r^j,
/// r = normal_growth_ratio(spec), so its length is far_field. Segments: j_min "wake_cut_lower",
/// "wall", "wake_cut_upper"; i_min "outflow_lower"; i_max "outflow_upper"; j_max "far_field".
/// Throws InputError for a spec value out of range (naming the key), GridFoldError when the
/// layers would fold (naming where, and what to change), InputError when a face would not lie
/// between its two cell centres (face_order.hpp; naming where, and what to change).
StructuredGrid generate_cgrid(const std::vector<Vec2>& surface, const CGridSpec& spec);

/// The wall-normal growth ratio r with first_cell * (1 + r + ... + r^(normal-1)) = far_field.
double normal_growth_ratio(const CGridSpec& spec);

/// The fewest wall-normal cells that reach `far_field` (chords) from `first_cell` (chords) with a
/// growth ratio no larger than `max_growth`.
int normal_cells_for_growth(double first_cell, double far_field, double max_growth);

/// Throws InputError naming the key of the first value of `spec` out of its allowed range.
void validate_cgrid_spec(const CGridSpec& spec);

/// Throws InputError unless `surface` holds around + 1 nodes whose first and last coincide.
void check_wall_nodes(const std::vector<Vec2>& surface, int around);

}  // namespace veer
