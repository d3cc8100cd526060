#include "app/sweep_momentum_mean.hpp"

#include <algorithm>

#include "postprocess/control_volume.hpp"
#include "postprocess/time_average.hpp"

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
    return interval_mean(m_time, m_cl, begin, end);
}

}  // namespace veer
