#include <algorithm>
#include <cmath>

#include "mesh/errors.hpp"
#include "postprocess/time_average.hpp"

namespace veer {

CycleAverager::CycleAverager(int keep_cycles) : m_keep(keep_cycles), m_sum{0.0}, m_sum_sq{0.0} {
    VEER_VERIFY(keep_cycles >= 1, "keep at least one cycle");
}

void CycleAverager::start_cycle(double at) {
    if (m_cycle_begin) {
        m_cycles.push_back({*m_cycle_begin, at, m_current});
        if (static_cast<int>(m_cycles.size()) > m_keep) m_cycles.pop_front();
    }
    m_cycle_begin = at;
    m_current = FieldMean();
}

void CycleAverager::add(double time, double dt, double cl, const FlowFields& fields) {
    VEER_VERIFY(dt > 0.0, "time steps must be positive");
    m_time.push_back(time);
    m_signal.push_back(cl);
    m_signal_sq.push_back(cl * cl);
    m_sum.push_back(m_sum.back() + cl);
    m_sum_sq.push_back(m_sum_sq.back() + cl * cl);
    const std::size_t n = m_signal.size();
    double level = 0.0, spread = 0.0;
    level_and_spread(level, spread);
    const bool steady = spread < 1e-6 * std::max(1.0, std::abs(level));
    if (!steady && cl < level - 0.5 * spread) m_armed = true;
    const bool crossing = !steady && m_armed && n >= 2 && m_signal[n - 2] < level && cl >= level;
    if (!crossing) {
        m_current.add(fields, dt);
        return;
    }
    m_armed = false;
    const double t0 = m_time[n - 2], f0 = m_signal[n - 2];
    const double at = cl == f0 ? time : t0 + (time - t0) * (level - f0) / (cl - f0);
    // The step's fields stand for (time - dt, time]: split them at the crossing.
    const double before = std::clamp(at - (time - dt), 0.0, dt);
    m_current.add(fields, before);
    start_cycle(at);
    m_current.add(fields, dt - before);
    m_crossings.push_back(at);
    if (static_cast<int>(m_crossings.size()) > m_keep + 1) m_crossings.pop_front();
    update_level();
}

void CycleAverager::update_level() {
    if (m_crossings.size() < 2) return;
    const CycleWindow w{m_crossings.front(), m_crossings.back(),
                        static_cast<int>(m_crossings.size()) - 1};
    const double level = window_average(m_time, m_signal, w);
    m_level = level;
    m_spread = std::sqrt(std::max(window_average(m_time, m_signal_sq, w) - level * level, 0.0));
}

void CycleAverager::level_and_spread(double& level, double& spread) const {
    if (m_level && m_spread) {
        level = *m_level;
        spread = *m_spread;
        return;
    }
    const std::size_t n = m_signal.size(), first = n / 2;
    const double m = static_cast<double>(n - first);
    level = (m_sum[n] - m_sum[first]) / m;
    spread = std::sqrt(std::max((m_sum_sq[n] - m_sum_sq[first]) / m - level * level, 0.0));
}

std::optional<CycleWindow> CycleAverager::window(int n) const {
    if (m_cycles.empty() || n < 1) return std::nullopt;
    const int k = std::min(n, completed_cycles());
    return CycleWindow{m_cycles[m_cycles.size() - static_cast<std::size_t>(k)].begin,
                       m_cycles.back().end, k};
}

FlowFields CycleAverager::mean_of_last(int n) const {
    VEER_VERIFY(!m_cycles.empty() && n >= 1, "no whole cycle to average over yet");
    const int k = std::min(n, completed_cycles());
    FieldMean total;
    for (std::size_t c = m_cycles.size() - static_cast<std::size_t>(k); c < m_cycles.size(); ++c)
        total.add(m_cycles[c].fields);
    return total.mean();
}

}  // namespace veer
