#pragma once
// Grids and manufactured fields for the pressure-solver tests (our own shapes, made here so the
// tests do not wait on the C-grid generator).
#include <cmath>
#include <cstdint>
#include <functional>
#include <numbers>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/poisson_assembly.hpp"
#include "solver/poisson_stencil.hpp"

namespace veer::test {

/// Thickness of our own test section: round nose (sqrt), sharp tail, about 8% thick.
inline double test_section_half_thickness(double x) { return 0.2 * std::sqrt(x) * (1.0 - x); }

/// Wall-normal blending 0..1 with a geometric first cell of `first` (fraction of the far field).
inline std::vector<double> stretched_levels(int n, double first) {
    // Growth ratio r with first * (r^n - 1) / (r - 1) = 1, by bisection.
    double lo = 1.0 + 1e-12, hi = 4.0;
    for (int it = 0; it < 200; ++it) {
        const double r = 0.5 * (lo + hi);
        (first * (std::pow(r, n) - 1.0) / (r - 1.0) > 1.0 ? hi : lo) = r;
    }
    const double r = 0.5 * (lo + hi);
    std::vector<double> f(static_cast<std::size_t>(n) + 1, 0.0);
    double h = first;
    for (int j = 1; j <= n; ++j, h *= r) f[static_cast<std::size_t>(j)] = f[j - 1u] + h;
    for (double& v : f) v /= f.back();
    return f;
}

/// A C-shaped grid around the test section: j = 0 is the lower wake (x from `outlet` to 1), the
/// section (lower surface, nose, upper surface) and the upper wake; j = nj a C of radius `radius`.
/// Lines between are straight, so cells near the section are skewed; `first_cell` (chords) sets
/// wall-normal aspect ratios of 1e3 and more.
inline StructuredGrid make_c_grid(int around, int normal, int wake, double first_cell,
                                  double radius = 10.0, double outlet = 6.0) {
    const int ni = 2 * wake + around;
    StructuredGrid g(ni, normal);
    const auto f = stretched_levels(normal, first_cell / radius);
    const double pi = std::numbers::pi;
    for (int i = 0; i <= ni; ++i) {
        Vec2 inner, outer;
        if (i <= wake || i >= wake + around) {
            const int k = i <= wake ? wake - i : i - wake - around;  // 0 at the trailing edge
            const double s = static_cast<double>(k) / wake;
            const double x = 1.0 + (outlet - 1.0) * s * s;  // clustered at the trailing edge
            const double side = i <= wake ? -1.0 : 1.0;
            inner = {x, 0.0};
            outer = {x, side * radius};
        } else {
            const double theta = 2.0 * pi * (i - wake) / around;  // 0..2 pi, lower surface first
            const double x = 0.5 * (1.0 + std::cos(theta));
            const double side = theta < pi ? -1.0 : 1.0;
            inner = {x, side * test_section_half_thickness(x)};
            const double phi = -0.5 * pi - 0.5 * theta;
            outer = {1.0 + radius * std::cos(phi), radius * std::sin(phi)};
        }
        for (int j = 0; j <= normal; ++j) {
            const double t = f[static_cast<std::size_t>(j)];
            g.node(i, j) = (1.0 - t) * inner + t * outer;
        }
    }
    g.c_layout() = CGridLayout{wake, around};
    g.segments() = {{Side::j_min, 0, wake, SegmentKind::wake_cut, "wake_cut"},
                    {Side::j_min, wake, wake + around, SegmentKind::wall, "wall"},
                    {Side::j_min, wake + around, ni, SegmentKind::wake_cut, "wake_cut"},
                    {Side::j_max, 0, ni, SegmentKind::far_field, "far_field"},
                    {Side::i_min, 0, normal, SegmentKind::outflow, "outflow_lower"},
                    {Side::i_max, 0, normal, SegmentKind::outflow, "outflow_upper"}};
    return g;
}

/// A periodic box [0, lx] x [0, ly] with a periodic sinusoidal distortion of relative size eps.
inline StructuredGrid make_periodic_box(int ni, int nj, double lx, double ly, double eps) {
    StructuredGrid g(ni, nj);
    const double tau = 2.0 * std::numbers::pi;
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i) {
            const double a = static_cast<double>(i) / ni, b = static_cast<double>(j) / nj;
            const double bump = eps * std::sin(tau * a) * std::sin(tau * b);
            g.node(i, j) = {lx * (a + bump), ly * (b + 0.5 * bump)};
        }
    g.segments() = {{Side::i_min, 0, nj, SegmentKind::periodic, "periodic"},
                    {Side::i_max, 0, nj, SegmentKind::periodic, "periodic"},
                    {Side::j_min, 0, ni, SegmentKind::periodic, "periodic"},
                    {Side::j_max, 0, ni, SegmentKind::periodic, "periodic"}};
    return g;
}

/// Log-polar annulus r in [1, e^{r_span}], theta all the way round (periodic in i): an orthogonal
/// grid whose cells are all similar (a conformal map of a uniform grid), smoothly stretched in r.
inline StructuredGrid make_log_polar_annulus(int ni, int nj, double r_span) {
    StructuredGrid g(ni, nj);
    const double tau = 2.0 * std::numbers::pi;
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i) {
            const double r = std::exp(r_span * j / nj),
                         t = -tau * (i % ni) / ni;  // -theta: right-handed (i, j)
            g.node(i, j) = {r * std::cos(t), r * std::sin(t)};
        }
    g.segments() = {{Side::i_min, 0, nj, SegmentKind::periodic, "periodic"},
                    {Side::i_max, 0, nj, SegmentKind::periodic, "periodic"},
                    {Side::j_min, 0, ni, SegmentKind::wall, "inner"},
                    {Side::j_max, 0, ni, SegmentKind::far_field, "outer"}};
    return g;
}

/// Flags on the j = nj faces (far field) and, if `outlets`, on the i = 0 and i = ni faces.
struct FaceFlags {
    std::vector<std::uint8_t> i;
    std::vector<std::uint8_t> j;
};
inline FaceFlags far_field_dirichlet(int ni, int nj, bool far_field, bool outlets) {
    FaceFlags f{std::vector<std::uint8_t>(static_cast<std::size_t>((ni + 1) * nj), 0),
                std::vector<std::uint8_t>(static_cast<std::size_t>(ni * (nj + 1)), 0)};
    if (far_field)
        for (int i = 0; i < ni; ++i) f.j[static_cast<std::size_t>(i + ni * nj)] = 1;
    if (outlets)
        for (int j = 0; j < nj; ++j) {
            f.i[static_cast<std::size_t>((ni + 1) * j)] = 1;
            f.i[static_cast<std::size_t>(ni + (ni + 1) * j)] = 1;
        }
    return f;
}

/// A field evaluated at the cell centroids.
inline std::vector<double> at_centroids(const GridMetrics& m,
                                        const std::function<double(Vec2)>& field) {
    std::vector<double> v(m.centroid.size());
    for (std::size_t k = 0; k < v.size(); ++k) v[k] = field(m.centroid[k]);
    return v;
}

/// A smooth field for manufactured solutions on the C-grid (chord-scale variation).
inline double smooth_test_field(Vec2 p) {
    return std::sin(0.7 * p.x + 0.3) * std::cos(0.5 * p.y) + 0.1 * p.x * p.y;
}

}  // namespace veer::test
