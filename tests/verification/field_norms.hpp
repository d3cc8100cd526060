#pragma once
/// Volume-weighted error norms of cell fields against analytic functions.
#include <cmath>
#include <functional>
#include <vector>

#include "mesh/grid_metrics.hpp"

namespace veer::test {

/// sqrt(sum V (q - exact(x_c))^2 / sum V); with remove_mean, both are compared about their
/// volume-weighted means (pressure known up to a constant).
inline double l2_error(const GridMetrics& m, const std::vector<double>& q,
                       const std::function<double(Vec2)>& exact, bool remove_mean = false) {
    double vol = 0.0, mean_q = 0.0, mean_e = 0.0;
    for (std::size_t k = 0; k < q.size(); ++k) {
        vol += m.volume[k];
        mean_q += m.volume[k] * q[k];
        mean_e += m.volume[k] * exact(m.centroid[k]);
    }
    if (!remove_mean) mean_q = mean_e = 0.0;
    double sum = 0.0;
    for (std::size_t k = 0; k < q.size(); ++k) {
        const double d = (q[k] - mean_q / vol) - (exact(m.centroid[k]) - mean_e / vol);
        sum += m.volume[k] * d * d;
    }
    return std::sqrt(sum / vol);
}

/// Observed order between two grids refined by `ratio`.
inline double observed_order(double coarse_error, double fine_error, double ratio = 2.0) {
    return std::log(coarse_error / fine_error) / std::log(ratio);
}

}  // namespace veer::test
