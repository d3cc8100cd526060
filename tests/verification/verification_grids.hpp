#pragma once
/// Single-block grids for the verification tests: the unit square (uniform, stretched or
/// distorted) with named sides, and doubly periodic squares.
#include <cmath>
#include <functional>
#include <numbers>
#include <string>

#include "mesh/structured_grid.hpp"

namespace veer::test {

/// A block whose nodes are map(s, t) for s, t in [0, 1], sides named "left" (i_min), "right"
/// (i_max), "bottom" (j_min), "top" (j_max), all of kind `kind`.
inline StructuredGrid mapped_block(int ni, int nj, const std::function<Vec2(double, double)>& map,
                                   SegmentKind kind = SegmentKind::wall) {
    StructuredGrid g(ni, nj);
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i)
            g.node(i, j) = map(static_cast<double>(i) / ni, static_cast<double>(j) / nj);
    g.segments() = {{Side::i_min, 0, nj, kind, "left"},
                    {Side::i_max, 0, nj, kind, "right"},
                    {Side::j_min, 0, ni, kind, "bottom"},
                    {Side::j_max, 0, ni, kind, "top"}};
    return g;
}

/// Uniform Cartesian grid of [x0, x1] x [y0, y1].
inline StructuredGrid cartesian_block(int ni, int nj, double x0, double x1, double y0, double y1,
                                      SegmentKind kind = SegmentKind::wall) {
    return mapped_block(
        ni, nj,
        [=](double s, double t) {
            return Vec2{x0 + (x1 - x0) * s, y0 + (y1 - y0) * t};
        },
        kind);
}

/// The unit square, stretched towards both ends in each direction and distorted by a smooth
/// sinusoidal shear, so that cells are non-uniform, non-orthogonal and skewed (the kind of grid
/// asked for by Roache 2002, J. Fluids Eng. 124(1), 4-10, for order-of-accuracy checks). The
/// map is the same for every resolution, so refinement is systematic.
inline StructuredGrid distorted_unit_square(int ni, int nj) {
    const double pi = std::numbers::pi;
    return mapped_block(ni, nj, [pi](double s, double t) {
        const double x = s - 0.08 * std::sin(2.0 * pi * s);  // stretched: finer near the sides
        const double y = t - 0.06 * std::sin(2.0 * pi * t);
        return Vec2{x + 0.05 * std::sin(pi * x) * std::sin(2.0 * pi * y),
                    y + 0.04 * std::sin(2.0 * pi * x) * std::sin(pi * y)};
    });
}

/// A square [0, L]^2 periodic in both directions.
inline StructuredGrid periodic_square(int n, double length) {
    StructuredGrid g = cartesian_block(n, n, 0.0, length, 0.0, length, SegmentKind::periodic);
    return g;
}

}  // namespace veer::test
