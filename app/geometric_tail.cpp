#include "app/geometric_tail.hpp"

#include <array>
#include <cmath>
#include <cstddef>
#include <limits>

namespace veer {
namespace {
constexpr double untrusted = std::numeric_limits<double>::infinity();
/// Successive block ratios of a geometric mode are equal; those of a slow oscillation nearing
/// a turning point fall fast. Ratios further apart than this factor are not extrapolated.
constexpr double ratio_agreement = 0.8;

/// True when every step of x[first..last] moves in the direction `sign` (or not at all).
bool moves_one_way(const std::deque<double>& x, std::size_t first, std::size_t last, double sign) {
    for (std::size_t k = first + 1; k <= last; ++k)
        if ((x[k] - x[k - 1]) * sign < 0.0) return false;
    return true;
}
}  // namespace

double geometric_tail(const std::deque<double>& x, int block, double ratio_max) {
    if (block <= 0) return untrusted;
    const std::size_t b = static_cast<std::size_t>(block);
    if (x.size() < 3 * b + 1) return untrusted;
    const std::size_t last = x.size() - 1, first = last - 3 * b;
    std::array<double, 3> change{};  // over each block, oldest first
    for (std::size_t k = 0; k < 3; ++k) change[k] = x[first + (k + 1) * b] - x[first + k * b];
    const double sign = change[2] > 0.0 ? 1.0 : -1.0;
    if (!moves_one_way(x, first, last, sign)) return untrusted;
    if (change[2] == 0.0) return change[0] == 0.0 ? 0.0 : untrusted;  // (all still, or not)
    if (change[0] == 0.0 || change[1] == 0.0) return untrusted;
    const double q_earlier = change[1] / change[0], q = change[2] / change[1];
    if (q > ratio_max || q_earlier > ratio_max) return untrusted;
    if (q < ratio_agreement * q_earlier || q_earlier < ratio_agreement * q) return untrusted;
    return std::abs(change[2]) * q / (1.0 - q);
}

}  // namespace veer
