#pragma once
/// Rectangular grids about a zero-thickness flat plate on the lower side, for boundary-layer tests.
///
///   y = height  +------------------- top (far_field) -------------------+
///               |                                                        |
///     inlet     |                                                        |  outlet
///   (far_field) |                                                        | (outflow)
///        y = 0  +--- upstream (far_field) ---+======= plate (wall) ======+
///             x = -upstream_length          x = 0                  x = plate_length
///
/// The plate runs to the outlet (no trailing edge). Cells along the plate cluster exponentially
/// towards the leading edge, ahead of it they grow geometrically from the plate's first cell; the
/// wall-normal cells grow geometrically from `first_cell`. The "upstream" segment is meant to carry
/// the free stream (a prescribed velocity in the solver settings), standing in for a symmetry
/// plane.
#include <cmath>
#include <cstddef>
#include <vector>

#include "mesh/structured_grid.hpp"

namespace veer::test {

/// What a plate grid looks like (chords = plate-length units chosen by the caller).
struct PlateGridSpec {
    double plate_length = 1.0;
    double upstream_length = 0.33;  ///< free-stream lower side ahead of the leading edge
    double height = 1.0;
    int upstream = 24;         ///< cells ahead of the leading edge
    int on_plate = 96;         ///< cells along the plate
    int normal = 64;           ///< cells from the plate to the top
    double first_cell = 1e-4;  ///< wall-normal height of the first cell
    double clustering = 4.0;   ///< exponential clustering along the plate, > 0
};

/// Growth ratio r with first * (r^cells - 1) / (r - 1) = length, by bisection.
inline double geometric_growth(double first, int cells, double length) {
    double lo = 1.0 + 1e-12, hi = 3.0;
    for (int it = 0; it < 200; ++it) {
        const double r = 0.5 * (lo + hi);
        (first * (std::pow(r, cells) - 1.0) / (r - 1.0) > length ? hi : lo) = r;
    }
    return 0.5 * (lo + hi);
}

/// Node coordinates along x: upstream + on_plate + 1 values, the leading edge at index upstream.
inline std::vector<double> plate_x_nodes(const PlateGridSpec& s) {
    std::vector<double> x(static_cast<std::size_t>(s.upstream + s.on_plate + 1), 0.0);
    for (int i = 0; i <= s.on_plate; ++i)
        x[static_cast<std::size_t>(s.upstream + i)] =
            s.plate_length * std::expm1(s.clustering * i / s.on_plate) / std::expm1(s.clustering);
    const double dx0 = x[static_cast<std::size_t>(s.upstream) + 1];
    const double r = geometric_growth(dx0, s.upstream, s.upstream_length);
    double d = dx0;
    for (int k = 1; k <= s.upstream; ++k, d *= r)
        x[static_cast<std::size_t>(s.upstream - k)] =
            x[static_cast<std::size_t>(s.upstream - k + 1)] - d;
    return x;
}

/// Node coordinates along y: normal + 1 values from 0 to height.
inline std::vector<double> plate_y_nodes(const PlateGridSpec& s) {
    const double r = geometric_growth(s.first_cell, s.normal, s.height);
    std::vector<double> y(static_cast<std::size_t>(s.normal) + 1, 0.0);
    double d = s.first_cell;
    for (int j = 1; j <= s.normal; ++j, d *= r)
        y[static_cast<std::size_t>(j)] = y[static_cast<std::size_t>(j) - 1] + d;
    for (double& v : y) v *= s.height / y.back();  // land exactly on the top
    return y;
}

/// The grid and its named segments: "inlet", "outlet", "upstream", "plate", "top".
inline StructuredGrid flat_plate_grid(const PlateGridSpec& s) {
    const std::vector<double> x = plate_x_nodes(s), y = plate_y_nodes(s);
    const int ni = s.upstream + s.on_plate, nj = s.normal;
    StructuredGrid g(ni, nj);
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i)
            g.node(i, j) = {x[static_cast<std::size_t>(i)], y[static_cast<std::size_t>(j)]};
    g.segments() = {{Side::i_min, 0, nj, SegmentKind::far_field, "inlet"},
                    {Side::i_max, 0, nj, SegmentKind::outflow, "outlet"},
                    {Side::j_min, 0, s.upstream, SegmentKind::far_field, "upstream"},
                    {Side::j_min, s.upstream, ni, SegmentKind::wall, "plate"},
                    {Side::j_max, 0, ni, SegmentKind::far_field, "top"}};
    return g;
}

}  // namespace veer::test
