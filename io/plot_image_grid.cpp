#include "io/plot_image_grid.hpp"

#include <algorithm>
#include <cmath>

namespace veer {
namespace {

struct NodeValues {
    std::vector<double> u, v, cp;
};

/// Whether j = 0 node i lies on the wall: on the wake cut it coincides with node ni - i.
bool on_wall(const FlowFrame& f, int i) {
    const int mirror = f.ni - i;
    const double scale = 1e-9 * (1.0 + std::abs(f.node_xv(i, 0)));
    return mirror == i || std::abs(f.node_xv(i, 0) - f.node_xv(mirror, 0)) > scale ||
           std::abs(f.node_yv(i, 0) - f.node_yv(mirror, 0)) > scale;
}

NodeValues node_values(const FlowFrame& f) {
    const std::size_t nodes = static_cast<std::size_t>((f.ni + 1) * (f.nj + 1));
    NodeValues n{std::vector<double>(nodes), std::vector<double>(nodes),
                 std::vector<double>(nodes)};
    for (int j = 0; j <= f.nj; ++j)
        for (int i = 0; i <= f.ni; ++i) {
            double su = 0, sv = 0, sc = 0;
            int count = 0;
            for (int cj = std::max(j - 1, 0); cj <= std::min(j, f.nj - 1); ++cj)
                for (int ci = std::max(i - 1, 0); ci <= std::min(i, f.ni - 1); ++ci) {
                    const std::size_t c = static_cast<std::size_t>(cj * f.ni + ci);
                    su += f.u[c], sv += f.v[c], sc += f.cp[c], ++count;
                }
            const std::size_t k = static_cast<std::size_t>(j * (f.ni + 1) + i);
            n.u[k] = su / count, n.v[k] = sv / count, n.cp[k] = sc / count;
            if (j == 0 && on_wall(f, i)) n.u[k] = n.v[k] = 0.0;  // no slip
        }
    return n;
}

/// Fills the pixels whose centres lie in triangle (a, b, c) of node indices.
void fill_triangle(ImageGrid& g, const FlowFrame& f, const NodeValues& n, std::size_t a,
                   std::size_t b, std::size_t c) {
    const double h = g.pixel_size();
    auto px = [&](std::size_t k) { return (f.node_x[k] - g.window.x0) / h; };
    auto py = [&](std::size_t k) { return (g.window.y1 - f.node_y[k]) / h; };
    const double ax = px(a), ay = py(a), bx = px(b), by = py(b), cx = px(c), cy = py(c);
    const double det = (bx - ax) * (cy - ay) - (cx - ax) * (by - ay);
    if (std::abs(det) < 1e-14) return;
    const int i0 = std::max(0, static_cast<int>(std::floor(std::min({ax, bx, cx}) - 0.5)));
    const int i1 = std::min(g.nx - 1, static_cast<int>(std::ceil(std::max({ax, bx, cx}) - 0.5)));
    const int j0 = std::max(0, static_cast<int>(std::floor(std::min({ay, by, cy}) - 0.5)));
    const int j1 = std::min(g.ny - 1, static_cast<int>(std::ceil(std::max({ay, by, cy}) - 0.5)));
    for (int j = j0; j <= j1; ++j)
        for (int i = i0; i <= i1; ++i) {
            const double x = i + 0.5, y = j + 0.5;
            const double wb = ((x - ax) * (cy - ay) - (cx - ax) * (y - ay)) / det;
            const double wc = ((bx - ax) * (y - ay) - (x - ax) * (by - ay)) / det;
            const double wa = 1.0 - wb - wc;
            if (wa < -1e-12 || wb < -1e-12 || wc < -1e-12) continue;
            const std::size_t p = g.at(i, j);
            g.u[p] = wa * n.u[a] + wb * n.u[b] + wc * n.u[c];
            g.v[p] = wa * n.v[a] + wb * n.v[b] + wc * n.v[c];
            g.cp[p] = wa * n.cp[a] + wb * n.cp[b] + wc * n.cp[c];
            g.fluid[p] = 1;
        }
}

}  // namespace

ImageGrid resample_frame(const FlowFrame& f, const PictureWindow& window, int nx) {
    ImageGrid g;
    g.window = window;
    g.nx = nx;
    g.ny = std::max(
        1, static_cast<int>(std::lround(nx * (window.y1 - window.y0) / (window.x1 - window.x0))));
    const std::size_t pixels = static_cast<std::size_t>(g.nx * g.ny);
    g.u.assign(pixels, 0.0), g.v.assign(pixels, 0.0), g.cp.assign(pixels, 0.0);
    g.fluid.assign(pixels, 0);
    const NodeValues n = node_values(f);
    auto node = [&](int i, int j) { return static_cast<std::size_t>(j * (f.ni + 1) + i); };
    for (int j = 0; j < f.nj; ++j)
        for (int i = 0; i < f.ni; ++i) {
            fill_triangle(g, f, n, node(i, j), node(i + 1, j), node(i + 1, j + 1));
            fill_triangle(g, f, n, node(i, j), node(i + 1, j + 1), node(i, j + 1));
        }
    return g;
}

std::vector<std::pair<double, double>> wall_outline(const FlowFrame& f) {
    // The trailing-edge node is shared by both ends of the wall, so it sits on the cut too.
    int first = -1, last = -1;
    for (int i = 0; i <= f.ni; ++i)
        if (on_wall(f, i)) {
            if (first < 0) first = i;
            last = i;
        }
    std::vector<std::pair<double, double>> outline;
    if (first < 0) return outline;
    for (int i = std::max(first - 1, 0); i <= std::min(last + 1, f.ni); ++i)
        outline.emplace_back(f.node_xv(i, 0), f.node_yv(i, 0));
    return outline;
}

}  // namespace veer
