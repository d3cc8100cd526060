#include "app/sweep_stability.hpp"

#include <algorithm>
#include <cmath>

#include "mesh/errors.hpp"

namespace veer {

FlowFields disturbed(const FlowFields& fields, const GridMetrics& metrics,
                     const WakeDisturbance& d) {
    VEER_VERIFY(fields.v.size() == metrics.centroid.size(), "fields and metrics differ in size");
    FlowFields out = fields;
    for (std::size_t k = 0; k < out.v.size(); ++k) {
        const double dx = metrics.centroid[k].x - d.centre_x;
        const double dy = metrics.centroid[k].y - d.centre_y;
        out.v[k] += d.amplitude * std::exp(-(dx * dx + dy * dy) / (d.radius * d.radius));
    }
    return out;
}

StabilityVerdict judge_disturbance(const ForceRecord& history, double cl_steady,
                                   double still_moving) {
    StabilityVerdict v;
    if (history.time.size() < 4) return v;
    const double t0 = history.time.front();
    const double span = history.time.back() - t0;
    for (std::size_t k = 0; k < history.time.size(); ++k) {
        const double s = (history.time[k] - t0) / span;
        const double deviation = std::abs(history.cl[k] - cl_steady);
        if (s >= 0.25 && s <= 0.5) v.early = std::max(v.early, deviation);
        if (s >= 0.75) v.late = std::max(v.late, deviation);
    }
    // Below round-off-sized deviations a "growth" is noise, not a mode.
    constexpr double noise_floor = 1e-7;
    v.unstable = (v.late > v.early && v.late > noise_floor) || v.late > still_moving;
    return v;
}

}  // namespace veer
