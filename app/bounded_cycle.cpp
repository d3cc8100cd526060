#include "app/bounded_cycle.hpp"

#include <algorithm>
#include <cmath>

#include "mesh/errors.hpp"

namespace veer {

namespace {

struct Spread {
    double mean = 0.0, lo = 0.0, hi = 0.0;
};

Spread spread(const std::vector<double>& x, std::size_t from) {
    Spread s;
    s.lo = s.hi = x[from];
    double sum = 0.0;
    for (std::size_t k = from; k < x.size(); ++k) {
        sum += x[k];
        s.lo = std::min(s.lo, x[k]);
        s.hi = std::max(s.hi, x[k]);
    }
    s.mean = sum / static_cast<double>(x.size() - from);
    return s;
}

/// Upward crossings of the mean, with a hysteresis of a quarter of the half band so that
/// round-off flicker about the mean does not count as cycles.
int upward_crossings(const std::vector<double>& x, std::size_t from, const Spread& s) {
    const double h = 0.25 * 0.5 * (s.hi - s.lo);
    int crossings = 0;
    bool below = x[from] < s.mean;
    for (std::size_t k = from + 1; k < x.size(); ++k) {
        if (below && x[k] > s.mean + h) {
            ++crossings;
            below = false;
        } else if (!below && x[k] < s.mean - h) {
            below = true;
        }
    }
    return crossings;
}

}  // namespace

std::optional<BoundedCycle> bounded_cycle(const std::vector<double>& cl,
                                          const std::vector<double>& cd,
                                          const std::vector<double>& cm,
                                          const BoundedCycleCriteria& criteria) {
    VEER_VERIFY(cl.size() == cd.size() && cl.size() == cm.size(),
                "force histories of different lengths");
    if (criteria.window < 2 || cl.size() < static_cast<std::size_t>(criteria.window))
        return std::nullopt;
    const std::size_t from = cl.size() - static_cast<std::size_t>(criteria.window);
    const Spread l = spread(cl, from), d = spread(cd, from), m = spread(cm, from);
    const double cl_scale = std::max(std::abs(l.mean), criteria.cl_floor);
    if (l.hi - l.lo > criteria.cl_fraction * cl_scale) return std::nullopt;
    if (d.hi - d.lo > criteria.cd_fraction * std::abs(d.mean)) return std::nullopt;
    const int cycles = upward_crossings(cl, from, l);
    if (cycles < criteria.min_cycles) return std::nullopt;
    BoundedCycle b;
    b.cl = l.mean;
    b.cd = d.mean;
    b.cm = m.mean;
    b.cl_half_band = 0.5 * (l.hi - l.lo);
    b.cd_half_band = 0.5 * (d.hi - d.lo);
    b.cm_half_band = 0.5 * (m.hi - m.lo);
    b.cycles = cycles;
    b.iterations = criteria.window;
    return b;
}

}  // namespace veer
