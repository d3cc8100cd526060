#pragma once
/// How far a settling sequence (a run's Cl or Cd, one value per step) still has to go, estimated
/// from its last three blocks of steps as if it settled geometrically: a fixed-point iteration
/// whose slowest mode shrinks by `q` per block has `|limit - x_n| ~ |x_n - x_(n-b)| q / (1 - q)`.
/// The iteration error from the change between iterates and the estimated largest eigenvalue of
/// the iteration: Ferziger & Peric 2002, Computational Methods for Fluid Dynamics, 3rd ed.,
/// sec. 5.7 (memory of the section number).
#include <deque>

namespace veer {

/// Estimated |limit - last value| of `x` from its last 3 * block + 1 values; infinity when the
/// estimate cannot be trusted: too few values, the last 3 * block steps not all moving one way
/// (a turning point, an oscillation, round-off noise), a block's change not below `ratio_max`
/// times the one before, or the two block-to-block ratios not alike (a slow oscillation nearing
/// its turning point slows down faster than a geometric mode). Zero when the values have not
/// moved at all.
double geometric_tail(const std::deque<double>& x, int block, double ratio_max);

}  // namespace veer
