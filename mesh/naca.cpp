#include "mesh/naca.hpp"

#include <array>
#include <cctype>
#include <cmath>
#include <numbers>

#include "mesh/errors.hpp"

namespace veer {
namespace {

/// A parsed designation. Four digits "MPTT": max camber M% at P/10 chord, thickness TT%.
/// Five digits "2Q0TT": the 2Q0 mean line of NACA Report 537 (design cl 0.3), thickness TT%.
struct Designation {
    double thickness = 0.0;
    bool five_digit = false;
    double max_camber = 0.0;           ///< 4-digit m (chords)
    double max_camber_position = 0.0;  ///< 4-digit p (chords)
    double mean_line_m = 0.0;          ///< 5-digit m of Report 537 (chords)
    double mean_line_k1 = 0.0;         ///< 5-digit k1
};

/// Mean lines 210-250 for design cl 0.3: m and k1 (Jacobs & Pinkerton 1935, NACA Report 537;
/// Abbott & von Doenhoff 1959, section 6.5), indexed by the second digit minus one.
constexpr std::array<double, 5> k_five_digit_m = {0.0580, 0.1260, 0.2025, 0.2900, 0.3910};
constexpr std::array<double, 5> k_five_digit_k1 = {361.4, 51.64, 15.957, 6.643, 3.230};

int digit(char c) { return c - '0'; }

[[noreturn]] void bad_designation(const std::string& digits, const std::string& what) {
    throw InputError("naca = \"" + digits + "\": " + what);
}

Designation parse(const std::string& digits) {
    bool numeric = !digits.empty();
    for (char c : digits) numeric = numeric && std::isdigit(static_cast<unsigned char>(c)) != 0;
    const bool four = numeric && digits.size() == 4;
    const bool five = numeric && digits.size() == 5 && digits[0] == '2' && digits[1] >= '1' &&
                      digits[1] <= '5' && digits[2] == '0';
    if (!four && !five) {
        bad_designation(digits,
                        "expected four digits (e.g. \"2412\") or a five-digit code with mean line "
                        "210-250 (e.g. \"23012\")");
    }
    Designation d;
    const std::size_t tt = digits.size() - 2;
    d.thickness = (10 * digit(digits[tt]) + digit(digits[tt + 1])) / 100.0;
    if (d.thickness <= 0.0) {
        bad_designation(digits, "thickness (last two digits) must be above zero, found \"00\"");
    }
    if (five) {
        d.five_digit = true;
        const auto q = static_cast<std::size_t>(digit(digits[1]) - 1);
        d.mean_line_m = k_five_digit_m[q];
        d.mean_line_k1 = k_five_digit_k1[q];
        return d;
    }
    d.max_camber = digit(digits[0]) / 100.0;
    d.max_camber_position = digit(digits[1]) / 10.0;
    if (d.max_camber > 0.0 && d.max_camber_position <= 0.0) {
        bad_designation(digits,
                        "a cambered section needs a max-camber position (second digit 1-9), "
                        "found 0");
    }
    return d;
}

/// 4-digit camber line, Abbott & von Doenhoff 1959, section 6.4.
CamberPoint four_digit_camber(double m, double p, double x) {
    if (m <= 0.0) return {};
    if (x <= p) return {m / (p * p) * (2.0 * p * x - x * x), 2.0 * m / (p * p) * (p - x)};
    const double q = (1.0 - p) * (1.0 - p);
    return {m / q * ((1.0 - 2.0 * p) + 2.0 * p * x - x * x), 2.0 * m / q * (p - x)};
}

/// 5-digit mean line, NACA Report 537 (Jacobs & Pinkerton 1935).
CamberPoint five_digit_camber(double m, double k1, double x) {
    if (x <= m) {
        return {k1 / 6.0 * (x * x * x - 3.0 * m * x * x + m * m * (3.0 - m) * x),
                k1 / 6.0 * (3.0 * x * x - 6.0 * m * x + m * m * (3.0 - m))};
    }
    return {k1 / 6.0 * m * m * m * (1.0 - x), -k1 / 6.0 * m * m * m};
}

CamberPoint camber_of(const Designation& d, double x) {
    return d.five_digit ? five_digit_camber(d.mean_line_m, d.mean_line_k1, x)
                        : four_digit_camber(d.max_camber, d.max_camber_position, x);
}

/// Surface point at station x: x = x_c -/+ y_t sin(theta), y = y_c +/- y_t cos(theta)
/// (Abbott & von Doenhoff 1959, section 6.4); side = +1 upper, -1 lower.
Vec2 surface_point(const Designation& d, TrailingEdge te, double x, double side) {
    const double yt = naca_half_thickness(x, d.thickness, te);
    const CamberPoint c = camber_of(d, x);
    const double theta = std::atan(c.slope);
    return {x - side * yt * std::sin(theta), c.y + side * yt * std::cos(theta)};
}

}  // namespace

double naca_half_thickness(double x, double t, TrailingEdge te) {
    // Jacobs, Ward & Pinkerton 1933 (NACA Report 460); closed variant: last coefficient -0.1036.
    if (te == TrailingEdge::closed && x >= 1.0) return 0.0;  // the polynomial's round-off at x = 1
    const double a4 = te == TrailingEdge::open ? -0.1015 : -0.1036;
    return 5.0 * t *
           (0.2969 * std::sqrt(x) + x * (-0.1260 + x * (-0.3516 + x * (0.2843 + x * a4))));
}

CamberPoint naca_camber(const std::string& digits, double x) { return camber_of(parse(digits), x); }

double naca_thickness(const std::string& digits) { return parse(digits).thickness; }

RawOutline naca_outline(const std::string& digits, TrailingEdge te, int stations_per_side) {
    const Designation d = parse(digits);
    if (stations_per_side < 3) {
        throw InputError("naca \"" + digits + "\": stations per side must be at least 3, found " +
                         std::to_string(stations_per_side));
    }
    const auto n = static_cast<std::size_t>(stations_per_side);
    std::vector<double> stations(n);
    for (std::size_t k = 0; k < n; ++k) {  // cosine spacing: dense at both edges
        const double angle = std::numbers::pi * static_cast<double>(k) / static_cast<double>(n - 1);
        stations[k] = 0.5 * (1.0 - std::cos(angle));
    }
    stations.front() = 0.0;
    stations.back() = 1.0;
    RawOutline out;
    out.source = "naca " + digits;
    out.points.reserve(2 * n - 1);
    for (std::size_t k = n - 1; k >= 1; --k)
        out.points.push_back(surface_point(d, te, stations[k], -1));
    out.leading_edge = out.points.size();
    out.points.push_back({0.0, 0.0});  // y_t(0) = 0 and y_c(0) = 0: the nose of both surfaces
    for (std::size_t k = 1; k < n; ++k) out.points.push_back(surface_point(d, te, stations[k], +1));
    return out;
}

}  // namespace veer
