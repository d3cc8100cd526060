#pragma once
/// Wall-outward marching of C-grid layers with exact step lengths along every j line.
///
/// Each layer j+1 is reached from layer j by one step of the prescribed length s_j along a
/// direction per node. The direction starts as the layer normal (central differences) and is
/// smoothed along i by an implicit dissipation that grows with (s_j / local i spacing)^2, as in
/// hyperbolic grid generation (Steger & Chaussee 1980, SIAM J. Sci. Stat. Comput. 1(4), 431-437
/// (memory), where dissipation keeps lines from crossing in concave corners). The provisional
/// layer is then re-spaced along itself: squeezed spacings are shared with their neighbours
/// (diffusion of log spacing), and far from the wall clusters fan out (more diffusion on the
/// surface part, a pull of the wake spacing towards the surface spacing at the trailing edge),
/// no node leaning more than 20 degrees per step. The direction to the re-spaced node, times s_j,
/// gives the node: the step lengths stay exact. The first layer follows the wall normal exactly.
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
    double spread = 20.0;
    /// Fraction per layer (at the far field; (j / nj)^2 from 0 at the wall) by which the wake
    /// spacing is drawn towards a geometric one matching the surface spacing at the trailing edge.
    double wake_pull = 0.3;
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
