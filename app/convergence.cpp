#include "app/convergence.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

#include "mesh/errors.hpp"

namespace veer {
namespace {
/// First value of a record with the nu_tilde reference (the older record starts with the step
/// count, which is never negative).
constexpr double record_with_nu_tilde = -2.0;
constexpr std::size_t legacy_head = 5;  // count, 3 references, relative
constexpr std::size_t head = 7;         // marker, count, 4 references, relative
}  // namespace

bool ConvergenceMonitor::add(const ConvergenceSample& s) {
    const double r[residual_count] = {s.residual_u, s.residual_v, s.residual_continuity,
                                      s.residual_nu_tilde};
    ++m_count;
    if (m_count <= m_criteria.reference_steps)
        for (int k = 0; k < residual_count; ++k) m_reference[k] = std::max(m_reference[k], r[k]);
    m_relative = 0.0;
    for (int k = 0; k < residual_count; ++k)
        if (m_reference[k] > 0.0) m_relative = std::max(m_relative, r[k] / m_reference[k]);
    m_cl.push_back(s.cl);
    m_cd.push_back(s.cd);
    while (static_cast<int>(m_cl.size()) > m_criteria.force_window + 1) {
        m_cl.pop_front();
        m_cd.pop_front();
    }
    if (m_count <= m_criteria.reference_steps) return false;
    return m_relative <= m_criteria.residual_drop && force_change() <= m_criteria.force_tolerance;
}

void ConvergenceMonitor::raise_references(const std::array<double, residual_count>& floor) {
    for (int k = 0; k < residual_count; ++k)
        m_reference[k] = std::max(m_reference[k], floor[static_cast<std::size_t>(k)]);
}

double ConvergenceMonitor::force_change() const {
    if (static_cast<int>(m_cl.size()) <= m_criteria.force_window)
        return std::numeric_limits<double>::infinity();
    auto spread = [](const std::deque<double>& d) {
        const auto [lo, hi] = std::minmax_element(d.begin(), d.end());
        return *hi - *lo;
    };
    return std::max(spread(m_cl), spread(m_cd));
}

std::vector<double> ConvergenceMonitor::save() const {
    std::vector<double> out = {record_with_nu_tilde,
                               static_cast<double>(m_count),
                               m_reference[0],
                               m_reference[1],
                               m_reference[2],
                               m_reference[3],
                               m_relative};
    for (std::size_t k = 0; k < m_cl.size(); ++k) {
        out.push_back(m_cl[k]);
        out.push_back(m_cd[k]);
    }
    return out;
}

void ConvergenceMonitor::load(const std::vector<double>& saved) {
    m_legacy = !saved.empty() && saved[0] != record_with_nu_tilde;
    const std::size_t start = m_legacy ? legacy_head : head;
    VEER_VERIFY(saved.size() >= start && (saved.size() - start) % 2 == 0, "bad convergence record");
    const std::size_t at = m_legacy ? 0 : 1;  // where the count is
    m_count = static_cast<long>(saved[at]);
    const int kept = m_legacy ? 3 : residual_count;
    for (int k = 0; k < residual_count; ++k)
        m_reference[k] = k < kept ? saved[at + 1 + static_cast<std::size_t>(k)] : 0.0;
    m_relative = saved[start - 1];
    m_cl.clear();
    m_cd.clear();
    for (std::size_t k = start; k < saved.size(); k += 2) {
        m_cl.push_back(saved[k]);
        m_cd.push_back(saved[k + 1]);
    }
}

}  // namespace veer
