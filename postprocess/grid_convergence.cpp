#include "postprocess/grid_convergence.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <limits>
#include <stdexcept>

namespace veer {
namespace {

constexpr double kSafetyReasonable = 1.25;  // Roache 2011, three grids
constexpr double kSafetyConservative = 3.0;
/// Changes at or below this (absolute, per unit of the figure's largest magnitude or of 1,
/// whichever is larger) are below any error a run can resolve, not discretisation error: a
/// symmetric section's Cl at zero incidence came out as -1.7e-10, 2.8e-12 and -3.5e-9 on the
/// three grids of the headline benchmark, which read as "oscillatory" with a relative index of
/// 1000 %. A converged run's forces are iterated to about 1e-6 (README, "Grid studies": tighter
/// tolerances moved Cl by 1e-6), so a level ten times lower is still far below anything a
/// converged run can tell apart. Our choice.
constexpr double kIterationFloor = 1e-7;

/// Celik et al. 2008 step 3: fixed point of p = |ln|e32/e21| + q(p)| / ln r21.
double observed_order(double r21, double r32, double e21, double e32) {
    const double s = (e32 / e21) >= 0.0 ? 1.0 : -1.0;
    const double log_ratio = std::log(std::abs(e32 / e21));
    double p = std::abs(log_ratio) / std::log(r21);
    for (int it = 0; it < 200; ++it) {
        // A p of 0 with s = 1 makes q 0/0; its limit ln(ln r21 / ln r32) is used instead.
        const double q = p > 1e-12 ? std::log((std::pow(r21, p) - s) / (std::pow(r32, p) - s))
                                   : (s > 0.0 ? std::log(std::log(r21) / std::log(r32)) : 0.0);
        const double next = std::abs(log_ratio + q) / std::log(r21);
        if (!std::isfinite(next)) break;
        const bool settled = std::abs(next - p) <= 1e-13 * std::max(1.0, p);
        p = next;
        if (settled) break;
    }
    return p;
}

void check_input(const std::array<double, 3>& h, const std::array<double, 3>& phi) {
    for (std::size_t k = 0; k < 3; ++k)
        if (!std::isfinite(h[k]) || !std::isfinite(phi[k]) || h[k] <= 0.0)
            throw std::invalid_argument("grid convergence: grid " + std::to_string(k + 1) +
                                        " has spacing " + std::to_string(h[k]) + " and value " +
                                        std::to_string(phi[k]) +
                                        "; need a positive spacing and a finite value");
    if (!(h[0] < h[1] && h[1] < h[2]))
        throw std::invalid_argument("grid convergence: spacings " + std::to_string(h[0]) + ", " +
                                    std::to_string(h[1]) + ", " + std::to_string(h[2]) +
                                    " are not increasing; list the finest grid first");
}

}  // namespace

GridConvergence grid_convergence(std::array<double, 3> spacing, std::array<double, 3> values,
                                 double formal_order) {
    check_input(spacing, values);
    GridConvergence g;
    g.spacing = spacing;
    g.values = values;
    g.formal_order = formal_order;
    g.ratio_fine = spacing[1] / spacing[0];
    g.ratio_coarse = spacing[2] / spacing[1];
    const double e21 = values[1] - values[0];
    const double e32 = values[2] - values[1];
    g.relative_error = values[0] != 0.0 ? std::abs(e21 / values[0]) : 0.0;
    const double largest =
        std::max({1.0, std::abs(values[0]), std::abs(values[1]), std::abs(values[2])});
    if (std::abs(e21) <= kIterationFloor * largest && std::abs(e32) <= kIterationFloor * largest) {
        g.verdict = ConvergenceVerdict::unchanged;
        g.safety_factor = kSafetyReasonable;
        g.order_used = formal_order;
        return g;
    }
    const double spread = *std::max_element(values.begin(), values.end()) -
                          *std::min_element(values.begin(), values.end());
    if (e21 != 0.0 && e32 / e21 < 0.0) {
        g.verdict = ConvergenceVerdict::oscillatory;
    } else if (e21 != 0.0 &&
               std::abs(e32 / e21) <= std::log(g.ratio_coarse) / std::log(g.ratio_fine)) {
        g.verdict = ConvergenceVerdict::diverging;  // see the header: no positive order fits
    } else if (e21 == 0.0) {
        g.verdict = ConvergenceVerdict::order_out_of_range;  // fine pair equal: p unbounded
        g.order = std::numeric_limits<double>::infinity();
    } else {
        g.order = observed_order(g.ratio_fine, g.ratio_coarse, e21, e32);
        const bool reasonable = std::abs(g.order - formal_order) <= 1.0;
        g.verdict =
            reasonable ? ConvergenceVerdict::monotone : ConvergenceVerdict::order_out_of_range;
    }
    const bool reasonable = g.verdict == ConvergenceVerdict::monotone;
    g.order_used = reasonable ? g.order : formal_order;
    g.safety_factor = reasonable ? kSafetyReasonable : kSafetyConservative;
    const double rp = std::pow(g.ratio_fine, g.order_used);
    g.band = g.safety_factor * std::abs(e21) / (rp - 1.0);
    if (!reasonable) g.band = std::max(g.band, 0.5 * spread);
    g.gci_fine =
        values[0] != 0.0 ? g.band / std::abs(values[0]) : std::numeric_limits<double>::infinity();
    g.extrapolated_valid =
        g.verdict != ConvergenceVerdict::oscillatory && g.verdict != ConvergenceVerdict::diverging;
    g.extrapolated = g.extrapolated_valid ? (rp * values[0] - values[1]) / (rp - 1.0) : values[0];
    g.extrapolated_error =
        g.extrapolated != 0.0 ? std::abs((g.extrapolated - values[0]) / g.extrapolated) : 0.0;
    return g;
}

double representative_spacing(std::span<const double> cell_areas) {
    if (cell_areas.empty())
        throw std::invalid_argument("representative spacing: the grid has no cells");
    double sum = 0.0;
    for (const double a : cell_areas) sum += a;
    return std::sqrt(sum / static_cast<double>(cell_areas.size()));
}

const char* verdict_name(ConvergenceVerdict verdict) {
    switch (verdict) {
        case ConvergenceVerdict::monotone:
            return "monotone";
        case ConvergenceVerdict::order_out_of_range:
            return "order out of range";
        case ConvergenceVerdict::oscillatory:
            return "oscillatory";
        case ConvergenceVerdict::diverging:
            return "diverging";
        case ConvergenceVerdict::unchanged:
            return "unchanged";
    }
    return "unknown";
}

std::string verdict_text(const GridConvergence& g) {
    char text[256];
    switch (g.verdict) {
        case ConvergenceVerdict::monotone:
            std::snprintf(text, sizeof text,
                          "converging, observed order %.2f (formal %.0f): factor of safety 1.25",
                          g.order, g.formal_order);
            break;
        case ConvergenceVerdict::order_out_of_range:
            std::snprintf(text, sizeof text,
                          "observed order %.2f is outside %.0f-%.0f: the coarse grid is likely "
                          "outside the asymptotic range; conservative band (factor 3, order %.0f)",
                          g.order, g.formal_order - 1.0, g.formal_order + 1.0, g.formal_order);
            break;
        case ConvergenceVerdict::oscillatory:
            std::snprintf(text, sizeof text,
                          "oscillatory convergence (the changes alternate in sign): no "
                          "extrapolation; conservative band (factor 3, order %.0f, at least half "
                          "the spread)",
                          g.formal_order);
            break;
        case ConvergenceVerdict::diverging:
            std::snprintf(text, sizeof text,
                          "diverging (the changes do not shrink with the grid: %.3g between "
                          "the finer two, %.3g between the coarser two): not in the asymptotic "
                          "range; no extrapolation; conservative band (factor 3, order %.0f, at "
                          "least half the spread)",
                          g.values[1] - g.values[0], g.values[2] - g.values[1], g.formal_order);
            break;
        case ConvergenceVerdict::unchanged:
            std::snprintf(text, sizeof text,
                          "the same value on all three grids (to 1e-7): no discretisation "
                          "error visible");
            break;
    }
    return text;
}

}  // namespace veer
