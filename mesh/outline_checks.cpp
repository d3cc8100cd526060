#include "mesh/outline_checks.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>
#include <optional>
#include <sstream>

#include "mesh/errors.hpp"
#include "mesh/segment_distance.hpp"

namespace veer {

std::string format_point(Vec2 p) {
    std::ostringstream out;
    out << "(" << p.x << ", " << p.y << ")";
    return out.str();
}

namespace {

/// Largest distance of a point from the trailing-edge midpoint: about the chord.
double outline_size(const std::vector<Vec2>& p) {
    const Vec2 te = 0.5 * (p.front() + p.back());
    double size = 0.0;
    for (const Vec2& q : p) size = std::max(size, norm(q - te));
    return size;
}

/// Distance between segments ab and cd: zero where they cross properly.
double segment_distance(Vec2 a, Vec2 b, Vec2 c, Vec2 d) {
    const double d1 = cross(b - a, c - a), d2 = cross(b - a, d - a);
    const double d3 = cross(d - c, a - c), d4 = cross(d - c, b - c);
    if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
        return 0.0;
    }
    return std::min({point_segment_distance(a, c, d), point_segment_distance(b, c, d),
                     point_segment_distance(c, a, b), point_segment_distance(d, a, b)});
}

std::string segment_name(const RawOutline& raw, std::size_t k, std::size_t next) {
    if (!raw.lines.empty()) {
        return "the segment between lines " + std::to_string(raw.lines[k]) + " and " +
               std::to_string(raw.lines[next]);
    }
    return "the segment between points " + std::to_string(k + 1) + " and " +
           std::to_string(next + 1);
}

/// A repeat of the first or last point (a closing point written twice) is left to
/// set_aside_base_points; any other is an error.
void check_repeats(const RawOutline& raw, double size) {
    const auto& p = raw.points;
    for (std::size_t k = 2; k + 1 < p.size(); ++k) {
        if (norm(p[k] - p[k - 1]) <= OutlineTolerances::duplicate_distance * size) {
            throw InputError(outline_location(raw, k) + ": point " + format_point(p[k]) +
                             " repeats the previous one (" + point_label(raw, k - 1) +
                             "): a duplicated station; each station is listed once" +
                             neighbours_text(raw, k - 1, k));
        }
    }
}

void check_closure(const RawOutline& raw, double size) {
    const auto& p = raw.points;
    const double gap = norm(p.back() - p.front()) / size;
    if (gap > OutlineTolerances::max_closure_gap) {
        std::ostringstream out;
        out << raw.source << ": the outline is not one closed loop: first point "
            << format_point(p.front()) << " and last point " << format_point(p.back()) << " are "
            << gap << " chords apart, at most " << OutlineTolerances::max_closure_gap
            << " allowed (points must run once around the section from trailing edge to trailing "
               "edge)";
        throw InputError(out.str());
    }
}

/// Whether the outline turns back by more than the limit at point k.
bool doubles_back(const std::vector<Vec2>& p, std::size_t k) {
    const double limit = std::cos(OutlineTolerances::max_turn_degrees * std::numbers::pi / 180.0);
    const Vec2 a = p[k] - p[k - 1], b = p[k + 1] - p[k];
    return dot(a, b) < limit * norm(a) * norm(b);
}

double turn_degrees(const std::vector<Vec2>& p, std::size_t k) {
    const Vec2 a = p[k] - p[k - 1], b = p[k + 1] - p[k];
    const double c = dot(a, b) / (norm(a) * norm(b));
    return std::acos(std::clamp(c, -1.0, 1.0)) * 180.0 / std::numbers::pi;
}

/// Whether the points around k, k+1 (k-2 .. k+3, clipped) run on without turning back once
/// `change` is applied to a copy of them (local indices: k is 2).
template <class Change>
bool runs_on_after(const std::vector<Vec2>& p, std::size_t k, Change change) {
    const std::size_t from = k >= 2 ? k - 2 : 0, to = std::min(p.size(), k + 4);
    std::vector<Vec2> local(p.begin() + static_cast<std::ptrdiff_t>(from),
                            p.begin() + static_cast<std::ptrdiff_t>(to));
    change(local, k - from);
    for (std::size_t q = 1; q + 1 < local.size(); ++q)
        if (doubles_back(local, q)) return false;
    return true;
}

/// The outline turns back at k (and maybe k+1): a pair listed in reverse order (swapping them
/// mends it), one point out of place (leaving it out mends it), or a doubling back.
[[noreturn]] void refuse_reversal(const RawOutline& raw, std::size_t k) {
    const auto& p = raw.points;
    std::ostringstream out;
    const auto swap = [](std::vector<Vec2>& v, std::size_t q) { std::swap(v[q], v[q + 1]); };
    std::optional<std::size_t> misplaced;
    for (const std::size_t d : {std::size_t{1}, std::size_t{0}}) {
        const auto drop = [d](std::vector<Vec2>& v, std::size_t q) {
            v.erase(v.begin() + static_cast<std::ptrdiff_t>(q + d));
        };
        if (!misplaced && k + d + 1 < p.size() && runs_on_after(p, k, drop)) misplaced = k + d;
    }
    if (k + 2 < p.size() && runs_on_after(p, k, swap)) {
        out << outline_location(raw, k) << ": " << point_label(raw, k) << " and "
            << point_label(raw, k + 1)
            << " are in reverse order (the outline runs back between them); swap them"
            << neighbours_text(raw, k, k + 1);
    } else if (misplaced) {
        const std::size_t bad = *misplaced;
        out << outline_location(raw, bad) << ": point " << format_point(p[bad])
            << " is out of place: the outline runs back to it and turns again (by "
            << turn_degrees(p, bad) << " degrees; at most " << OutlineTolerances::max_turn_degrees
            << " allowed away from the trailing edge)" << neighbours_text(raw, bad, bad);
    } else {
        out << outline_location(raw, k) << ": the outline doubles back on itself at "
            << format_point(p[k]) << " (turns by " << turn_degrees(p, k) << " degrees; at most "
            << OutlineTolerances::max_turn_degrees
            << " allowed away from the trailing edge; the points must start and end at the "
               "trailing edge)"
            << neighbours_text(raw, k, k);
    }
    throw InputError(out.str());
}

/// The trailing-edge ends are not checked. A loop started at the nose turns back at its sharp
/// trailing edge, the point farthest from its start, and is named as such.
void check_reversals(const RawOutline& raw) {
    const auto& p = raw.points;
    const std::size_t n = p.size();
    std::size_t farthest = 0;
    for (std::size_t k = 1; k < n; ++k)
        if (norm(p[k] - p[0]) > norm(p[farthest] - p[0])) farthest = k;
    const bool ends_apart = dot(p[1] - p[0], p[n - 2] - p[n - 1]) < 0.0;
    for (std::size_t k = 1; k + 1 < n; ++k) {
        if (!doubles_back(p, k)) continue;
        if (ends_apart && k + 1 >= farthest && k <= farthest + 1) refuse_loop_start(raw, 0);
        refuse_reversal(raw, k);
    }
}

/// A point far beyond all others (a typing error such as 1e308 or a value in other units) would
/// set the outline's size, and with it every size-relative tolerance, so that the error would be
/// blamed on innocent lines. Such a point is named first: farther from the median point than
/// `far_point_ratio` times the median distance (a section's points lie within about 4 times it).
void check_far_points(const RawOutline& raw) {
    constexpr double far_point_ratio = 1000.0;
    const auto& p = raw.points;
    const auto median = [](std::vector<double> v) {
        std::nth_element(v.begin(), v.begin() + static_cast<std::ptrdiff_t>(v.size() / 2), v.end());
        return v[v.size() / 2];
    };
    std::vector<double> xs(p.size()), ys(p.size()), reach(p.size());
    for (std::size_t k = 0; k < p.size(); ++k) {
        xs[k] = p[k].x;
        ys[k] = p[k].y;
    }
    const double cx = median(xs), cy = median(ys);
    for (std::size_t k = 0; k < p.size(); ++k)  // halved first: no overflow even at 1e308
        reach[k] = std::hypot(0.5 * (p[k].x - cx), 0.5 * (p[k].y - cy));
    const double typical = median(reach);
    for (std::size_t k = 0; k < p.size(); ++k)
        if (!(reach[k] <= far_point_ratio * typical) && typical > 0.0)
            throw InputError(outline_location(raw, k) + ": point " + format_point(p[k]) +
                             " lies far from all the others (more than 1000 times the typical "
                             "distance); a typing error? every point of the section belongs "
                             "on its outline" +
                             neighbours_text(raw, k, k));
}

/// Box of a segment widened by `tol`.
struct SegmentBox {
    double x0, x1, y0, y1;
};

/// The first crossing pair (a, b), a < b, in index order among the pairs of non-adjacent
/// segments whose boxes overlap; {0, 0} when there is none. Sweep and prune: the segments sorted
/// by their left edge, each compared only with those starting before its right edge ends. On a
/// section outline that is a handful per segment (the other surface at the same x), so 100000
/// points take milliseconds instead of the seconds of all pairs.
template <class Meets>
std::pair<std::size_t, std::size_t> first_crossing(const std::vector<SegmentBox>& box,
                                                   Meets&& meets) {
    const std::size_t segments = box.size();
    std::vector<std::size_t> order(segments);
    for (std::size_t k = 0; k < segments; ++k) order[k] = k;
    std::sort(order.begin(), order.end(),
              [&](std::size_t a, std::size_t b) { return box[a].x0 < box[b].x0; });
    std::pair<std::size_t, std::size_t> first{0, 0};
    for (std::size_t u = 0; u < segments; ++u) {
        const SegmentBox& a = box[order[u]];
        for (std::size_t w = u + 1; w < segments && box[order[w]].x0 <= a.x1; ++w) {
            const SegmentBox& b = box[order[w]];
            if (b.y1 < a.y0 || b.y0 > a.y1) continue;
            const std::size_t lo = std::min(order[u], order[w]), hi = std::max(order[u], order[w]);
            if (hi < lo + 2 || (lo == 0 && hi == segments - 1)) continue;  // neighbours
            const bool earlier = first == std::pair<std::size_t, std::size_t>{0, 0} ||
                                 std::make_pair(lo, hi) < first;
            if (earlier && meets(lo, hi)) first = {lo, hi};
        }
    }
    return first;
}

/// All pairs of non-adjacent segments of the closed polygon (the closing segment from the last
/// point to the first included unless they coincide; a closing point written twice at either end
/// left out); the first crossing in index order is reported.
void check_crossings(const RawOutline& raw, double size) {
    const double tol = OutlineTolerances::crossing_distance * size;
    const double same = OutlineTolerances::duplicate_distance * size;
    std::size_t lo = 0, hi = raw.points.size() - 1;
    while (lo + 1 < hi && norm(raw.points[lo + 1] - raw.points[lo]) <= same) ++lo;
    while (hi > lo + 1 && norm(raw.points[hi - 1] - raw.points[hi]) <= same) --hi;
    const std::vector<Vec2> p(raw.points.begin() + static_cast<std::ptrdiff_t>(lo),
                              raw.points.begin() + static_cast<std::ptrdiff_t>(hi) + 1);
    const std::size_t n = p.size();
    const bool closed = norm(p.back() - p.front()) <= tol;
    const std::size_t segments = closed ? n - 1 : n;  // segment k joins k and (k + 1) % n
    const auto end = [&](std::size_t k) { return p[(k + 1) % n]; };
    const auto name = [&](std::size_t k) { return segment_name(raw, lo + k, lo + (k + 1) % n); };
    std::vector<SegmentBox> box(segments);
    for (std::size_t k = 0; k < segments; ++k)
        box[k] = {std::min(p[k].x, end(k).x) - tol, std::max(p[k].x, end(k).x) + tol,
                  std::min(p[k].y, end(k).y) - tol, std::max(p[k].y, end(k).y) + tol};
    const auto [a, b] = first_crossing(box, [&](std::size_t s, std::size_t t) {
        return segment_distance(p[s], end(s), p[t], end(t)) <= tol;
    });
    if (a != b)
        throw InputError(raw.source + ": the outline crosses itself: " + name(a) + " meets " +
                         name(b) + " (a section outline must be one simple loop)");
}

}  // namespace

void refuse_loop_start(const RawOutline& raw, std::size_t first) {
    throw InputError(outline_location(raw, first) + ": the loop starts and ends at " +
                     format_point(raw.points[first]) +
                     ", where the outline is round (its two ends leave in opposite directions), "
                     "not at the trailing edge; start the loop at the trailing edge, or list the "
                     "two surfaces separately from the leading edge");
}

std::string outline_location(const RawOutline& raw, std::size_t k) {
    if (k < raw.lines.size()) return raw.source + ":" + std::to_string(raw.lines[k]);
    return raw.source + " (point " + std::to_string(k + 1) + ")";
}

std::string point_label(const RawOutline& raw, std::size_t k) {
    const std::string where = k < raw.lines.size() ? "line " + std::to_string(raw.lines[k])
                                                   : "point " + std::to_string(k + 1);
    return where + " " + format_point(raw.points[k]);
}

std::string neighbours_text(const RawOutline& raw, std::size_t first, std::size_t last) {
    std::string text = "; neighbours: ";
    if (first > 0) text += point_label(raw, first - 1);
    if (first > 0 && last + 1 < raw.points.size()) text += ", ";
    if (last + 1 < raw.points.size()) text += point_label(raw, last + 1);
    return text;
}

void check_outline(const RawOutline& raw) {
    const auto& p = raw.points;
    if (p.size() < OutlineTolerances::min_points) {
        throw InputError(raw.source + ": a section outline needs at least " +
                         std::to_string(OutlineTolerances::min_points) + " points, found " +
                         std::to_string(p.size()));
    }
    VEER_VERIFY(raw.lines.empty() || raw.lines.size() == p.size(), "one line number per point");
    check_far_points(raw);
    const double size = outline_size(p);
    if (!(size > 0.0) || !std::isfinite(size)) {
        throw InputError(raw.source + ": the outline has no extent (all points coincide)");
    }
    check_repeats(raw, size);
    check_closure(raw, size);
    check_reversals(raw);
    check_crossings(raw, size);
}

}  // namespace veer
