#include "app/stall_search.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>

namespace veer {
namespace {

constexpr double angle_limit = 90.0;  // degrees: the extension never goes past it
constexpr double same_angle = 0.005;  // degrees: folders keep 0.01 degree

bool was_attempted(const std::vector<double>& attempted, double alpha) {
    return std::any_of(attempted.begin(), attempted.end(),
                       [&](double a) { return std::abs(a - alpha) < same_angle; });
}

double to_folder_resolution(double alpha) { return std::round(alpha * 100.0) / 100.0; }

std::size_t index_of_max(const std::vector<PolarSample>& s) {
    std::size_t m = 0;
    for (std::size_t k = 1; k < s.size(); ++k)
        if (s[k].cl > s[m].cl) m = k;
    return m;
}

std::vector<PolarSample> sorted(std::vector<PolarSample> s) {
    std::sort(s.begin(), s.end(), [](const auto& x, const auto& y) { return x.alpha < y.alpha; });
    return s;
}

/// One step beyond the attempted angles on the side `up` (or down), within the cap.
StallSearchStep extend(const std::vector<double>& attempted, const StallSearchRule& rule, bool up) {
    std::vector<double> req = rule.requested;
    std::sort(req.begin(), req.end());
    const double step =
        req.size() >= 2 ? (up ? req[req.size() - 1] - req[req.size() - 2] : req[1] - req[0]) : 0.0;
    const double edge = up ? *std::max_element(attempted.begin(), attempted.end())
                           : *std::min_element(attempted.begin(), attempted.end());
    const double next = to_folder_resolution(up ? edge + step : edge - step);
    const double limit =
        up ? req.back() + rule.extra_steps * step : req.front() - rule.extra_steps * step;
    const bool within = step > 0.0 &&
                        (up ? next <= limit + same_angle : next >= limit - same_angle) &&
                        std::abs(next) <= angle_limit;
    if (!within)
        return {StallSearchState::capped,
                {},
                fmt::format("Cl still {} at {:g} deg: the cap of {} steps of {:g} deg beyond the "
                            "requested angles stopped the search",
                            up ? "rising" : "falling", edge, rule.extra_steps, step)};
    return {StallSearchState::searching,
            {next},
            up ? "stall search beyond the requested angles"
               : "stall search below the requested angles"};
}

/// The middle of the gap from Cl max at `top` to its neighbour at `side`; when that angle was
/// tried before (and failed), the middle of the gap to it, and so on; none once the candidate
/// lies within half the resolution of `top`.
std::optional<double> untried_middle(double top, double side, const std::vector<double>& attempted,
                                     const StallSearchRule& rule) {
    double middle = to_folder_resolution(0.5 * (top + side));
    while (was_attempted(attempted, middle)) {
        middle = to_folder_resolution(0.5 * (top + middle));
        if (std::abs(middle - top) < 0.5 * rule.resolution - same_angle) return std::nullopt;
    }
    return middle;
}

}  // namespace

StallSearchStep next_stall_search_step(const std::vector<PolarSample>& samples,
                                       const std::vector<double>& attempted,
                                       const StallSearchRule& rule) {
    if (samples.size() < 2 || rule.requested.size() < 2)
        return {StallSearchState::too_few, {}, "fewer than two angles: no stall search"};
    const std::vector<PolarSample> s = sorted(samples);
    const std::size_t m = index_of_max(s);
    if (m + 1 == s.size() || m == 0) {
        StallSearchStep step = extend(attempted, rule, m + 1 == s.size());
        if (step.state == StallSearchState::searching && was_attempted(attempted, step.angles[0]))
            return {StallSearchState::no_new_angle,
                    {},
                    fmt::format("{:g} deg failed before: stall not bracketed", step.angles[0])};
        return step;
    }
    StallSearchStep step{StallSearchState::searching, {}, "stall refinement around Cl max"};
    for (std::size_t n : {m - 1, m + 1}) {
        if (std::abs(s[n].alpha - s[m].alpha) <= rule.resolution + same_angle) continue;
        if (const auto middle = untried_middle(s[m].alpha, s[n].alpha, attempted, rule))
            step.angles.push_back(*middle);
    }
    if (!step.angles.empty()) return step;
    const bool fine = std::abs(s[m - 1].alpha - s[m].alpha) <= rule.resolution + same_angle &&
                      std::abs(s[m + 1].alpha - s[m].alpha) <= rule.resolution + same_angle;
    if (fine) return {StallSearchState::bracketed, {}, "stall bracketed"};
    return {StallSearchState::no_new_angle,
            {},
            "a refinement angle failed before: stall bracketed more coarsely than asked"};
}

std::optional<StallBracket> stall_bracket(std::vector<PolarSample> samples) {
    if (samples.empty()) return std::nullopt;
    const std::vector<PolarSample> s = sorted(std::move(samples));
    const std::size_t m = index_of_max(s);
    StallBracket b;
    b.alpha_cl_max = s[m].alpha;
    b.cl_max = s[m].cl;
    b.bracketed = m > 0 && m + 1 < s.size() && s[m + 1].cl < s[m].cl;
    if (!b.bracketed) return b;
    const PolarSample& l = s[m - 1];
    const PolarSample& r = s[m + 1];
    b.alpha_uncertainty = std::max(s[m].alpha - l.alpha, r.alpha - s[m].alpha);
    // The parabola through (l, m, r): its second divided difference is negative here (m is the
    // largest of the three and r lower), so it has a peak; its height above Cl max.
    const double d_left = (s[m].cl - l.cl) / (s[m].alpha - l.alpha);
    const double d_right = (r.cl - s[m].cl) / (r.alpha - s[m].alpha);
    const double curvature = (d_right - d_left) / (r.alpha - l.alpha);  // cl = c a^2 + ...
    const double slope_at_m = d_left + curvature * (s[m].alpha - l.alpha);
    b.cl_uncertainty = curvature < 0.0 ? -slope_at_m * slope_at_m / (4.0 * curvature) : 0.0;
    return b;
}

std::string stall_search_words(StallSearchState state) {
    switch (state) {
        case StallSearchState::searching:
            return "searching";
        case StallSearchState::bracketed:
            return "bracketed";
        case StallSearchState::capped:
            return "stopped by its cap, not bracketed";
        case StallSearchState::no_new_angle:
            return "stopped by a failed angle";
        case StallSearchState::too_few:
            return "not searched (fewer than two angles)";
    }
    return "unknown";
}

}  // namespace veer
