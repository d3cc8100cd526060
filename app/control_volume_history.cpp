#include "app/control_volume_history.hpp"

#include <algorithm>

#include "postprocess/control_volume.hpp"
#include "postprocess/free_stream.hpp"

namespace veer {

ControlVolumeHistory::ControlVolumeHistory(const StructuredGrid& grid,
                                           const std::vector<double>& distances, long every)
    : m_every(std::max(1L, every)) {
    if (!grid.c_layout()) return;
    for (const GridContour& c : contours_at_distances(grid, distances))
        m_series.push_back({c, {}, {}, {}, {}});
}

void ControlVolumeHistory::after_step(const Simulation& sim, long step, double time) {
    if (m_series.empty() || step % m_every != 0) return;
    const FlowFields f = sim.solver().fields();
    m_time.push_back(time);
    for (Series& s : m_series) {
        // Without previous fields the route leaves out its rate-of-change term: the contour
        // terms alone.
        const Vec2 terms =
            contour_forces(sim.grid(), sim.metrics(), f, sim.spec().flow, s.contour).force;
        const Vec2 inside = contour_momentum(sim.metrics(), sim.grid(), f, s.contour);
        s.force_x.push_back(terms.x);
        s.force_y.push_back(terms.y);
        s.momentum_x.push_back(inside.x);
        s.momentum_y.push_back(inside.y);
    }
}

std::optional<std::vector<RouteMean>> ControlVolumeHistory::means(const CycleWindow& w,
                                                                  double alpha_deg) const {
    if (m_series.empty() || m_time.size() < 2 || m_time.front() > w.begin || m_time.back() < w.end)
        return std::nullopt;
    std::vector<RouteMean> out;
    for (const Series& s : m_series) {
        const Vec2 terms{window_average(m_time, s.force_x, w),
                         window_average(m_time, s.force_y, w)};
        const Vec2 rate{window_change_rate(m_time, s.momentum_x, w),
                        window_change_rate(m_time, s.momentum_y, w)};
        const Vec2 force = terms - rate;
        const double scale = 1.0 / free_stream_dynamic_pressure;  // reference length 1
        out.push_back({s.contour, scale * dot(force, lift_direction(alpha_deg)),
                       scale * dot(force, drag_direction(alpha_deg))});
    }
    return out;
}

}  // namespace veer
