#pragma once
/// Measures of a C- or O-grid that decide whether a flow solver can use it.
#include <string>
#include <vector>

#include "mesh/cgrid_spec.hpp"
#include "mesh/structured_grid.hpp"

namespace veer {

/// Figures of a grid with a wall on j = 0 (lengths in chords, angles in degrees).
struct GridQuality {
    int ni = 0;                  ///< cells along i
    int nj = 0;                  ///< cells along j
    int cell_count = 0;          ///< ni * nj
    double min_cell_area = 0.0;  ///< smallest cell area (Jacobian), chords^2; > 0 for a valid grid
    /// Worst angle between the first j-line segment at a wall node and the normal to the central
    /// chord node(i+1, 0) - node(i-1, 0), over wall nodes other than the trailing-edge nodes.
    double wall_non_orthogonality = 0.0;
    /// The same angle at the two trailing-edge nodes (a corner: measured against the chord from
    /// the first wake node to the first surface node); 0 on an O-grid, whose rear point is an
    /// ordinary wall node counted above.
    double trailing_edge_non_orthogonality = 0.0;
    double max_aspect_ratio = 0.0;  ///< longest over shortest mean edge of a cell, worst cell
    double max_growth_ratio = 0.0;  ///< largest ratio of consecutive steps along a j line
    double first_cell_min = 0.0;    ///< height node(i,1) - node(i,0) over the wall nodes
    double first_cell_median = 0.0;
    double first_cell_max = 0.0;
    double far_field_distance = 0.0;    ///< nearest far-field node (j = nj) to a wall node
    std::vector<std::string> warnings;  ///< one sentence each, naming what to change
};

/// Quality of `grid` (it needs c_layout: a C-grid or an O-grid). A warning is recorded when the
/// growth ratio exceeds `max_growth` (with the number of normal cells that would keep the cap), or
/// when a cell area is not positive.
GridQuality assess_quality(const StructuredGrid& grid, double max_growth = CGridSpec{}.max_growth);

}  // namespace veer
