#include "app/sweep_momentum_mean.hpp"

#include <algorithm>

#include "postprocess/control_volume.hpp"

namespace veer {

MomentumLiftSampler::MomentumLiftSampler(const StructuredGrid& grid,
                                         const std::vector<double>& distances, long every)
    : m_every(std::max(1L, every)) {
    if (distances.empty() || !grid.c_layout()) return;
    const double largest = *std::max_element(distances.begin(), distances.end());
    const std::vector<GridContour> c = contours_at_distances(grid, {largest});
    if (!c.empty()) m_contour = c.front();
}

void MomentumLiftSampler::after_step(const Simulation& sim, long step, double time) {
    if (!m_contour || step % m_every != 0) return;
    const ContourForces f = contour_forces(sim.grid(), sim.metrics(), sim.solver().fields(),
                                           sim.spec().flow, *m_contour);
    add(time, f.cl.total);
}

void MomentumLiftSampler::add(double time, double cl) {
    m_time.push_back(time);
    m_cl.push_back(cl);
}

std::optional<double> MomentumLiftSampler::mean(double begin, double end) const {
    double area = 0.0, span = 0.0;
    for (std::size_t k = 1; k < m_time.size(); ++k) {
        const double a = std::max(m_time[k - 1], begin), b = std::min(m_time[k], end);
        if (b <= a) continue;
        // The linear interpolant between the two samples, integrated over [a, b].
        const double slope = (m_cl[k] - m_cl[k - 1]) / (m_time[k] - m_time[k - 1]);
        const double at_a = m_cl[k - 1] + slope * (a - m_time[k - 1]);
        const double at_b = m_cl[k - 1] + slope * (b - m_time[k - 1]);
        area += 0.5 * (at_a + at_b) * (b - a);
        span += b - a;
    }
    if (span <= 0.0) return std::nullopt;
    return area / span;
}

}  // namespace veer
