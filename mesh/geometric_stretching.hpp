#pragma once
/// Geometric progressions of step lengths: the wall-normal and wake-cut stretching of the C-grid.
#include <vector>

namespace veer {

/// The ratio r > 0 for which `cells` steps first, first*r, first*r^2, ... add up to `length`
/// (same units as `first`). r > 1 when first * cells < length. Solved by bisection on log r to
/// a relative error of about 1e-15.
double geometric_ratio(double first, double length, int cells);

/// The `cells` step lengths first * r^k, k = 0 .. cells-1, of that progression (their sum equals
/// `length` to the accuracy of the ratio).
std::vector<double> geometric_steps(double first, double length, int cells);

}  // namespace veer
