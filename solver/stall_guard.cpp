#include "solver/stall_guard.hpp"

#include <algorithm>
#include <cstddef>

#include "mesh/errors.hpp"

namespace veer {

bool StallGuard::stalled_after(const std::vector<double>& residuals) {
    if (m_stalled) return true;
    if (m_reference.empty()) m_reference.assign(residuals.size(), 0.0);
    VEER_VERIFY(m_reference.size() == residuals.size(), "the stall guard's equations changed");
    ++m_count;
    double measure = 0.0;
    for (std::size_t k = 0; k < residuals.size(); ++k) {
        if (m_count <= m_rule.reference_steps)
            m_reference[k] = std::max(m_reference[k], residuals[k]);
        if (m_reference[k] > 0.0) measure = std::max(measure, residuals[k] / m_reference[k]);
    }
    if (m_count <= m_rule.reference_steps) {
        m_mark = measure;
        m_mark_step = m_count;
        return false;
    }
    if (measure <= m_rule.progress_factor * m_mark || measure < m_rule.converged_floor) {
        m_mark = measure;
        m_mark_step = m_count;
        return false;
    }
    m_stalled = m_count - m_mark_step > m_rule.patience;
    return m_stalled;
}

std::vector<double> StallGuard::save() const {
    std::vector<double> out = {static_cast<double>(m_count), m_mark,
                               static_cast<double>(m_mark_step), m_stalled ? 1.0 : 0.0};
    out.insert(out.end(), m_reference.begin(), m_reference.end());
    return out;
}

void StallGuard::load(const std::vector<double>& saved) {
    *this = StallGuard(m_rule);
    if (saved.empty()) return;
    VEER_VERIFY(saved.size() >= 4, "bad stall guard record");
    m_count = static_cast<long>(saved[0]);
    m_mark = saved[1];
    m_mark_step = static_cast<long>(saved[2]);
    m_stalled = saved[3] != 0.0;
    m_reference.assign(saved.begin() + 4, saved.end());
}

}  // namespace veer
