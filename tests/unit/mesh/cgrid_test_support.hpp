#pragma once
/// Surfaces and independent measures for the C-grid tests (computed here, not by the code under
/// test).
#include <cmath>
#include <numbers>
#include <string>
#include <vector>

#include "mesh/cgrid_spec.hpp"
#include "mesh/naca.hpp"
#include "mesh/raw_outline.hpp"
#include "mesh/section_builder.hpp"
#include "mesh/structured_grid.hpp"
#include "mesh/surface_sampling.hpp"

namespace veer::test {

/// The grid of the demo case, cases/indoor-flyer-laminar.toml: 256 x 64, wake 48, far field 30,
/// first cell 2e-3.
inline CGridSpec demo_cgrid_spec() {
    CGridSpec spec;
    spec.around = 256;
    spec.normal = 64;
    spec.wake = 48;
    spec.far_field = 30.0;
    spec.first_cell = 2e-3;
    return spec;
}

/// A NACA section through the project's geometry chain, sampled with `around` cells.
inline std::vector<Vec2> naca_surface(const std::string& digits, int around) {
    return sample_surface(make_section(naca_outline(digits, TrailingEdge::closed), digits), around);
}

/// NACA 2412 written as an imported file would be (open trailing edge, upper surface from the
/// trailing edge to the leading edge, then the lower surface back), 81 cosine stations a side;
/// formulas of Abbott & von Doenhoff 1959, section 6.4, written out here on purpose.
inline RawOutline imported_2412_outline() {
    const double m = 0.02, p = 0.4, t = 0.12;
    const auto point = [&](double x, bool upper) {
        const double yt = 5.0 * t *
                          (0.2969 * std::sqrt(x) - 0.1260 * x - 0.3516 * x * x +
                           0.2843 * x * x * x - 0.1015 * x * x * x * x);
        const double yc = x < p ? m / (p * p) * (2 * p * x - x * x)
                                : m / ((1 - p) * (1 - p)) * (1 - 2 * p + 2 * p * x - x * x);
        const double dy = x < p ? 2 * m / (p * p) * (p - x) : 2 * m / ((1 - p) * (1 - p)) * (p - x);
        const double th = std::atan(dy), s = upper ? 1.0 : -1.0;
        return Vec2{x - s * yt * std::sin(th), yc + s * yt * std::cos(th)};
    };
    RawOutline raw;
    raw.source = "imported 2412 (test)";
    const int n = 80;
    for (int k = n; k >= 0; --k)
        raw.points.push_back(point(0.5 * (1 - std::cos(std::numbers::pi * k / n)), true));
    for (int k = 1; k <= n; ++k)
        raw.points.push_back(point(0.5 * (1 - std::cos(std::numbers::pi * k / n)), false));
    return raw;
}

/// Shoelace area of a closed polygon (absolute value, chords^2).
inline double polygon_area(const std::vector<Vec2>& loop) {
    double twice = 0.0;
    for (std::size_t k = 0; k < loop.size(); ++k)
        twice += cross(loop[k], loop[(k + 1) % loop.size()]);
    return 0.5 * std::abs(twice);
}

/// The loop around the whole grid: up the i = 0 outlet line, along the far field, down the i = ni
/// outlet line (the two outlet lines meet at the outlet point of the wake cut).
inline std::vector<Vec2> outer_loop(const StructuredGrid& g) {
    std::vector<Vec2> loop;
    for (int j = 0; j < g.nj(); ++j) loop.push_back(g.node(0, j));
    for (int i = 0; i < g.ni(); ++i) loop.push_back(g.node(i, g.nj()));
    for (int j = g.nj(); j > 0; --j) loop.push_back(g.node(g.ni(), j));
    return loop;
}

}  // namespace veer::test
