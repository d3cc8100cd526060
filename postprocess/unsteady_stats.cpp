// The statistics of a force history (postprocess/time_average.hpp): whole cycles of the lift in
// the second half of the record, means and half ranges over them, the lift's spectral peak.
#include <algorithm>
#include <cmath>
#include <numbers>

#include "mesh/errors.hpp"
#include "postprocess/time_average.hpp"

namespace veer {
namespace {

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

/// interval_mean, or the value at `begin` of a window of no length.
double mean_of(const std::vector<double>& t, const std::vector<double>& f, double begin,
               double end) {
    return interval_mean(t, f, begin, end).value_or(signal_at(t, f, begin));
}

}  // namespace

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
        x[k] = signal_at(time, signal, begin + (static_cast<double>(k) + 0.5) * dt);
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
    const double level = mean_of(r.time, r.cl, half, r.time.back());
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
        for (double t : upward_crossings(r.time, r.cl, level, 0.5 * std_dev))
            if (t >= half) up.push_back(t);
    }
    s.periodic = up.size() >= 2;
    s.window_begin = s.periodic ? up.front() : half;
    s.window_end = s.periodic ? up.back() : r.time.back();
    s.cycles = s.periodic ? static_cast<int>(up.size()) - 1 : 0;
    s.cl_mean = mean_of(r.time, r.cl, s.window_begin, s.window_end);
    s.cd_mean = mean_of(r.time, r.cd, s.window_begin, s.window_end);
    s.cm_mean = mean_of(r.time, r.cm, s.window_begin, s.window_end);
    s.cl_amplitude = half_range(r.time, r.cl, s.window_begin, s.window_end);
    s.cd_amplitude = half_range(r.time, r.cd, s.window_begin, s.window_end);
    s.cm_amplitude = half_range(r.time, r.cm, s.window_begin, s.window_end);
    if (s.periodic) s.strouhal = dominant_frequency(r.time, r.cl, s.window_begin, s.window_end);
    return s;
}

}  // namespace veer
