#include "postprocess/time_average.hpp"

#include <algorithm>
#include <cmath>

#include "mesh/errors.hpp"

namespace veer {

namespace {

struct LevelBand {
    double level = 0.0, band = 0.0, spread = 0.0;
    bool steady() const { return spread < 1e-6 * std::max(1.0, std::abs(level)); }
};

/// Level and band from prefix sums of the samples [n/2, n).
LevelBand level_band(const std::vector<double>& sum, const std::vector<double>& sum_sq) {
    const std::size_t n = sum.size() - 1, h = n / 2, m = n - h;
    LevelBand r;
    if (m == 0) return r;
    r.level = (sum[n] - sum[h]) / static_cast<double>(m);
    const double var = (sum_sq[n] - sum_sq[h]) / static_cast<double>(m) - r.level * r.level;
    r.spread = std::sqrt(std::max(var, 0.0));
    r.band = 0.5 * r.spread;
    return r;
}

void prefix_sums(const std::vector<double>& s, std::vector<double>& sum,
                 std::vector<double>& sum_sq) {
    sum.assign(1, 0.0);
    sum_sq.assign(1, 0.0);
    for (double x : s) {
        sum.push_back(sum.back() + x);
        sum_sq.push_back(sum_sq.back() + x * x);
    }
}

/// Time where the line through (t0, f0), (t1, f1) reaches `level`.
double crossing_time(double t0, double f0, double t1, double f1, double level) {
    return f1 == f0 ? t1 : t0 + (t1 - t0) * (level - f0) / (f1 - f0);
}

double value_at(const std::vector<double>& t, const std::vector<double>& f, std::size_t k,
                double at) {
    const double w = (at - t[k]) / (t[k + 1] - t[k]);
    return f[k] + w * (f[k + 1] - f[k]);
}

}  // namespace

double signal_at(const std::vector<double>& t, const std::vector<double>& f, double at) {
    if (at <= t.front()) return f.front();
    if (at >= t.back()) return f.back();
    const std::size_t k =
        static_cast<std::size_t>(std::upper_bound(t.begin(), t.end(), at) - t.begin()) - 1;
    return value_at(t, f, k, at);
}

std::vector<double> upward_crossings(const std::vector<double>& time,
                                     const std::vector<double>& signal, double level, double band) {
    VEER_VERIFY(time.size() == signal.size(), "time and signal differ in length");
    std::vector<double> out;
    bool armed = false;
    for (std::size_t k = 0; k < signal.size(); ++k) {
        if (signal[k] < level - band) armed = true;
        if (armed && k > 0 && signal[k - 1] < level && signal[k] >= level) {
            out.push_back(crossing_time(time[k - 1], signal[k - 1], time[k], signal[k], level));
            armed = false;
        }
    }
    return out;
}

double window_change_rate(const std::vector<double>& t, const std::vector<double>& q,
                          const CycleWindow& w) {
    VEER_VERIFY(t.size() == q.size() && t.size() >= 2, "a change rate needs two samples");
    VEER_VERIFY(w.end > w.begin && w.begin >= t.front() && w.end <= t.back(),
                "the window must lie within the samples");
    auto at = [&](double x) {
        const auto hi = std::upper_bound(t.begin(), t.end(), x);
        const std::size_t k = std::min(static_cast<std::size_t>(hi - t.begin()), t.size() - 1) - 1;
        return value_at(t, q, k, x);
    };
    return (at(w.end) - at(w.begin)) / (w.end - w.begin);
}

std::vector<double> cycle_crossings(const std::vector<double>& time,
                                    const std::vector<double>& signal) {
    std::vector<double> sum, sum_sq;
    prefix_sums(signal, sum, sum_sq);
    const LevelBand lb = level_band(sum, sum_sq);
    if (signal.size() < 3 || lb.steady()) return {};
    return upward_crossings(time, signal, lb.level, lb.band);
}

std::optional<CycleWindow> last_whole_cycles(const std::vector<double>& time,
                                             const std::vector<double>& signal, int max_cycles) {
    VEER_VERIFY(max_cycles >= 1, "ask for at least one cycle");
    const std::vector<double> c = cycle_crossings(time, signal);
    if (c.size() < 2) return std::nullopt;
    const int n = std::min(max_cycles, static_cast<int>(c.size()) - 1);
    return CycleWindow{c[c.size() - 1 - static_cast<std::size_t>(n)], c.back(), n};
}

std::optional<double> interval_mean(const std::vector<double>& t, const std::vector<double>& f,
                                    double begin, double end) {
    VEER_VERIFY(t.size() == f.size(), "time and signal differ in length");
    if (t.size() < 2) return std::nullopt;
    const double from = std::max(begin, t.front()), to = std::min(end, t.back());
    if (!(to > from)) return std::nullopt;
    double integral = 0.0;
    // Start at the sample interval holding `from` (times increase).
    const auto first = std::upper_bound(t.begin(), t.end(), from);
    const std::size_t k0 = first == t.begin() ? 0 : static_cast<std::size_t>(first - t.begin()) - 1;
    for (std::size_t k = k0; k + 1 < t.size() && t[k] < to; ++k) {
        const double a = std::max(t[k], from), b = std::min(t[k + 1], to);
        if (b <= a) continue;
        integral += 0.5 * (b - a) * (value_at(t, f, k, a) + value_at(t, f, k, b));
    }
    return integral / (to - from);
}

double window_average(const std::vector<double>& t, const std::vector<double>& f,
                      const CycleWindow& w) {
    VEER_VERIFY(t.size() == f.size() && t.size() >= 2, "window average needs two samples");
    VEER_VERIFY(w.end > w.begin, "empty averaging window");
    const std::optional<double> mean = interval_mean(t, f, w.begin, w.end);
    VEER_VERIFY(mean.has_value(), "averaging window outside the record");
    return *mean;
}

double half_range(const std::vector<double>& t, const std::vector<double>& f, double begin,
                  double end) {
    VEER_VERIFY(t.size() == f.size() && !t.empty(), "half range needs samples");
    double lo = signal_at(t, f, begin), hi = lo;
    for (std::size_t k = 0; k < t.size(); ++k)
        if (t[k] >= begin && t[k] <= end) {
            lo = std::min(lo, f[k]);
            hi = std::max(hi, f[k]);
        }
    return 0.5 * (hi - lo);
}

}  // namespace veer
