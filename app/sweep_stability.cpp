#include "app/sweep_stability.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

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

namespace {

/// sqrt(2) times the root mean square of q about its least-squares line over samples [a, b).
double oscillation(const std::vector<double>& t, const std::vector<double>& q, std::size_t a,
                   std::size_t b) {
    if (b < a + 3) return 0.0;
    const double n = static_cast<double>(b - a);
    double st = 0.0, sq = 0.0;
    for (std::size_t k = a; k < b; ++k) st += t[k], sq += q[k];
    const double mt = st / n, mq = sq / n;
    double stt = 0.0, stq = 0.0;
    for (std::size_t k = a; k < b; ++k) {
        stt += (t[k] - mt) * (t[k] - mt);
        stq += (t[k] - mt) * (q[k] - mq);
    }
    const double slope = stt > 0.0 ? stq / stt : 0.0;
    double ss = 0.0;
    for (std::size_t k = a; k < b; ++k) {
        const double r = q[k] - mq - slope * (t[k] - mt);
        ss += r * r;
    }
    return std::sqrt(2.0 * ss / n);
}

}  // namespace

StabilityVerdict judge_disturbance(const ForceRecord& history, double cl_steady,
                                   double still_moving) {
    StabilityVerdict v;
    const std::vector<double>& t = history.time;
    if (t.size() < 16) return v;
    const double t0 = t.front(), span = t.back() - t0;
    auto at = [&](double fraction) {  // first sample at or after the fraction of the span
        return static_cast<std::size_t>(std::lower_bound(t.begin(), t.end(), t0 + fraction * span) -
                                        t.begin());
    };
    const std::size_t q1 = at(0.25), q2 = at(0.5), q3 = at(0.75), end = t.size();
    v.early = oscillation(t, history.cl, q1, q2);
    v.late = oscillation(t, history.cl, q3, end);
    double mean = 0.0;
    for (std::size_t k = q3; k < end; ++k) mean += history.cl[k] / static_cast<double>(end - q3);
    v.offset = mean - cl_steady;
    // Below round-off-sized oscillations a "growth" is noise, not a mode.
    constexpr double noise_floor = 1e-7;
    if (v.late <= noise_floor) {
        v.ratio = v.early > 0.0 ? v.late / v.early : 0.0;
        return v;  // kept
    }
    v.ratio = v.early > 0.0 ? v.late / v.early : std::numeric_limits<double>::infinity();
    v.unstable = v.ratio > 1.0 + stability_margin;
    const bool decayed = v.ratio < 1.0 / (1.0 + stability_margin) && v.late < still_moving;
    v.decided = v.unstable || decayed;
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
        if (m_judge_at <= 0.0) m_judge_at = m_check_time;
        // The check time, allowing for the round-off of a sum of steps.
        if (elapsed >= m_judge_at * (1.0 - 1e-9)) {
            m_verdict = judge_disturbance(m_until_check, m_cl_steady);
            const bool last_chance = m_judge_at >= 4.0 * m_check_time * (1.0 - 1e-9);
            if (m_verdict.decided || last_chance) {
                m_judged = true;
                m_until_check = {};
                if (!m_verdict.unstable && m_verdict.decided) {
                    m_outcome = Outcome::kept;
                    return true;
                }
                m_verdict.unstable = true;  // grew, or still undecided: it runs on as unsteady
            } else {
                m_judge_at *= 2.0;
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
