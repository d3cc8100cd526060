#pragma once
/// Wall-outward marching of C-grid layers with exact step lengths along every j line.
///
/// Each layer j+1 is reached from layer j by one step of the prescribed length s_j along a
/// direction per node: the layer normal (central differences), smoothed along i by a dissipation
/// that grows with s_j / (local i spacing) as in hyperbolic grid generation (Steger & Chaussee
/// 1980, SIAM J. Sci. Stat. Comput. 1(4), 431-437, where the same dissipation keeps lines from
/// crossing in concave corners), then bent towards an even i spacing far from the wall. The first
/// layer follows the wall normal exactly.
#include <vector>

#include "mesh/structured_grid.hpp"

namespace veer {

/// Where the surface lies on j = 0 and how long each wall-normal step is.
struct MarchPlan {
    int wake = 0;               ///< wake-cut cells each side
    int around = 0;             ///< surface cells
    std::vector<double> steps;  ///< s_j, j = 0 .. nj-1 (chords)
    /// How strongly clusters of i lines fan out far from the wall (diffusion of log spacing per
    /// layer at the far field, in nodes squared; grows as (j / nj)^2 from 0 at the wall).
    double spread = 4.0;
};

/// The first cell that came out with non-positive area, if any.
struct MarchOutcome {
    bool folded = false;
    int i = 0;  ///< cell index of the fold
    int j = 0;
    Vec2 where;  ///< its first node (chords)
};

/// Fills nodes j = 1 .. nj of `grid` from its j = 0 nodes; stops at the first folded layer.
/// Every operation is symmetric in i about the leading-edge node, so a mirror-symmetric wall line
/// gives a mirror-symmetric grid to the last bit.
MarchOutcome march_layers(StructuredGrid& grid, const MarchPlan& plan);

}  // namespace veer
