#include "app/residual_plateau.hpp"

#include <algorithm>

#include "mesh/errors.hpp"

namespace veer {

ResidualPlateau::ResidualPlateau(PlateauCriteria criteria) : m_criteria(criteria) {
    VEER_VERIFY(m_criteria.window >= 20 && m_criteria.required_drop > 1.0 &&
                    m_criteria.check_every > 0 && m_criteria.frozen_level > 0.0,
                "plateau criteria out of range");
}

bool ResidualPlateau::add(double relative_residual, double cl) {
    ++m_count;
    m_residual.push_back(relative_residual);
    m_cl.push_back(cl);
    const auto window = static_cast<std::size_t>(m_criteria.window);
    while (m_residual.size() > window) {
        m_residual.pop_front();
        m_cl.pop_front();
    }
    if (m_residual.size() < window) return false;
    if (m_count % m_criteria.check_every == 0) evaluate();
    return m_stalled;
}

void ResidualPlateau::evaluate() {
    const auto n = static_cast<std::ptrdiff_t>(m_residual.size());
    const std::ptrdiff_t tenth = std::max<std::ptrdiff_t>(1, n / 10);
    const double first = *std::min_element(m_residual.begin(), m_residual.begin() + tenth);
    const double last = *std::min_element(m_residual.end() - tenth, m_residual.end());
    m_drop = last > 0.0 ? first / last : first > 0.0 ? 1e300 : 1.0;
    const auto [lo, hi] = std::minmax_element(m_cl.begin() + n / 2, m_cl.end());
    m_lift_range = *hi - *lo;
    const bool flat = m_drop < m_criteria.required_drop;
    const bool lift_moves = m_lift_range > m_criteria.force_tolerance;
    m_frozen = flat && !lift_moves && last > m_criteria.frozen_level;
    m_stalled = (flat && lift_moves) || m_frozen;
}

}  // namespace veer
