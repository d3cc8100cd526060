#include "app/sweep_unsteady_stats.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

#include "mesh/errors.hpp"

namespace veer {
namespace {

/// Linear interpolation of a sampled signal at t (clamped to the record).
double sample_at(const std::vector<double>& time, const std::vector<double>& s, double t) {
    if (t <= time.front()) return s.front();
    if (t >= time.back()) return s.back();
    const auto hi = std::upper_bound(time.begin(), time.end(), t);
    const std::size_t k = static_cast<std::size_t>(hi - time.begin());
    const double w = (t - time[k - 1]) / (time[k] - time[k - 1]);
    return (1 - w) * s[k - 1] + w * s[k];
}

/// Trapezoidal mean over [a, b], ends interpolated.
double mean_over(const std::vector<double>& time, const std::vector<double>& s, double a,
                 double b) {
    double sum = 0.0, t0 = a, s0 = sample_at(time, s, a);
    for (std::size_t k = 0; k < time.size(); ++k) {
        if (time[k] <= a) continue;
        const double t1 = std::min(time[k], b);
        const double s1 = time[k] <= b ? s[k] : sample_at(time, s, b);
        sum += 0.5 * (s0 + s1) * (t1 - t0);
        t0 = t1;
        s0 = s1;
        if (time[k] >= b) break;
    }
    return b > a ? sum / (b - a) : s0;
}

double half_range_over(const std::vector<double>& time, const std::vector<double>& s, double a,
                       double b) {
    double lo = sample_at(time, s, a), hi = lo;
    for (std::size_t k = 0; k < time.size(); ++k)
        if (time[k] >= a && time[k] <= b) {
            lo = std::min(lo, s[k]);
            hi = std::max(hi, s[k]);
        }
    return 0.5 * (hi - lo);
}

/// |sum_n w_n x_n exp(-2 pi i f t_n)| on the uniform samples.
double dft_magnitude(const std::vector<double>& x, double dt, double f) {
    double re = 0.0, im = 0.0;
    for (std::size_t n = 0; n < x.size(); ++n) {
        const double phase = 2.0 * std::numbers::pi * f * dt * static_cast<double>(n);
        re += x[n] * std::cos(phase);
        im -= x[n] * std::sin(phase);
    }
    return std::hypot(re, im);
}

}  // namespace

std::vector<double> upward_level_crossings(const std::vector<double>& time,
                                           const std::vector<double>& signal, double level,
                                           double band) {
    std::vector<double> crossings;
    bool armed = !signal.empty() && signal.front() < level - band;
    for (std::size_t k = 1; k < signal.size(); ++k) {
        if (signal[k] < level - band) armed = true;
        if (armed && signal[k - 1] < level && signal[k] >= level) {
            const double w = (level - signal[k - 1]) / (signal[k] - signal[k - 1]);
            crossings.push_back(time[k - 1] + w * (time[k] - time[k - 1]));
            armed = false;
        }
    }
    return crossings;
}

std::optional<double> dominant_frequency(const std::vector<double>& time,
                                         const std::vector<double>& signal, double begin,
                                         double end) {
    const auto in_window =
        std::count_if(time.begin(), time.end(), [&](double t) { return t >= begin && t <= end; });
    if (in_window < 8 || end <= begin) return std::nullopt;
    // As many uniform samples as the record has in the window (no new information is made up).
    const std::size_t n = static_cast<std::size_t>(std::clamp<long>(in_window, 64, 4096));
    const double dt = (end - begin) / static_cast<double>(n);
    std::vector<double> x(n);
    for (std::size_t k = 0; k < n; ++k)
        x[k] = sample_at(time, signal, begin + (static_cast<double>(k) + 0.5) * dt);
    double mean = 0.0;
    for (double v : x) mean += v / static_cast<double>(n);
    double spread = 0.0;
    for (std::size_t k = 0; k < n; ++k) {
        const double hann =
            0.5 - 0.5 * std::cos(2.0 * std::numbers::pi * (static_cast<double>(k) + 0.5) /
                                 static_cast<double>(n));
        x[k] = (x[k] - mean) * hann;
        spread = std::max(spread, std::abs(x[k]));
    }
    if (spread <= 1e-14 * std::max(1.0, std::abs(mean))) return std::nullopt;
    const double df = 1.0 / (end - begin);
    std::size_t best = 1;
    double best_mag = 0.0;
    for (std::size_t k = 1; k <= n / 2; ++k) {
        const double m = dft_magnitude(x, dt, static_cast<double>(k) * df);
        if (m > best_mag) {
            best_mag = m;
            best = k;
        }
    }
    // Golden-section search for the maximum of |X(f)| between the neighbouring bins.
    double a = (static_cast<double>(best) - 1.0) * df, b = (static_cast<double>(best) + 1.0) * df;
    const double g = 0.5 * (std::sqrt(5.0) - 1.0);
    double c = b - g * (b - a), d = a + g * (b - a);
    double fc = dft_magnitude(x, dt, c), fd = dft_magnitude(x, dt, d);
    for (int it = 0; it < 60 && b - a > 1e-9 * df; ++it) {
        if (fc > fd) {
            b = d, d = c, fd = fc, c = b - g * (b - a), fc = dft_magnitude(x, dt, c);
        } else {
            a = c, c = d, fc = fd, d = a + g * (b - a), fd = dft_magnitude(x, dt, d);
        }
    }
    return 0.5 * (a + b);
}

UnsteadyStats unsteady_stats(const ForceRecord& r) {
    VEER_VERIFY(r.time.size() >= 4 && r.cl.size() == r.time.size() &&
                    r.cd.size() == r.time.size() && r.cm.size() == r.time.size(),
                "a force record needs at least 4 samples of t, cl, cd, cm");
    UnsteadyStats s;
    const double half = 0.5 * (r.time.front() + r.time.back());
    const double level = mean_over(r.time, r.cl, half, r.time.back());
    double var = 0.0;
    int count = 0;
    for (std::size_t k = 0; k < r.time.size(); ++k)
        if (r.time[k] >= half) {
            var += (r.cl[k] - level) * (r.cl[k] - level);
            ++count;
        }
    const double std_dev = std::sqrt(var / std::max(count, 1));
    std::vector<double> up;
    if (std_dev > 1e-9 * std::max(1.0, std::abs(level))) {
        for (double t : upward_level_crossings(r.time, r.cl, level, 0.5 * std_dev))
            if (t >= half) up.push_back(t);
    }
    s.periodic = up.size() >= 2;
    s.window_begin = s.periodic ? up.front() : half;
    s.window_end = s.periodic ? up.back() : r.time.back();
    s.cycles = s.periodic ? static_cast<int>(up.size()) - 1 : 0;
    s.cl_mean = mean_over(r.time, r.cl, s.window_begin, s.window_end);
    s.cd_mean = mean_over(r.time, r.cd, s.window_begin, s.window_end);
    s.cm_mean = mean_over(r.time, r.cm, s.window_begin, s.window_end);
    s.cl_amplitude = half_range_over(r.time, r.cl, s.window_begin, s.window_end);
    s.cd_amplitude = half_range_over(r.time, r.cd, s.window_begin, s.window_end);
    s.cm_amplitude = half_range_over(r.time, r.cm, s.window_begin, s.window_end);
    if (s.periodic) s.strouhal = dominant_frequency(r.time, r.cl, s.window_begin, s.window_end);
    return s;
}

}  // namespace veer
