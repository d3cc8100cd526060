#include "mesh/normal_marching.hpp"

#include <algorithm>
#include <cmath>

#include "mesh/errors.hpp"

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

/// Diffuses values v_0 .. v_{m-1} implicitly, (1 + 2k) y_k - k (y_{k-1} + y_{k+1}) = v_k with
/// zero-gradient ends, by the Thomas algorithm (run on each half of the layer from its outlet,
/// so the two halves see the same arithmetic).
void diffuse(std::vector<double>& v, double k) {
    const std::size_t m = v.size();
    if (k <= 0.0 || m < 2) return;
    std::vector<double> c(m, 0.0);
    const auto diag = [&](std::size_t q) { return 1.0 + (q == 0 || q + 1 == m ? k : 2.0 * k); };
    c[0] = -k / diag(0);
    v[0] = v[0] / diag(0);
    for (std::size_t q = 1; q < m; ++q) {
        const double den = diag(q) + k * c[q - 1];
        c[q] = -k / den;
        v[q] = (v[q] + k * v[q - 1]) / den;
    }
    for (std::size_t q = m - 1; q-- > 0;) v[q] -= c[q] * v[q + 1];
}

/// Re-places the nodes idx[1 .. m-1] of a provisional layer along its own polyline (the end
/// lines idx[0] and idx[m] stay). The spacings are those of the previous
/// layer with their logarithm diffused by `spread` (0 near the wall), scaled to the new length.
/// Keeping the previous spacings pushes nodes away from where lines converge (the trailing edge)
/// instead of letting them pile up; the diffusion fans out clusters far from the wall.
void redistribute(Layer& layer, const Layer& previous, const std::vector<std::size_t>& idx,
                  double spread) {
    const std::size_t m = idx.size() - 1;
    std::vector<double> arc(idx.size(), 0.0), log_spacing(m);
    for (std::size_t k = 1; k <= m; ++k)
        arc[k] = arc[k - 1] + norm(layer[idx[k]] - layer[idx[k - 1]]);
    for (std::size_t k = 0; k < m; ++k)
        log_spacing[k] = std::log(norm(previous[idx[k + 1]] - previous[idx[k]]));
    diffuse(log_spacing, spread);
    std::vector<double> goal(idx.size(), 0.0);
    for (std::size_t k = 1; k <= m; ++k) goal[k] = goal[k - 1] + std::exp(log_spacing[k - 1]);
    std::vector<Vec2> pts(idx.size());
    for (std::size_t k = 0; k <= m; ++k) pts[k] = layer[idx[k]];
    std::size_t seg = 0;
    for (std::size_t k = 1; k < m; ++k) {
        const double s = arc[m] * (goal[k] / goal[m]);
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
            const double spread = plan.spread * eta * eta;
            for (const auto& part : parts) redistribute(next, cur, part, spread);
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
