#include "mesh/section_builder.hpp"

#include <algorithm>
#include <cmath>

#include "mesh/errors.hpp"
#include "mesh/outline_checks.hpp"
#include "mesh/spline.hpp"

namespace veer {
namespace {

/// A trailing-edge gap below this (chords) is read as a sharp edge written with rounding.
constexpr double k_sharp_gap = 1e-6;
/// The tangent extensions closing a blunt trailing edge may reach this far (chords); beyond, the
/// edge is closed to a point one gap downstream of the base midpoint instead.
constexpr double k_max_wedge_length = 0.02;
/// A refined leading edge this close (chords) to an outline point is taken as that point: a new
/// point there would make a sliver segment, and the chord line turns by under 1e-7 rad.
constexpr double k_leading_edge_snap = 1e-7;

/// Twice the signed area (shoelace): negative for the clockwise Section order.
double twice_signed_area(const std::vector<Vec2>& p) {
    double a = 0.0;
    for (std::size_t k = 0; k < p.size(); ++k) a += cross(p[k], p[(k + 1) % p.size()]);
    return a;
}

/// The leading edge as a point of the outline (index in `points` after any insertion).
struct LeadingEdge {
    std::vector<Vec2> points;
    std::size_t index = 0;
};

/// Common practice: the point of the outline farthest from the trailing-edge midpoint, refined on
/// the spline by Newton's method on (r(s) - te) . r'(s) = 0 between the neighbouring points.
LeadingEdge find_leading_edge(const std::vector<Vec2>& p, double chord) {
    const Vec2 te = 0.5 * (p.front() + p.back());
    std::size_t far = 0;
    for (std::size_t k = 1; k < p.size(); ++k) {
        if (norm(p[k] - te) > norm(p[far] - te)) far = k;
    }
    LeadingEdge le{p, far};
    if (far == 0 || far + 1 == p.size()) return le;
    const ParametricSpline spline(p);
    const double lo = spline.knots()[far - 1], hi = spline.knots()[far + 1];
    double s = spline.knots()[far];
    for (int it = 0; it < 30; ++it) {
        const Vec2 r = spline.position(s) - te, d1 = spline.first_derivative(s);
        const double df = dot(d1, d1) + dot(r, spline.second_derivative(s));
        if (df >= 0.0) break;  // not near a maximum of the distance: keep the outline point
        const double next = std::clamp(s - dot(r, d1) / df, lo, hi);
        if (next == s) break;
        s = next;
    }
    const Vec2 refined = spline.position(s);
    for (std::size_t k = far - 1; k <= far + 1; ++k) {
        if (norm(refined - p[k]) <= k_leading_edge_snap * chord) {
            le.index = k;
            return le;
        }
    }
    const std::size_t insert_at = s > spline.knots()[far] ? far + 1 : far;
    le.points.insert(le.points.begin() + static_cast<std::ptrdiff_t>(insert_at), refined);
    le.index = insert_at;
    return le;
}

/// Closes a blunt trailing edge: the last segment of each surface is extended along its direction
/// until the two meet; if they do not meet within k_max_wedge_length, the tip is one gap downstream
/// of the base midpoint along the chord. The tip is added first and last.
void close_trailing_edge(std::vector<Vec2>& p, std::size_t& leading_edge, double chord) {
    const Vec2 lower = p.front(), upper = p.back();
    const Vec2 dl = (lower - p[1]) * (1.0 / norm(lower - p[1]));
    const Vec2 du = (upper - p[p.size() - 2]) * (1.0 / norm(upper - p[p.size() - 2]));
    // lower + a dl = upper + b du, by Cramer's rule (symmetric in the two sides, so a mirror-image
    // section keeps its tip on the mirror line exactly)
    const double det = cross(dl, du * -1.0);
    const Vec2 rhs = upper - lower;
    const double a = det != 0.0 ? cross(rhs, du * -1.0) / det : -1.0;
    const double b = det != 0.0 ? cross(dl, rhs) / det : -1.0;
    Vec2 tip;
    if (a > 0.0 && b > 0.0 && a <= k_max_wedge_length * chord && b <= k_max_wedge_length * chord) {
        tip = 0.5 * ((lower + a * dl) + (upper + b * du));
    } else {
        const Vec2 mid = 0.5 * (lower + upper);
        const Vec2 along = mid - p[leading_edge];
        tip = mid + norm(upper - lower) / norm(along) * along;
    }
    p.insert(p.begin(), tip);
    p.push_back(tip);
    ++leading_edge;
}

/// Moves the leading edge to the origin and the trailing edge p.front() to (1, 0).
void normalise(std::vector<Vec2>& p, std::size_t leading_edge) {
    const Vec2 le = p[leading_edge];
    const Vec2 chord = p.front() - le;
    const double length = norm(chord);
    const double c = chord.x / length, s = chord.y / length;
    for (Vec2& q : p) {
        const Vec2 r = q - le;
        q = {(c * r.x + s * r.y) / length, (c * r.y - s * r.x) / length};
    }
    p[leading_edge] = {0.0, 0.0};
    p.front() = {1.0, 0.0};
    p.back() = {1.0, 0.0};
}

}  // namespace

Section make_section(const RawOutline& raw, const std::string& name) {
    check_outline(raw);
    std::vector<Vec2> p = raw.points;
    std::optional<std::size_t> hint = raw.leading_edge;
    VEER_VERIFY(!hint || *hint < p.size(), "leading-edge index inside the outline");
    if (twice_signed_area(p) > 0.0) {  // counter-clockwise: upper surface first
        std::reverse(p.begin(), p.end());
        if (hint) hint = p.size() - 1 - *hint;
    }
    const Vec2 te_mid = 0.5 * (p.front() + p.back());
    double chord = 0.0;
    for (const Vec2& q : p) chord = std::max(chord, norm(q - te_mid));

    Section section;
    section.name = name;
    LeadingEdge le = hint ? LeadingEdge{p, *hint} : find_leading_edge(p, chord);
    chord = norm(le.points[le.index] - te_mid);
    const double gap = norm(p.back() - p.front()) / chord;
    if (gap <= k_sharp_gap) {
        le.points.back() = le.points.front();
    } else {
        section.source_te_gap = gap;
        close_trailing_edge(le.points, le.index, chord);
    }
    normalise(le.points, le.index);
    section.points = std::move(le.points);
    section.leading_edge = le.index;
    return section;
}

}  // namespace veer
