#include "mesh/surface_sampling.hpp"

#include <algorithm>
#include <cmath>

#include "mesh/errors.hpp"
#include "mesh/spline.hpp"

namespace veer {
namespace {

/// The spacing rule, per half (leading edge to trailing edge), in spline parameter sigma:
///   target(sigma) = c / (1 + curvature_length * kappa(sigma)): cells shrink where the surface
///                   bends (the leading edge); kappa is the windowed curvature below;
///   target(TE)    = c / (1 + curvature_length * max kappa): the trailing-edge cell matches the
///                   leading-edge one;
///   h = the largest function below target whose slope |dh/dsigma| <= max_slope, so neighbouring
///       spacings differ by about max_slope (default 10%, surface_sampling.hpp);
/// and c is chosen so that the integral of dsigma / h over the half is the half's cell count.
/// Nodes are then placed at equal steps of that integral.
constexpr double curvature_length = 0.04;  ///< chords; sets how strongly curvature clusters
constexpr int samples_per_cell = 40;       ///< fine samples of the spacing function
/// Curvature is measured as the tangent's turn over +-curvature_window (chords) divided by the
/// window: the nose (radius >= 0.004 for a 6% section) is resolved, while the wiggles a spline
/// makes through coordinates rounded to 6 decimals at 1e-5 spacing are averaged away.
constexpr double curvature_window = 0.0025;

/// Mean |curvature| over [s - w, s + w] (clamped to the spline): the tangent's turn over the
/// window.
double window_curvature(const ParametricSpline& spline, double s) {
    const double a = std::max(0.0, s - curvature_window);
    const double b = std::min(spline.length(), s + curvature_window);
    const Vec2 ta = spline.first_derivative(a), tb = spline.first_derivative(b);
    return std::abs(std::atan2(cross(ta, tb), dot(ta, tb))) / (b - a);
}

struct SpacingTable {
    std::vector<double> sigma;   ///< fine samples from 0 (leading edge) to the half length
    std::vector<double> target;  ///< target spacing at each sample, up to the factor c
};

SpacingTable spacing_targets(const ParametricSpline& spline, double s_le, int cells) {
    const double half = spline.length() - s_le;
    const auto n = static_cast<std::size_t>(std::max(2000, samples_per_cell * cells));
    SpacingTable t{std::vector<double>(n + 1), std::vector<double>(n + 1)};
    double max_curvature = 0.0;
    for (std::size_t k = 0; k <= n; ++k) {
        t.sigma[k] = half * static_cast<double>(k) / static_cast<double>(n);
        const double kappa = window_curvature(spline, s_le + t.sigma[k]);
        max_curvature = std::max(max_curvature, kappa);
        t.target[k] = 1.0 / (1.0 + curvature_length * kappa);
    }
    t.target[n] = std::min(t.target[n], 1.0 / (1.0 + curvature_length * max_curvature));
    return t;
}

/// Largest function below `scale * target` with slope at most max_slope (forward and backward
/// sweeps), and the running integral of dsigma / h (trapezoid rule).
std::vector<double> cell_count_integral(const SpacingTable& t, double scale, double max_slope) {
    const std::size_t n = t.sigma.size();
    std::vector<double> h(n);
    for (std::size_t k = 0; k < n; ++k) h[k] = scale * t.target[k];
    for (std::size_t k = 1; k < n; ++k) {
        h[k] = std::min(h[k], h[k - 1] + max_slope * (t.sigma[k] - t.sigma[k - 1]));
    }
    for (std::size_t k = n - 1; k-- > 0;) {
        h[k] = std::min(h[k], h[k + 1] + max_slope * (t.sigma[k + 1] - t.sigma[k]));
    }
    std::vector<double> count(n, 0.0);
    for (std::size_t k = 1; k < n; ++k) {
        count[k] =
            count[k - 1] + 0.5 * (t.sigma[k] - t.sigma[k - 1]) * (1.0 / h[k] + 1.0 / h[k - 1]);
    }
    return count;
}

/// Node parameters sigma_0 = 0 ... sigma_cells = half length for one half.
std::vector<double> half_nodes(const ParametricSpline& spline, double s_le, int cells,
                               double max_slope) {
    const SpacingTable t = spacing_targets(spline, s_le, cells);
    double lo = 1e-8, hi = 10.0 * t.sigma.back();  // count falls as the scale grows
    for (int it = 0; it < 60; ++it) {  // geometric bisection: 60 halvings reach round-off
        const double mid = std::sqrt(lo * hi);
        (cell_count_integral(t, mid, max_slope).back() > cells ? lo : hi) = mid;
    }
    const std::vector<double> count = cell_count_integral(t, hi, max_slope);
    std::vector<double> sigma(static_cast<std::size_t>(cells) + 1, 0.0);
    std::size_t k = 1;
    for (int i = 1; i < cells; ++i) {  // invert the running count by linear interpolation
        const double want = count.back() * i / cells;
        while (count[k] < want) ++k;
        const double f = (want - count[k - 1]) / (count[k] - count[k - 1]);
        sigma[static_cast<std::size_t>(i)] = t.sigma[k - 1] + f * (t.sigma[k] - t.sigma[k - 1]);
    }
    sigma.back() = t.sigma.back();
    return sigma;
}

/// Nodes of the half that runs from points[le] to points.back(), on the spline through all points
/// (so the leading edge is interpolated smoothly across both surfaces).
std::vector<Vec2> sample_half(const std::vector<Vec2>& points, std::size_t le, int cells,
                              double max_slope) {
    const ParametricSpline spline(points);
    const double s_le = spline.knots()[le];
    const std::vector<double> sigma = half_nodes(spline, s_le, cells, max_slope);
    std::vector<Vec2> nodes(sigma.size());
    for (std::size_t i = 0; i < sigma.size(); ++i) nodes[i] = spline.position(s_le + sigma[i]);
    nodes.front() = points[le];
    nodes.back() = points.back();
    return nodes;
}

}  // namespace

std::vector<Vec2> sample_surface(const Section& s, int around, double max_slope) {
    if (around < 8 || around % 2 != 0) {
        throw InputError("around = " + std::to_string(around) +
                         ": the cells along the section must be an even number (the leading edge "
                         "is node around/2), at least 8");
    }
    if (!(max_slope > 0.0 && std::isfinite(max_slope)))
        throw InputError("surface_slope = " + std::to_string(max_slope) +
                         ": the growth of the surface spacing must be a positive number");
    VEER_VERIFY(s.points.size() >= 3 && s.leading_edge > 0 && s.leading_edge + 1 < s.points.size(),
                "a section with a leading edge between its trailing-edge ends");
    const int half = around / 2;
    // The lower half is sampled on the reversed outline so it runs leading edge -> trailing edge
    // like the upper half: the same operations on mirrored data give mirrored nodes exactly.
    std::vector<Vec2> reversed(s.points.rbegin(), s.points.rend());
    const std::vector<Vec2> lower =
        sample_half(reversed, s.points.size() - 1 - s.leading_edge, half, max_slope);
    const std::vector<Vec2> upper = sample_half(s.points, s.leading_edge, half, max_slope);
    std::vector<Vec2> nodes(lower.rbegin(), lower.rend());
    nodes.insert(nodes.end(), upper.begin() + 1, upper.end());
    return nodes;
}

}  // namespace veer
