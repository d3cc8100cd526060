#pragma once
/// Axis ranges and tick positions for veer's pictures: ticks at 1, 2 or 5 times a power of ten,
/// a range widened to whole ticks, and tick labels without trailing zeros.
#include <string>
#include <vector>

namespace veer {

/// An axis: its range and the tick values inside it (increasing).
struct AxisTicks {
    double lo = 0.0, hi = 1.0;
    double step = 0.2;
    std::vector<double> values;
};

/// About `target` ticks covering [lo, hi] (in any order); the range is widened to whole steps.
/// An empty or non-finite range becomes one of width 1 (or 10 % of |lo|) about it.
AxisTicks nice_ticks(double lo, double hi, int target = 6);

/// Decades covering [lo, hi] (lo, hi > 0) for a logarithmic axis: ticks at 10^k.
AxisTicks decade_ticks(double lo, double hi);

/// The label of a tick value of an axis with this step: "0", "0.25", "-4", "1e-06".
std::string tick_label(double value, double step);

}  // namespace veer
