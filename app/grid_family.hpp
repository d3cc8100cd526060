#pragma once
/// A case's family of systematically coarsened grids, for discretisation error estimates (the
/// three-grid procedure of Celik et al. 2008, J. Fluids Eng. 130, 078001, asks a constant
/// refinement ratio of at least 1.3 applied to every grid dimension). One rule for every command
/// that needs a coarser grid of a case (the sweep's error bars; a grid study can use it too).
#include <string>
#include <vector>

#include "io/case_spec.hpp"

namespace veer {

/// Smallest refinement ratio between members (Celik et al. 2008, step 2: "r > 1.3").
constexpr double least_family_ratio = 1.3;

/// The `--set` items that turn `fine`'s grid into the member `level` steps coarser: every cell
/// count (around, normal, wake) divided by ratio^level and rounded (around to an even number),
/// the first-cell height multiplied by ratio^level (through y_plus when the case sets its first
/// cell by y+, which scales it linearly), the far field kept. Level 0: no items. Throws
/// InputError naming the count and the ratio when a member would fall below the reader's
/// minimum or the ratio is below least_family_ratio.
std::vector<std::string> coarser_grid_overrides(const CaseSpec& fine, double ratio, int level);

}  // namespace veer
