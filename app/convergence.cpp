#include "app/convergence.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

#include "app/geometric_tail.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {
// Records: [marker, count, references..., relative, (Cl, Cd) pairs]. The first value tells the
// layout; the oldest record starts with the step count, which is never negative.
constexpr double record_with_count = -3.0;    // marker, count, n, n references, relative
constexpr double record_with_four = -2.0;     // marker, count, 4 references, relative
constexpr std::size_t oldest_references = 3;  // count, 3 references, relative
}  // namespace

ConvergenceCriteria convergence_criteria(const RunSpec& run) {
    ConvergenceCriteria c;
    c.residual_drop = run.residual_drop;
    c.force_tolerance = run.force_tolerance;
    if (!run.settle_estimate) c.tail_block = 0;
    return c;
}

std::vector<double> step_residuals(const StepReport& step) {
    std::vector<double> r = {step.residual_u, step.residual_v, step.residual_continuity};
    r.insert(r.end(), step.model_residuals.begin(), step.model_residuals.end());
    return r;
}

bool ConvergenceMonitor::add(const ConvergenceSample& s) {
    const std::vector<double>& r = s.residuals;
    if (m_reference.size() < r.size()) m_reference.resize(r.size(), 0.0);
    ++m_count;
    if (m_count <= m_criteria.reference_steps)
        for (std::size_t k = 0; k < r.size(); ++k) m_reference[k] = std::max(m_reference[k], r[k]);
    m_relative = 0.0;
    for (std::size_t k = 0; k < r.size(); ++k)
        if (m_reference[k] > 0.0) m_relative = std::max(m_relative, r[k] / m_reference[k]);
    m_cl.push_back(s.cl);
    m_cd.push_back(s.cd);
    while (static_cast<int>(m_cl.size()) > m_criteria.force_window + 1) {
        m_cl.pop_front();
        m_cd.pop_front();
    }
    if (m_count <= m_criteria.reference_steps) return false;
    if (m_relative > m_criteria.residual_drop) return false;
    return force_change() <= m_criteria.force_tolerance || forces_settling();
}

bool ConvergenceMonitor::forces_settling() const {
    const int block = m_criteria.tail_block;
    if (block <= 0 || 3 * block > m_criteria.force_window) return false;
    const double limit = m_criteria.tail_fraction * m_criteria.force_tolerance;
    for (const std::deque<double>* d : {&m_cl, &m_cd}) {
        if (geometric_tail(*d, block, m_criteria.tail_ratio_max) > limit) return false;
        const double last_block = std::abs(d->back() - (*d)[d->size() - 1 - block]);
        if (last_block > m_criteria.force_tolerance) return false;
    }
    return true;
}

void ConvergenceMonitor::raise_references(const std::vector<double>& floor) {
    if (m_reference.size() < floor.size()) m_reference.resize(floor.size(), 0.0);
    for (std::size_t k = 0; k < floor.size(); ++k)
        m_reference[k] = std::max(m_reference[k], floor[k]);
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
    std::vector<double> out = {record_with_count, static_cast<double>(m_count),
                               static_cast<double>(m_reference.size())};
    out.insert(out.end(), m_reference.begin(), m_reference.end());
    out.push_back(m_relative);
    for (std::size_t k = 0; k < m_cl.size(); ++k) {
        out.push_back(m_cl[k]);
        out.push_back(m_cd[k]);
    }
    return out;
}

void ConvergenceMonitor::load(const std::vector<double>& saved) {
    VEER_VERIFY(!saved.empty(), "empty convergence record");
    std::size_t at = 0, references = oldest_references;  // where the count is; how many refs
    if (saved[0] == record_with_count) {
        VEER_VERIFY(saved.size() >= 3 && saved[2] >= 0.0, "bad convergence record");
        at = 1;
        references = static_cast<std::size_t>(saved[2]);
    } else if (saved[0] == record_with_four) {
        at = 1;
        references = 4;
    }
    m_legacy = at == 0;
    const std::size_t first_reference = at == 0 ? 1 : (saved[0] == record_with_count ? 3 : 2);
    const std::size_t start = first_reference + references + 1;  // first (Cl, Cd) pair
    VEER_VERIFY(saved.size() >= start && (saved.size() - start) % 2 == 0, "bad convergence record");
    m_count = static_cast<long>(saved[at]);
    m_reference.assign(saved.begin() + static_cast<std::ptrdiff_t>(first_reference),
                       saved.begin() + static_cast<std::ptrdiff_t>(first_reference + references));
    m_relative = saved[start - 1];
    m_cl.clear();
    m_cd.clear();
    for (std::size_t k = start; k < saved.size(); k += 2) {
        m_cl.push_back(saved[k]);
        m_cd.push_back(saved[k + 1]);
    }
}

}  // namespace veer
