#include "io/plot_ticks.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>

namespace veer {

AxisTicks nice_ticks(double lo, double hi, int target) {
    if (!std::isfinite(lo) || !std::isfinite(hi)) lo = 0.0, hi = 1.0;
    if (lo > hi) std::swap(lo, hi);
    if (hi - lo <= 1e-12 * std::max(1.0, std::abs(lo))) {
        const double half = lo == 0.0 ? 0.5 : 0.05 * std::abs(lo);
        lo -= half;
        hi += half;
    }
    const double raw = (hi - lo) / std::max(target, 2);
    const double decade = std::pow(10.0, std::floor(std::log10(raw)));
    double step = decade * 10.0;
    for (double m : {1.0, 2.0, 2.5, 5.0, 10.0})
        if (m * decade >= raw) {
            step = m * decade;
            break;
        }
    AxisTicks t;
    t.step = step;
    t.lo = std::floor(lo / step + 1e-9) * step;
    t.hi = std::ceil(hi / step - 1e-9) * step;
    const long n = std::lround((t.hi - t.lo) / step);
    for (long k = 0; k <= n; ++k) {
        const double v = t.lo + static_cast<double>(k) * step;
        t.values.push_back(std::abs(v) < 1e-9 * step ? 0.0 : v);
    }
    return t;
}

AxisTicks decade_ticks(double lo, double hi) {
    if (!(lo > 0.0) || !std::isfinite(lo)) lo = 1e-12;
    if (!(hi > lo) || !std::isfinite(hi)) hi = lo * 10.0;
    AxisTicks t;
    const double k0 = std::floor(std::log10(lo) + 1e-9), k1 = std::ceil(std::log10(hi) - 1e-9);
    t.lo = std::pow(10.0, k0);
    t.hi = std::pow(10.0, std::max(k1, k0 + 1));
    t.step = 1.0;  // one decade
    const int every = std::max(1, static_cast<int>(std::ceil((k1 - k0) / 8.0)));
    for (double k = k0; k <= std::max(k1, k0 + 1) + 1e-9; k += every)
        t.values.push_back(std::pow(10.0, k));
    return t;
}

std::string tick_label(double value, double step) {
    if (value == 0.0) return "0";
    const double mag = std::abs(value);
    if (mag >= 1e5 || mag < 1e-3) return fmt::format("{:.0e}", value);
    const int decimals = std::clamp(static_cast<int>(-std::floor(std::log10(step) + 1e-9)), 0, 6);
    std::string s = fmt::format("{:.{}f}", value, decimals + 1);
    // One decimal more than the step needs (for 2.5 steps), then trailing zeros trimmed.
    if (s.find('.') != std::string::npos) {
        s.erase(s.find_last_not_of('0') + 1);
        if (s.back() == '.') s.pop_back();
    }
    return s == "-0" ? "0" : s;
}

}  // namespace veer
