#include "mesh/trailing_edge.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

#include "mesh/errors.hpp"
#include "mesh/outline_checks.hpp"

namespace veer {
namespace {

using Limits = TrailingEdgeLimits;

constexpr double radians(double deg) { return deg * std::numbers::pi / 180.0; }

Vec2 unit(Vec2 v) { return (1.0 / norm(v)) * v; }

/// Whether the segment a -> b is a base segment: short, and turning sharply into b -> c, or of
/// no length at all (a point written twice).
bool is_base_segment(Vec2 a, Vec2 b, Vec2 c, double chord) {
    const Vec2 base = b - a, surface = c - b;
    if (norm(base) <= 1e-7 * chord) return true;
    const double cos_limit = std::cos(radians(Limits::base_turn_degrees));
    return norm(base) <= Limits::base_length * chord &&
           dot(base, surface) < cos_limit * norm(base) * norm(surface);
}

/// Where the lines p + s u and q + r v meet: (s, r), by Cramer's rule (written symmetrically in
/// the two lines, so mirrored data give mirrored answers to the last bit); negative when
/// parallel.
struct Meeting {
    double s = -1.0, r = -1.0;
};
Meeting meet(Vec2 p, Vec2 u, Vec2 q, Vec2 v) {
    const double det = cross(u, v * -1.0);
    if (det == 0.0) return {};
    const Vec2 rhs = q - p;
    return {cross(rhs, v * -1.0) / det, cross(u, rhs) / det};
}

/// Points of one side of a fairing from the corner c (leaving along t) to the tip (arriving along
/// d), excluding both ends: a quadratic Bezier through the meeting point of the two directions
/// where they meet ahead of the tip (a curve that turns one way only), else a cubic one.
std::vector<Vec2> fairing_side(Vec2 c, Vec2 t, Vec2 tip, Vec2 d) {
    constexpr int pieces = 16;
    const Meeting m = meet(c, t, tip, d * -1.0);
    const double length = norm(tip - c);
    std::vector<Vec2> out;
    for (int k = 1; k < pieces; ++k) {
        const double u = static_cast<double>(k) / pieces, w = 1.0 - u;
        if (m.s > 0.0 && m.r > 0.0) {
            const Vec2 x = c + m.s * t;
            out.push_back(w * w * c + 2.0 * u * w * x + u * u * tip);
        } else {
            const Vec2 p1 = c + (length / 3.0) * t, p2 = tip - (length / 3.0) * d;
            out.push_back(w * w * w * c + 3.0 * u * w * w * p1 + 3.0 * u * u * w * p2 +
                          u * u * u * tip);
        }
    }
    return out;
}

/// The tip of a fairing: on the bisector of the two surface directions, at the distance that
/// lets a curve leaving the steeper-diverging side at angle phi (towards the bisector) reach it
/// at the fairing half-angle theta without turning back: between h / (2 tan theta - tan phi)
/// and h / tan theta (h the half gap); the middle of that range.
double fairing_length(double half_gap, double phi_lower, double phi_upper) {
    const double theta = radians(Limits::fairing_half_angle_degrees);
    const double phi = std::clamp(std::min(phi_lower, phi_upper), -radians(60.0), theta);
    const double shortest = half_gap / (2.0 * std::tan(theta) - std::tan(phi));
    const double longest = half_gap / std::tan(theta);
    return 0.5 * (shortest + longest);
}

/// The fairing of a blunt edge between the corners `lower` and `upper`, leaving them along
/// t_lower and t_upper: the tip, and each side's points between its corner and the tip.
struct Fairing {
    Vec2 tip;
    std::vector<Vec2> lower_side, upper_side;
};

Fairing fair(Vec2 lower, Vec2 upper, Vec2 t_lower, Vec2 t_upper) {
    const Vec2 sum = t_lower + t_upper;
    const Vec2 axis = norm(sum) > 1e-6 ? unit(sum) : Vec2{1.0, 0.0};
    const Vec2 across = rotate_ccw(axis);  // from the lower corner towards the upper
    // angle of each side's direction towards the bisector (positive: converging)
    const double phi_lower = std::asin(std::clamp(dot(t_lower, across), -1.0, 1.0));
    const double phi_upper = std::asin(std::clamp(-dot(t_upper, across), -1.0, 1.0));
    Fairing f;
    const double half_gap = 0.5 * norm(upper - lower);
    f.tip = 0.5 * (lower + upper) + fairing_length(half_gap, phi_lower, phi_upper) * axis;
    const double theta = radians(Limits::fairing_half_angle_degrees);
    f.lower_side =
        fairing_side(lower, t_lower, f.tip, std::cos(theta) * axis + std::sin(theta) * across);
    f.upper_side =
        fairing_side(upper, t_upper, f.tip, std::cos(theta) * axis - std::sin(theta) * across);
    return f;
}

}  // namespace

int set_aside_base_points(OutlineWork& w, double chord) {
    auto& p = w.points;
    int removed = 0;
    for (int end = 0; end < 2; ++end) {
        for (int k = 0; k < 3 && p.size() > 4 && is_base_segment(p[0], p[1], p[2], chord); ++k) {
            p.erase(p.begin());
            w.source.erase(w.source.begin());
            ++removed;
        }
        std::reverse(p.begin(), p.end());
        std::reverse(w.source.begin(), w.source.end());
    }
    return removed;
}

void check_ends_at_trailing_edge(const RawOutline& raw, const OutlineWork& w) {
    const auto& p = w.points;
    const std::size_t n = p.size();
    if (n < 4 || dot(p[1] - p[0], p[n - 2] - p[n - 1]) >= 0.0) return;
    refuse_loop_start(raw, w.source.front());
}

TrailingEdgeClosure close_trailing_edge(OutlineWork& w) {
    auto& p = w.points;
    VEER_VERIFY(p.size() >= 4 && w.nose > 0 && w.nose + 1 < p.size(), "an outline with a nose");
    TrailingEdgeClosure closure;
    const Vec2 lower = p.front(), upper = p.back();
    closure.gap = norm(upper - lower);
    if (closure.gap <= Limits::sharp_gap) {
        p.back() = p.front();
        return closure;
    }
    const Vec2 t_lower = unit(lower - p[1]), t_upper = unit(upper - p[p.size() - 2]);
    const Vec2 centre = 0.5 * (lower + upper);
    const Meeting m = meet(lower, t_lower, upper, t_upper);
    const double half_angle = 0.5 * std::acos(std::clamp(dot(t_lower, t_upper), -1.0, 1.0));
    std::vector<Vec2> lower_side, upper_side;
    Vec2 tip;
    if (m.s > 0.0 && m.r > 0.0 && m.s <= Limits::wedge_reach && m.r <= Limits::wedge_reach &&
        half_angle <= radians(Limits::wedge_half_angle_degrees)) {
        closure.form = TrailingEdgeClosure::Form::wedge;
        tip = 0.5 * ((lower + m.s * t_lower) + (upper + m.r * t_upper));
    } else {
        closure.form = TrailingEdgeClosure::Form::fairing;
        Fairing f = fair(lower, upper, t_lower, t_upper);
        tip = f.tip;
        lower_side = std::move(f.lower_side);
        upper_side = std::move(f.upper_side);
    }
    closure.length = norm(tip - centre);
    // lower side: tip first, then the fairing towards the corner
    std::vector<Vec2> front{tip};
    front.insert(front.end(), lower_side.rbegin(), lower_side.rend());
    p.insert(p.begin(), front.begin(), front.end());
    w.source.insert(w.source.begin(), front.size(), OutlineWork::added);
    w.nose += front.size();
    p.insert(p.end(), upper_side.begin(), upper_side.end());
    p.push_back(tip);
    w.source.insert(w.source.end(), upper_side.size() + 1, OutlineWork::added);
    return closure;
}

}  // namespace veer
