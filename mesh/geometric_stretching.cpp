#include "mesh/geometric_stretching.hpp"

#include <cmath>

#include "mesh/errors.hpp"

namespace veer {
namespace {

/// Sum of `cells` terms of the progression with first term 1 and ratio exp(log_ratio).
double progression_sum(double log_ratio, int cells) {
    if (std::abs(log_ratio) < 1e-12) return static_cast<double>(cells);
    // (r^n - 1) / (r - 1) written with expm1 so it stays accurate near r = 1.
    return std::expm1(log_ratio * cells) / std::expm1(log_ratio);
}

}  // namespace

double geometric_ratio(double first, double length, int cells) {
    VEER_VERIFY(first > 0.0 && length > 0.0 && cells > 0, "geometric_ratio needs positive inputs");
    const double target = length / first;
    if (cells == 1) return 1.0;
    // The sum grows monotonically with log r; bracket the root and bisect.
    double lo = -1.0, hi = 1.0;
    while (progression_sum(lo, cells) > target) lo *= 2.0;
    while (progression_sum(hi, cells) < target) hi *= 2.0;
    for (int it = 0; it < 200 && hi - lo > 1e-16; ++it) {
        const double mid = 0.5 * (lo + hi);
        (progression_sum(mid, cells) < target ? lo : hi) = mid;
    }
    return std::exp(0.5 * (lo + hi));
}

std::vector<double> geometric_steps(double first, double length, int cells) {
    const double ratio = geometric_ratio(first, length, cells);
    std::vector<double> steps(static_cast<std::size_t>(cells));
    double step = first;
    for (auto& s : steps) {
        s = step;
        step *= ratio;
    }
    return steps;
}

}  // namespace veer
