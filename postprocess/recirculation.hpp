#pragma once
/// Length of the region of reversed flow behind a bluff section, on the line the grid leaves
/// behind its rear point: the seam of an O-grid (i = 0, between cells ni - 1 and 0), which for
/// the circle in a flow along +x is the wake centreline.
///
///   rear point   u < 0 (reversed)   u = 0          u > 0
///   ----o==================================x----------------->  x
///        <------------- L ----------------->
///
/// The streamwise velocity on each seam face is the mean of the two cells it joins; L runs from
/// the rear point to the first face-to-face change from u < 0 to u >= 0, interpolated linearly
/// in distance. Compared with the recirculation length L/D of the steady cylinder wake
/// (Coutanceau & Bouard 1977, Dennis & Chang 1970; tests/reference/cylinder_re40_steady.csv).
#include <optional>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// L in reference lengths (diameters for the circle): 0 when the flow next to the rear point
/// already runs downstream; nullopt when the reversed flow reaches the outer boundary (no end
/// in the grid). Needs an O-grid.
std::optional<double> recirculation_length(const StructuredGrid& grid, const GridMetrics& metrics,
                                           const FlowFields& fields);

}  // namespace veer
