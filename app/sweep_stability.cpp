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

TimeAccurateWatch::TimeAccurateWatch(double check_time, double cl_steady, double settle_after,
                                     double settle_window, double settle_range)
    : m_check_time(check_time),
      m_cl_steady(cl_steady),
      m_settle_after(settle_after),
      m_settle_window(settle_window),
      m_settle_range(settle_range) {}

bool TimeAccurateWatch::add(double time, double cl, double cd) {
    if (!m_started) {
        m_start = time;
        m_started = true;
    }
    const double elapsed = time - m_start;
    if (m_check_time > 0 && !m_judged) {
        m_until_check.time.push_back(time);
        m_until_check.cl.push_back(cl);
        m_until_check.cd.push_back(cd);
        m_until_check.cm.push_back(0.0);
        if (elapsed >= m_check_time) {
            m_judged = true;
            m_verdict = judge_disturbance(m_until_check, m_cl_steady);
            m_until_check = {};
            if (!m_verdict.unstable) {
                m_outcome = Outcome::kept;
                return true;
            }
        }
    }
    m_time.push_back(time);
    m_cl.push_back(cl);
    m_cd.push_back(cd);
    while (m_time.size() > 2 && m_time.back() - m_time[1] >= m_settle_window) {
        m_time.pop_front();
        m_cl.pop_front();
        m_cd.pop_front();
    }
    // A run the check found unstable goes to its end time: its mode may still be small.
    if (m_check_time <= 0 && elapsed >= m_settle_after && settled()) {
        m_outcome = Outcome::settled;
        return true;
    }
    return false;
}

bool TimeAccurateWatch::settled() const {
    if (m_time.back() - m_time.front() < m_settle_window) return false;
    const auto [cl_lo, cl_hi] = std::minmax_element(m_cl.begin(), m_cl.end());
    const auto [cd_lo, cd_hi] = std::minmax_element(m_cd.begin(), m_cd.end());
    return *cl_hi - *cl_lo < m_settle_range && *cd_hi - *cd_lo < m_settle_range;
}

}  // namespace veer
