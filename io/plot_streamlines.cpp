#include "io/plot_streamlines.hpp"

#include <algorithm>
#include <cmath>
#include <optional>

namespace veer {
namespace {

struct Point {
    double x, y;
};

/// Velocity (u, -v in pixel axes) at a pixel position, bilinear between pixel centres; none
/// outside the fluid.
std::optional<Point> velocity_at(const ImageGrid& g, double x, double y) {
    const double fx = x - 0.5, fy = y - 0.5;
    const int i = static_cast<int>(std::floor(fx)), j = static_cast<int>(std::floor(fy));
    if (i < 0 || j < 0 || i + 1 >= g.nx || j + 1 >= g.ny) return std::nullopt;
    const std::size_t a = g.at(i, j), b = g.at(i + 1, j), c = g.at(i, j + 1),
                      d = g.at(i + 1, j + 1);
    if (!g.fluid[a] || !g.fluid[b] || !g.fluid[c] || !g.fluid[d]) return std::nullopt;
    const double wx = fx - i, wy = fy - j;
    auto mix = [&](const std::vector<double>& f) {
        return (1 - wy) * ((1 - wx) * f[a] + wx * f[b]) + wy * ((1 - wx) * f[c] + wx * f[d]);
    };
    return Point{mix(g.u), -mix(g.v)};
}

/// Points of finished lines, binned by cells of the closest-approach distance.
class Occupancy {
public:
    Occupancy(int nx, int ny, double cell)
        : m_cell(cell),
          m_nx(static_cast<int>(nx / cell) + 1),
          m_ny(static_cast<int>(ny / cell) + 1),
          m_bins(static_cast<std::size_t>(m_nx * m_ny)) {}
    void add(Point p) {
        if (auto k = bin(p)) m_bins[*k].push_back(p);
    }
    bool near(Point p) const {
        const int bi = static_cast<int>(p.x / m_cell), bj = static_cast<int>(p.y / m_cell);
        for (int j = bj - 1; j <= bj + 1; ++j)
            for (int i = bi - 1; i <= bi + 1; ++i) {
                if (i < 0 || j < 0 || i >= m_nx || j >= m_ny) continue;
                for (const Point& q : m_bins[static_cast<std::size_t>(j * m_nx + i)])
                    if (std::hypot(q.x - p.x, q.y - p.y) < m_cell) return true;
            }
        return false;
    }

private:
    std::optional<std::size_t> bin(Point p) const {
        const int i = static_cast<int>(p.x / m_cell), j = static_cast<int>(p.y / m_cell);
        if (i < 0 || j < 0 || i >= m_nx || j >= m_ny) return std::nullopt;
        return static_cast<std::size_t>(j * m_nx + i);
    }
    double m_cell;
    int m_nx, m_ny;
    std::vector<std::vector<Point>> m_bins;
};

/// Traces from `seed` along +velocity (direction 1) or -velocity (-1).
std::vector<Point> trace_one_way(const ImageGrid& g, Point seed, double direction,
                                 const Occupancy& taken, const StreamlineSpacing& s, double stall) {
    std::vector<Point> line;
    Point p = seed;
    const int max_steps = static_cast<int>(4.0 * (g.nx + g.ny) / s.step);
    auto dir = [&](Point q) -> std::optional<Point> {
        const auto vel = velocity_at(g, q.x, q.y);
        if (!vel) return std::nullopt;
        const double m = std::hypot(vel->x, vel->y);
        if (m < stall) return std::nullopt;
        return Point{direction * vel->x / m, direction * vel->y / m};
    };
    for (int n = 0; n < max_steps; ++n) {
        const auto d1 = dir(p);
        if (!d1) break;
        const auto d2 = dir({p.x + 0.5 * s.step * d1->x, p.y + 0.5 * s.step * d1->y});
        if (!d2) break;
        p = {p.x + s.step * d2->x, p.y + s.step * d2->y};
        if (taken.near(p)) break;
        // A closed orbit (a recirculation eddy): stop once it comes back near where it began.
        if (static_cast<double>(line.size()) * s.step > 4 * s.separation &&
            std::hypot(p.x - seed.x, p.y - seed.y) < s.step * 2)
            break;
        line.push_back(p);
    }
    return line;
}

}  // namespace

std::vector<Streamline> trace_streamlines(const ImageGrid& g, const StreamlineSpacing& s) {
    double top_speed = 0;
    for (std::size_t k = 0; k < g.u.size(); ++k)
        if (g.fluid[k]) top_speed = std::max(top_speed, std::hypot(g.u[k], g.v[k]));
    const double stall = 1e-3 * top_speed;
    Occupancy taken(g.nx, g.ny, s.closest * s.separation);
    Occupancy seeded(g.nx, g.ny, s.separation);  // lines so far, at the seed spacing
    std::vector<Point> seeds;
    for (double y = 0.5 * s.separation; y < g.ny; y += s.separation) seeds.push_back({1.5, y});
    for (double y = 0.5 * s.separation; y < g.ny; y += s.separation)
        for (double x = 0.5 * s.separation; x < g.nx; x += s.separation) seeds.push_back({x, y});
    std::vector<Streamline> lines;
    for (const Point& seed : seeds) {
        if (!velocity_at(g, seed.x, seed.y) || seeded.near(seed)) continue;
        std::vector<Point> back = trace_one_way(g, seed, -1.0, taken, s, stall);
        const std::vector<Point> ahead = trace_one_way(g, seed, 1.0, taken, s, stall);
        std::reverse(back.begin(), back.end());
        back.push_back(seed);
        back.insert(back.end(), ahead.begin(), ahead.end());
        if (static_cast<double>(back.size()) * s.step < s.shortest) continue;
        Streamline line;
        for (const Point& p : back) {
            line.x.push_back(p.x);
            line.y.push_back(p.y);
            taken.add(p);
            seeded.add(p);
        }
        lines.push_back(std::move(line));
    }
    return lines;
}

}  // namespace veer
