#include "mesh/chord_frame.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>
#include <sstream>

#include "mesh/errors.hpp"
#include "mesh/spline.hpp"

namespace veer {
namespace {

/// A refined nose this close (chords) to an outline point is taken as that point: a new point
/// there would make a sliver segment, and the chord line turns by under 1e-7 rad.
constexpr double k_nose_snap = 1e-7;

Vec2 te_centre(const std::vector<Vec2>& p) { return 0.5 * (p.front() + p.back()); }

/// Index of the foremost point (least x; of equals, the one nearest the x axis).
std::size_t foremost(const std::vector<Vec2>& p) {
    std::size_t best = 0;
    for (std::size_t k = 1; k < p.size(); ++k) {
        if (p[k].x < p[best].x || (p[k].x == p[best].x && std::abs(p[k].y) < std::abs(p[best].y)))
            best = k;
    }
    return best;
}

/// Whether the outline lies in chord units within `fit` (see ChordFrameLimits).
bool in_chord_units(const std::vector<Vec2>& p, double fit) {
    const Vec2 te = te_centre(p), nose = p[foremost(p)];
    return norm(te - Vec2{1.0, 0.0}) <= fit && std::abs(nose.x) <= fit &&
           std::abs(nose.y) <= ChordFrameLimits::nose_offset;
}

/// Common practice: the nose is the point of the outline farthest from the trailing-edge centre,
/// refined on the spline by Newton's method on (r(s) - te) . r'(s) = 0 between the neighbouring
/// points, and inserted unless an outline point is that close.
void find_far_nose(OutlineWork& w) {
    auto& p = w.points;
    const Vec2 te = te_centre(p);
    std::size_t far = 0;
    for (std::size_t k = 1; k < p.size(); ++k) {
        if (norm(p[k] - te) > norm(p[far] - te)) far = k;
    }
    w.nose = far;
    if (far == 0 || far + 1 == p.size()) return;
    const double chord = norm(p[far] - te);
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
        if (norm(refined - p[k]) <= k_nose_snap * chord) {
            w.nose = k;
            return;
        }
    }
    const std::size_t at = s > spline.knots()[far] ? far + 1 : far;
    p.insert(p.begin() + static_cast<std::ptrdiff_t>(at), refined);
    w.source.insert(w.source.begin() + static_cast<std::ptrdiff_t>(at), OutlineWork::added);
    w.nose = at;
}

[[noreturn]] void refuse_file_axes(const std::vector<Vec2>& p, const std::string& source) {
    const Vec2 te = te_centre(p), nose = p[foremost(p)];
    std::ostringstream out;
    out << source << ": chord_line = \"file-axes\" needs coordinates in chords with the chord "
        << "line on the x axis, but the trailing-edge centre is at (" << te.x << ", " << te.y
        << ") and the foremost point at (" << nose.x << ", " << nose.y
        << "); allowed: (1, 0) and x = 0 within " << ChordFrameLimits::file_axes_fit
        << ", the nose within " << ChordFrameLimits::nose_offset
        << " of the x axis (chord_line = \"auto\" or \"nose-to-tail\" place the section)";
    throw InputError(out.str());
}

}  // namespace

SectionFrame choose_frame(OutlineWork& w, ChordLineChoice choice, const std::string& source) {
    VEER_VERIFY(w.points.size() >= 3, "an outline to place");
    SectionFrame f;
    f.choice = choice;
    f.found_trailing_edge = te_centre(w.points);
    f.found_foremost = w.points[foremost(w.points)];
    const bool keep_axes = choice == ChordLineChoice::file_axes ||
                           (choice == ChordLineChoice::automatic &&
                            in_chord_units(w.points, ChordFrameLimits::automatic_fit));
    if (keep_axes) {
        if (!in_chord_units(w.points, ChordFrameLimits::file_axes_fit))
            refuse_file_axes(w.points, source);
        f.origin = SectionFrame::Origin::file_axes;
        w.nose = foremost(w.points);
        return f;  // chord line (0, 0) -> (1, 0), scale 1, no rotation
    }
    find_far_nose(w);
    f.origin = SectionFrame::Origin::nose_to_tail;
    f.leading_edge = w.points[w.nose];
    f.trailing_edge = te_centre(w.points);
    const Vec2 d = f.trailing_edge - f.leading_edge;
    f.scale = 1.0 / norm(d);
    f.rotation_deg = -std::atan2(d.y, d.x) * 180.0 / std::numbers::pi;
    return f;
}

void apply_frame(OutlineWork& w, const SectionFrame& f) {
    if (f.origin != SectionFrame::Origin::nose_to_tail) return;
    auto& p = w.points;
    const bool sharp = norm(p.back() - p.front()) * f.scale <= TrailingEdgeLimits::sharp_gap;
    const Vec2 d = f.trailing_edge - f.leading_edge;
    const double length = norm(d);
    const double c = d.x / length, s = d.y / length;
    for (Vec2& q : p) {
        const Vec2 r = q - f.leading_edge;
        q = {(c * r.x + s * r.y) / length, (c * r.y - s * r.x) / length};
    }
    p[w.nose] = {0.0, 0.0};
    if (sharp) p.front() = p.back() = {1.0, 0.0};
}

}  // namespace veer
