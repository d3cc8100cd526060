#include "app/polar_figures.hpp"

#include <algorithm>
#include <cmath>
#include <numeric>

namespace veer {
namespace {

constexpr double linear_tolerance = 0.02;  // fit residual / largest |cl| of the range

struct Fit {
    double slope = 0.0, intercept = 0.0;
    bool within = false;
};

Fit fit_line(const std::vector<double>& a, const std::vector<double>& c, std::size_t lo,
             std::size_t hi) {
    const double n = static_cast<double>(hi - lo + 1);
    double sa = 0, sc = 0, saa = 0, sac = 0, scale = 0;
    for (std::size_t k = lo; k <= hi; ++k) {
        sa += a[k], sc += c[k], saa += a[k] * a[k], sac += a[k] * c[k];
        scale = std::max(scale, std::abs(c[k]));
    }
    Fit f;
    const double det = n * saa - sa * sa;
    if (det <= 0.0) return f;
    f.slope = (n * sac - sa * sc) / det;
    f.intercept = (sc - f.slope * sa) / n;
    f.within = true;
    for (std::size_t k = lo; k <= hi; ++k)
        if (std::abs(c[k] - (f.slope * a[k] + f.intercept)) > linear_tolerance * scale)
            f.within = false;
    return f;
}

}  // namespace

std::optional<LinearRange> linear_lift_range(std::vector<double> alpha, std::vector<double> cl) {
    if (alpha.size() < 2 || alpha.size() != cl.size()) return std::nullopt;
    std::vector<std::size_t> order(alpha.size());
    std::iota(order.begin(), order.end(), 0);
    std::sort(order.begin(), order.end(), [&](auto x, auto y) { return alpha[x] < alpha[y]; });
    std::vector<double> a, c;
    for (std::size_t k : order) a.push_back(alpha[k]), c.push_back(cl[k]);
    std::size_t lo = 0;
    for (std::size_t k = 1; k < a.size(); ++k)
        if (std::abs(a[k]) < std::abs(a[lo])) lo = k;
    std::size_t hi = lo;
    for (;;) {
        std::vector<std::pair<std::size_t, std::size_t>> tries;  // (lo, hi) candidates
        const bool can_down = lo > 0, can_up = hi + 1 < a.size();
        if (can_down && can_up && std::abs(a[lo - 1]) <= std::abs(a[hi + 1]))
            tries = {{lo - 1, hi}, {lo, hi + 1}};
        else if (can_down && can_up)
            tries = {{lo, hi + 1}, {lo - 1, hi}};
        else if (can_down)
            tries = {{lo - 1, hi}};
        else if (can_up)
            tries = {{lo, hi + 1}};
        bool grown = false;
        for (auto [l, h] : tries)
            if (fit_line(a, c, l, h).within) {
                lo = l, hi = h, grown = true;
                break;
            }
        if (!grown) break;
    }
    if (hi == lo) return std::nullopt;
    const Fit f = fit_line(a, c, lo, hi);
    return LinearRange{f.slope, f.intercept, a[lo], a[hi], static_cast<int>(hi - lo + 1)};
}

PolarFigures polar_figures(const std::vector<PointRecord>& points) {
    std::vector<PointRecord> p;
    for (const PointRecord& r : points)
        if (r.regime != "failed" && std::isfinite(r.cl)) p.push_back(r);
    std::sort(p.begin(), p.end(), [](const auto& x, const auto& y) { return x.alpha < y.alpha; });
    PolarFigures f;
    std::vector<double> a, c;
    for (const PointRecord& r : p)
        if (r.regime == "steady") a.push_back(r.alpha), c.push_back(r.cl);
    f.linear = linear_lift_range(a, c);
    if (f.linear && f.linear->slope_per_deg != 0.0)
        f.alpha_zero_lift = -f.linear->intercept / f.linear->slope_per_deg;
    for (std::size_t k = 0; k < p.size(); ++k) {
        if (!f.cl_max || p[k].cl > *f.cl_max) f.cl_max = p[k].cl, f.alpha_cl_max = p[k].alpha;
        if (std::isfinite(p[k].cd) && (!f.cd_min || p[k].cd < *f.cd_min))
            f.cd_min = p[k].cd, f.alpha_cd_min = p[k].alpha;
        if (!f.alpha_separation_onset && upper_surface_separated(p[k]))
            f.alpha_separation_onset = p[k].alpha;
        if (p[k].cl_momentum) {
            const double d = std::abs(p[k].cl - *p[k].cl_momentum);
            if (!f.max_lift_disagreement || d > *f.max_lift_disagreement)
                f.max_lift_disagreement = d;
        }
    }
    std::vector<PolarSample> samples;
    for (const PointRecord& r : p) {
        if (f.alpha_cl_max && r.alpha > *f.alpha_cl_max && r.cl < *f.cl_max)
            f.stall_in_range = true;
        samples.push_back({r.alpha, r.cl});
    }
    f.stall = stall_bracket(samples);
    return f;
}

}  // namespace veer
