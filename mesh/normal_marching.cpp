#include "mesh/normal_marching.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

#include "mesh/errors.hpp"
#include "mesh/geometric_stretching.hpp"

namespace veer {
namespace {

using Layer = std::vector<Vec2>;

Vec2 unit(Vec2 v) { return (1.0 / norm(v)) * v; }

/// Outward unit normals of a layer: +90 degrees from the central chord; the outlet lines stay
/// vertical (down at i = 0, up at i = ni).
void layer_normals(const Layer& layer, Layer& normals) {
    const std::size_t n = layer.size() - 1;
    normals[0] = {0.0, -1.0};
    normals[n] = {0.0, 1.0};
    for (std::size_t i = 1; i < n; ++i) normals[i] = unit(rotate_ccw(layer[i + 1] - layer[i - 1]));
}

/// Solves (1 + 2 mu_i) d_i - mu_i (d_{i-1} + d_{i+1}) = rhs_i for 0 < i < n with d_0, d_n fixed,
/// by a twisted factorisation: elimination runs from both ends and meets at the middle node, so
/// mirrored data give mirrored results to the last bit (a one-way sweep would not).
void solve_twisted(const std::vector<double>& mu, Layer& d) {
    const std::size_t n = d.size() - 1, p = n / 2;
    std::vector<double> c(d.size(), 0.0);  // i < p: d_i = r_i + c_i d_{i+1}
    std::vector<double> a(d.size(), 0.0);  // i > p: d_i = r_i + a_i d_{i-1}
    Layer r = d;
    for (std::size_t i = 1; i < p; ++i) {
        const double den = (1.0 + 2.0 * mu[i]) - mu[i] * c[i - 1];
        c[i] = mu[i] / den;
        r[i] = (1.0 / den) * (d[i] + mu[i] * r[i - 1]);
    }
    for (std::size_t i = n - 1; i > p; --i) {
        const double den = (1.0 + 2.0 * mu[i]) - mu[i] * a[i + 1];
        a[i] = mu[i] / den;
        r[i] = (1.0 / den) * (d[i] + mu[i] * r[i + 1]);
    }
    const double den = (1.0 + 2.0 * mu[p]) - (mu[p] * c[p - 1] + mu[p] * a[p + 1]);
    d[p] = (1.0 / den) * (d[p] + (mu[p] * r[p - 1] + mu[p] * r[p + 1]));
    for (std::size_t i = p - 1; i > 0; --i) d[i] = r[i] + c[i] * d[i + 1];
    for (std::size_t i = p + 1; i < n; ++i) d[i] = r[i] + a[i] * d[i - 1];
}

/// Implicit direction averaging along the layer (the dissipation of hyperbolic generation): its
/// strength grows with (step / spacing)^2, so lines that converge (concave corners, the trailing
/// edge) become parallel before they can cross, and with the distance from the wall (eta in
/// [0, 1]) so the far field is smooth.
void smooth_directions(const Layer& layer, double step, double eta, Layer& dirs) {
    const std::size_t n = layer.size() - 1;
    std::vector<double> mu(layer.size(), 0.0);
    for (std::size_t i = 1; i < n; ++i) {
        const double spacing =
            std::min(norm(layer[i + 1] - layer[i]), norm(layer[i] - layer[i - 1]));
        const double ratio = step / spacing;
        mu[i] = 0.5 * ratio * ratio + 2.0 * eta;
    }
    solve_twisted(mu, dirs);
    for (std::size_t i = 1; i < n; ++i) dirs[i] = unit(dirs[i]);
}

/// Diffuses values v_0 .. v_{m-1} implicitly with coefficient k_q between v_q and v_{q+1}:
/// (1 + k_{q-1} + k_q) y_q - k_{q-1} y_{q-1} - k_q y_{q+1} = v_q, zero-gradient ends, by the
/// Thomas algorithm (run on each part of the layer in mirrored order, so the two sides see the
/// same arithmetic).
void diffuse(std::vector<double>& v, const std::vector<double>& k) {
    const std::size_t m = v.size();
    if (m < 2) return;
    const auto left = [&](std::size_t q) { return q == 0 ? 0.0 : k[q - 1]; };
    const auto right = [&](std::size_t q) { return q + 1 == m ? 0.0 : k[q]; };
    std::vector<double> c(m, 0.0);
    for (std::size_t q = 0; q < m; ++q) {
        const double den = (1.0 + left(q) + right(q)) - (q == 0 ? 0.0 : left(q) * c[q - 1]);
        c[q] = right(q) / den;
        v[q] = (v[q] + (q == 0 ? 0.0 : left(q) * v[q - 1])) / den;
    }
    for (std::size_t q = m - 1; q-- > 0;) v[q] += c[q] * v[q + 1];
}

/// How a part of a layer is re-spaced (see redistribute).
struct Respacing {
    double step = 0.0;        ///< this layer's step (chords)
    double spread = 0.0;      ///< extra diffusion of log spacing (far field)
    double pull = 0.0;        ///< blend towards a geometric spacing ...
    double first_goal = 0.0;  ///< ... whose first step (chords) is at the part's last node
};

/// Arc-length fractions (0 .. 1) of nodes whose log spacings are `log_spacing`.
std::vector<double> fractions_of(const std::vector<double>& log_spacing) {
    std::vector<double> f(log_spacing.size() + 1, 0.0);
    for (std::size_t k = 1; k < f.size(); ++k) f[k] = f[k - 1] + std::exp(log_spacing[k - 1]);
    for (double& g : f) g /= f.back();
    return f;
}

/// Goal fractions of a part: `near` shares squeezed spacings with their neighbours (diffusion of
/// log spacing with coefficient 0.5 (step / spacing)^2, strong only where the step outgrows the
/// spacing, as where lines converge at the trailing edge); `far` adds the far-field spread and
/// the pull towards a geometric spacing.
void goal_fractions(const Layer& layer, const Layer& previous, const std::vector<std::size_t>& idx,
                    const Respacing& how, double length, std::vector<double>& near,
                    std::vector<double>& far) {
    const std::size_t m = idx.size() - 1;
    std::vector<double> log_spacing(m), before(m), squeeze(m - 1), spread(m - 1);
    for (std::size_t k = 0; k < m; ++k) {
        before[k] = norm(previous[idx[k + 1]] - previous[idx[k]]);
        // A floor keeps the logarithm finite where the provisional lines have nearly met.
        const double now = norm(layer[idx[k + 1]] - layer[idx[k]]);
        log_spacing[k] = std::log(std::max(now, 0.05 * before[k]));
    }
    for (std::size_t k = 0; k + 1 < m; ++k) {
        const double ratio = how.step / std::min(before[k], before[k + 1]);
        squeeze[k] = 0.5 * ratio * ratio;
        spread[k] = squeeze[k] + how.spread;
    }
    std::vector<double> log_far = log_spacing;
    diffuse(log_spacing, squeeze);
    diffuse(log_far, spread);
    near = fractions_of(log_spacing);
    far = fractions_of(log_far);
    if (how.pull <= 0.0) return;
    const std::vector<double> steps = geometric_steps(how.first_goal, length, static_cast<int>(m));
    double from_end = 0.0;  // the geometric spacing runs from idx[m] back to idx[0]
    for (std::size_t k = m; k-- > 1;) {
        from_end += steps[m - 1 - k];
        far[k] = (1.0 - how.pull) * far[k] + how.pull * (1.0 - from_end / length);
    }
}

/// Re-places the nodes idx[1 .. m-1] of a provisional layer along its own polyline (the end
/// lines idx[0] and idx[m] stay): at the `near` goal, moved towards the `far` goal only as far as
/// keeps every node within tan(20 deg) * step of the near goal, so j lines never lean more
/// than that in one step however strong the far-field smoothing.
void redistribute(Layer& layer, const Layer& previous, const std::vector<std::size_t>& idx,
                  const Respacing& how) {
    const std::size_t m = idx.size() - 1;
    std::vector<double> arc(idx.size(), 0.0);
    for (std::size_t k = 1; k <= m; ++k)
        arc[k] = arc[k - 1] + norm(layer[idx[k]] - layer[idx[k - 1]]);
    std::vector<double> near, far;
    goal_fractions(layer, previous, idx, how, arc[m], near, far);
    double widest = 0.0;
    for (std::size_t k = 1; k < m; ++k)
        widest = std::max(widest, arc[m] * std::abs(far[k] - near[k]));
    const double max_shift = std::tan(20.0 * std::numbers::pi / 180.0) * how.step;
    const double blend = widest > max_shift ? max_shift / widest : 1.0;
    std::vector<Vec2> pts(idx.size());
    for (std::size_t k = 0; k <= m; ++k) pts[k] = layer[idx[k]];
    std::size_t seg = 0;
    for (std::size_t k = 1; k < m; ++k) {
        const double s = arc[m] * (near[k] + blend * (far[k] - near[k]));
        while (seg + 1 < m && arc[seg + 1] < s) ++seg;
        const double len = arc[seg + 1] - arc[seg];
        const double t = len > 0.0 ? std::clamp((s - arc[seg]) / len, 0.0, 1.0) : 0.0;
        layer[idx[k]] = pts[seg] + t * (pts[seg + 1] - pts[seg]);
    }
}

double quad_area(Vec2 a, Vec2 b, Vec2 c, Vec2 d) {
    return 0.5 * (cross(b - a, c - a) + cross(c - a, d - a));
}

}  // namespace

MarchOutcome march_layers(StructuredGrid& grid, const MarchPlan& plan) {
    const int ni = grid.ni(), nj = grid.nj();
    VEER_VERIFY(static_cast<int>(plan.steps.size()) == nj, "one step per layer");
    VEER_VERIFY(ni == 2 * plan.wake + plan.around && plan.around % 2 == 0, "C-grid layout");
    const auto count = static_cast<std::size_t>(ni + 1), mid = count / 2;
    // The four parts of every layer: wake parts from the outlet line to the trailing-edge line,
    // surface halves from the trailing-edge line to the leading-edge line; lower and upper parts
    // listed in mirrored order.
    const auto te = static_cast<std::size_t>(plan.wake);
    std::vector<std::vector<std::size_t>> parts(4);
    for (std::size_t k = 0; k <= te; ++k) {
        parts[0].push_back(k);
        parts[1].push_back(count - 1 - k);
    }
    for (std::size_t k = te; k <= mid; ++k) {
        parts[2].push_back(k);
        parts[3].push_back(count - 1 - k);
    }
    Layer cur(count), next(count), dirs(count);
    for (int i = 0; i <= ni; ++i) cur[static_cast<std::size_t>(i)] = grid.node(i, 0);

    for (int j = 0; j < nj; ++j) {
        const double step = plan.steps[static_cast<std::size_t>(j)];
        const double eta = static_cast<double>(j) / nj;
        layer_normals(cur, dirs);
        if (j > 0) {  // the first layer keeps the exact wall normals
            smooth_directions(cur, step, eta, dirs);
            for (std::size_t i = 0; i < count; ++i) next[i] = cur[i] + step * dirs[i];
            // Surface halves first: the wake parts aim at the surface spacing next to the
            // trailing-edge line, so the spacing is continuous across it far from the wall.
            const double ramp = eta * eta;
            for (std::size_t p : {2u, 3u})
                redistribute(next, cur, parts[p], {step, plan.spread * ramp});
            for (std::size_t p : {0u, 1u}) {
                const std::size_t te_line = parts[p].back(), neighbour = parts[p + 2][1];
                const double first = norm(next[neighbour] - next[te_line]);
                redistribute(next, cur, parts[p], {step, 0.0, plan.wake_pull * ramp, first});
            }
            for (std::size_t i = 1; i + 1 < count; ++i) dirs[i] = unit(next[i] - cur[i]);
        }
        for (std::size_t i = 0; i < count; ++i) next[i] = cur[i] + step * dirs[i];
        for (int i = 0; i < ni; ++i) {
            const auto k = static_cast<std::size_t>(i);
            if (quad_area(cur[k], cur[k + 1], next[k + 1], next[k]) <= 0.0)
                return {true, i, j, cur[k]};
        }
        for (int i = 0; i <= ni; ++i) grid.node(i, j + 1) = next[static_cast<std::size_t>(i)];
        std::swap(cur, next);
    }
    return {};
}

}  // namespace veer
