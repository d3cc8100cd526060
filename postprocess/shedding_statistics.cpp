#include <algorithm>
#include <cmath>
#include <sstream>

#include "mesh/errors.hpp"
#include "postprocess/time_average.hpp"

namespace veer {

namespace {

/// Sample indices k with t[k] in [begin, end].
std::pair<std::size_t, std::size_t> sample_range(const std::vector<double>& t, double begin,
                                                 double end) {
    const auto a = std::lower_bound(t.begin(), t.end(), begin);
    const auto b = std::upper_bound(t.begin(), t.end(), end);
    return {static_cast<std::size_t>(a - t.begin()), static_cast<std::size_t>(b - t.begin())};
}

/// Half the peak-to-peak range and the largest |q - centre| of the samples in [begin, end].
struct Excursion {
    double half_range = 0.0;
    double peak = 0.0;
};

Excursion excursion(const std::vector<double>& t, const std::vector<double>& q, double begin,
                    double end, double centre) {
    const auto [a, b] = sample_range(t, begin, end);
    if (a >= b) return {};
    const auto [lo, hi] =
        std::minmax_element(q.begin() + static_cast<long>(a), q.begin() + static_cast<long>(b));
    return {0.5 * (*hi - *lo), std::max(*hi - centre, centre - *lo)};
}

/// One cycle's own figures, in the order of SheddingStatistics.
struct OneCycle {
    double strouhal, cl_mean, cd_mean, cm_mean, cl_rms, cl_peak, cl_amplitude, cd_amplitude;
};

struct Histories {
    const std::vector<double>&time, &cl, &cd, &cm;
    std::vector<double> cl_sq;  ///< (Cl - window mean)^2
};

OneCycle cycle_figures(const Histories& h, const CycleWindow& w, double cl_centre) {
    OneCycle c{};
    c.strouhal = 1.0 / w.period();
    c.cl_mean = window_average(h.time, h.cl, w);
    c.cd_mean = window_average(h.time, h.cd, w);
    c.cm_mean = window_average(h.time, h.cm, w);
    c.cl_rms = std::sqrt(window_average(h.time, h.cl_sq, w));
    const Excursion l = excursion(h.time, h.cl, w.begin, w.end, cl_centre);
    c.cl_peak = l.peak;
    c.cl_amplitude = l.half_range;
    c.cd_amplitude = excursion(h.time, h.cd, w.begin, w.end, c.cd_mean).half_range;
    return c;
}

/// The window figure of one member and its largest per-cycle deviation.
CycleFigure spread_of(const std::vector<OneCycle>& cycles, double OneCycle::*member,
                      double window_value) {
    CycleFigure f{window_value, 0.0};
    for (const OneCycle& c : cycles)
        f.spread = std::max(f.spread, std::abs(c.*member - window_value));
    return f;
}

/// Why the cycles do not count as periodic ("" when they do).
std::string periodicity(const SheddingStatistics& s, const std::vector<OneCycle>& cycles,
                        const PeriodicityTolerance& tol) {
    std::ostringstream why;
    why.precision(2);
    if (s.cycles < tol.min_cycles) {
        why << "only " << s.cycles << " whole cycle" << (s.cycles == 1 ? "" : "s")
            << " of the lift (at least " << tol.min_cycles << " are needed)";
        return why.str();
    }
    const double period_spread = s.strouhal.spread / s.strouhal.value;
    if (period_spread > tol.period) {
        why << "the period varies by " << 100 * period_spread << " % from cycle to cycle over the "
            << "last " << s.cycles << " cycles (at most " << 100 * tol.period
            << " % in a periodic state)";
        return why.str();
    }
    const double amplitude = s.cl_amplitude.value;
    if (amplitude > 0.0 && s.cl_amplitude.spread / amplitude > tol.amplitude) {
        const double change =
            (cycles.back().cl_amplitude - cycles.front().cl_amplitude) / amplitude;
        why << "the lift amplitude " << (change >= 0 ? "grows" : "falls") << " by "
            << 100 * std::abs(change) << " % from the first to the last of the " << s.cycles
            << " cycles (at most " << 100 * tol.amplitude
            << " % between cycles in a periodic state)";
        return why.str();
    }
    return "";
}

}  // namespace

std::optional<SheddingStatistics> shedding_statistics(const std::vector<double>& time,
                                                      const std::vector<double>& cl,
                                                      const std::vector<double>& cd,
                                                      const std::vector<double>& cm, int max_cycles,
                                                      const PeriodicityTolerance& tolerance) {
    VEER_VERIFY(max_cycles >= 1, "ask for at least one cycle");
    VEER_VERIFY(cl.size() == time.size() && cd.size() == time.size() && cm.size() == time.size(),
                "force histories of different lengths");
    const std::vector<double> crossings = cycle_crossings(time, cl);
    if (crossings.size() < 2) return std::nullopt;
    const int n = std::min(max_cycles, static_cast<int>(crossings.size()) - 1);
    const std::size_t first = crossings.size() - 1 - static_cast<std::size_t>(n);
    SheddingStatistics s;
    s.cycles = n;
    s.window = {crossings[first], crossings.back(), n};
    Histories h{time, cl, cd, cm, {}};
    const double centre = window_average(time, cl, s.window);
    h.cl_sq.reserve(cl.size());
    for (double x : cl) h.cl_sq.push_back((x - centre) * (x - centre));
    const OneCycle whole = cycle_figures(h, s.window, centre);
    std::vector<OneCycle> cycles;
    for (std::size_t k = first; k + 1 < crossings.size(); ++k)
        cycles.push_back(cycle_figures(h, {crossings[k], crossings[k + 1], 1}, centre));
    s.strouhal = spread_of(cycles, &OneCycle::strouhal, whole.strouhal);
    s.cl_mean = spread_of(cycles, &OneCycle::cl_mean, whole.cl_mean);
    s.cd_mean = spread_of(cycles, &OneCycle::cd_mean, whole.cd_mean);
    s.cm_mean = spread_of(cycles, &OneCycle::cm_mean, whole.cm_mean);
    s.cl_rms = spread_of(cycles, &OneCycle::cl_rms, whole.cl_rms);
    s.cl_peak = spread_of(cycles, &OneCycle::cl_peak, whole.cl_peak);
    s.cl_amplitude = spread_of(cycles, &OneCycle::cl_amplitude, whole.cl_amplitude);
    s.cd_amplitude = spread_of(cycles, &OneCycle::cd_amplitude, whole.cd_amplitude);
    s.not_periodic = periodicity(s, cycles, tolerance);
    s.periodic = s.not_periodic.empty();
    return s;
}

}  // namespace veer
