#pragma once
/// Coordinate tables of NACA 4-digit sections as a report or a colleague would hand them over:
/// chosen stations, rounded ordinates, a title line, either layout. Written here from the
/// published formula, independently of mesh/naca.cpp, so that a table and veer's analytic section
/// are two routes to the same shape:
///   thickness  y_t = 5t[0.2969 sqrt(x) - 0.1260x - 0.3516x^2 + 0.2843x^3 - 0.1015x^4]
///              (the closed-edge variant ends in -0.1036x^4),
///   camber     y_c = m/p^2 (2px - x^2) for x <= p, m/(1-p)^2 [(1 - 2p) + 2px - x^2] beyond,
///   surface    x = x_c -+ y_t sin(theta), y = y_c +- y_t cos(theta), theta = atan(dy_c/dx)
/// (Abbott & von Doenhoff 1959, Theory of Wing Sections, section 6.4; Jacobs, Ward & Pinkerton
/// 1933, NACA Report 460; coefficients [T]; figures compared with: tests/reference/).
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <numbers>
#include <string>
#include <vector>

#include "mesh/vec2.hpp"

namespace veer::test {

struct NacaDigits {
    double m = 0.0;         ///< maximum camber, chords
    double p = 0.4;         ///< its position, chords
    double t = 0.12;        ///< thickness, chords
    double last = -0.1015;  ///< last thickness coefficient: -0.1036 closes the trailing edge
};

inline Vec2 naca_point(const NacaDigits& d, double x, bool upper) {
    const double yt = 5.0 * d.t *
                      (0.2969 * std::sqrt(x) - 0.1260 * x - 0.3516 * x * x + 0.2843 * x * x * x +
                       d.last * x * x * x * x);
    double yc = 0.0, slope = 0.0;
    if (d.m > 0.0 && x < d.p) {
        yc = d.m / (d.p * d.p) * (2.0 * d.p * x - x * x);
        slope = 2.0 * d.m / (d.p * d.p) * (d.p - x);
    } else if (d.m > 0.0) {
        const double q = (1.0 - d.p) * (1.0 - d.p);
        yc = d.m / q * (1.0 - 2.0 * d.p + 2.0 * d.p * x - x * x);
        slope = 2.0 * d.m / q * (d.p - x);
    }
    const double theta = std::atan(slope), s = upper ? 1.0 : -1.0;
    return {x - s * yt * std::sin(theta), yc + s * yt * std::cos(theta)};
}

/// n cosine-spaced stations from 0 to 1 (dense at both edges, as coarse reports give them).
inline std::vector<double> cosine_stations(int n) {
    std::vector<double> x(static_cast<std::size_t>(n));
    for (int k = 0; k < n; ++k)
        x[static_cast<std::size_t>(k)] = 0.5 * (1.0 - std::cos(std::numbers::pi * k / (n - 1)));
    return x;
}

/// Stations typical of published tables: sparse nose, 5-10 % steps aft (common practice).
inline std::vector<double> report_stations() {
    return {0.0, 0.0125, 0.025, 0.05, 0.075, 0.1, 0.15, 0.2,  0.25,
            0.3, 0.4,    0.5,   0.6,  0.7,   0.8, 0.9,  0.95, 1.0};
}

struct Surfaces {
    std::vector<Vec2> upper, lower;  ///< each from the leading edge to the trailing edge
};

inline Surfaces naca_surfaces(const NacaDigits& d, const std::vector<double>& stations) {
    Surfaces s;
    for (double x : stations) {
        s.upper.push_back(naca_point(d, x, true));
        s.lower.push_back(naca_point(d, x, false));
    }
    return s;
}

/// `s` with its trailing edge opened by `gap` (chords): gap / 2 * x added to each surface's
/// distance from the camber line, as a section thickened for strength or manufacture would be.
inline Surfaces opened_by(Surfaces s, double gap) {
    for (std::size_t k = 0; k < s.upper.size(); ++k) {
        s.upper[k].y += 0.5 * gap * s.upper[k].x;
        s.lower[k].y -= 0.5 * gap * s.lower[k].x;
    }
    return s;
}

/// One closed loop: upper trailing edge -> leading edge (once) -> lower trailing edge.
inline std::vector<Vec2> loop_of(const Surfaces& s) {
    std::vector<Vec2> loop(s.upper.rbegin(), s.upper.rend());
    loop.insert(loop.end(), s.lower.begin() + 1, s.lower.end());
    return loop;
}

/// "x y" lines with `decimals` decimals.
inline std::string table_text(const std::vector<Vec2>& points, int decimals) {
    std::string text;
    char line[96];
    for (const Vec2& p : points) {
        std::snprintf(line, sizeof line, "%.*f %.*f\n", decimals, p.x, decimals, p.y);
        text += line;
    }
    return text;
}

inline std::filesystem::path write_table(const std::filesystem::path& path,
                                         const std::string& text) {
    std::ofstream(path, std::ios::binary) << text;
    return path;
}

}  // namespace veer::test
