#include "mesh/section_builder.hpp"

#include <algorithm>
#include <sstream>

#include "mesh/chord_frame.hpp"
#include "mesh/errors.hpp"
#include "mesh/outline_checks.hpp"
#include "mesh/outline_smoothness.hpp"
#include "mesh/trailing_edge.hpp"

namespace veer {
namespace {

/// Twice the signed area (shoelace): negative for the clockwise Section order.
double twice_signed_area(const std::vector<Vec2>& p) {
    double a = 0.0;
    for (std::size_t k = 0; k < p.size(); ++k) a += cross(p[k], p[(k + 1) % p.size()]);
    return a;
}

/// Largest distance of a point from the trailing-edge midpoint: about the chord.
double outline_size(const std::vector<Vec2>& p) {
    const Vec2 te = 0.5 * (p.front() + p.back());
    double size = 0.0;
    for (const Vec2& q : p) size = std::max(size, norm(q - te));
    return size;
}

/// The gap left once the base points are set aside must be one the closure accepts.
void check_gap(const RawOutline& raw, const OutlineWork& w) {
    const double size = outline_size(w.points);
    const double gap = norm(w.points.back() - w.points.front()) / size;
    if (gap <= OutlineTolerances::max_closure_gap) return;
    std::ostringstream out;
    out << raw.source << ": the trailing edge is " << gap << " chords thick (between "
        << point_label(raw, w.source.front()) << " and " << point_label(raw, w.source.back())
        << ", the base drawn across it set aside); at most " << OutlineTolerances::max_closure_gap
        << " allowed";
    throw InputError(out.str());
}

}  // namespace

Section make_section(const RawOutline& raw, const std::string& name, ChordLineChoice chord_line) {
    check_outline(raw);
    OutlineWork w{raw.points, std::vector<std::size_t>(raw.points.size()), 0};
    for (std::size_t k = 0; k < w.source.size(); ++k) w.source[k] = k;
    std::optional<std::size_t> hint = raw.leading_edge;
    VEER_VERIFY(!hint || *hint < w.points.size(), "leading-edge index inside the outline");
    Section section;
    section.name = name;
    const bool upper_first = twice_signed_area(w.points) > 0.0;  // counter-clockwise
    if (!raw.layout.empty())
        section.layout =
            raw.layout + (upper_first ? ", upper surface first" : ", lower surface first");
    if (upper_first) {
        std::reverse(w.points.begin(), w.points.end());
        std::reverse(w.source.begin(), w.source.end());
        if (hint) hint = w.points.size() - 1 - *hint;
    }
    if (hint) {  // a generator's own chord line: nothing moves
        w.nose = *hint;
        section.frame.choice = chord_line;
        section.frame.found_trailing_edge = 0.5 * (w.points.front() + w.points.back());
        section.frame.found_foremost = w.points[w.nose];
    } else {
        section.closure.base_points_set_aside = set_aside_base_points(w, outline_size(w.points));
        const int set_aside = section.closure.base_points_set_aside;
        if (set_aside > 0) check_gap(raw, w);
        check_ends_at_trailing_edge(raw, w);
        check_smoothness(raw, w);
        section.frame = choose_frame(w, chord_line, raw.source);
        apply_frame(w, section.frame);
    }
    const int set_aside = section.closure.base_points_set_aside;
    section.closure = close_trailing_edge(w);
    section.closure.base_points_set_aside = set_aside;
    section.points = std::move(w.points);
    section.lines.reserve(w.source.size());
    for (const std::size_t k : w.source)
        section.lines.push_back(k != OutlineWork::added && k < raw.lines.size() ? raw.lines[k] : 0);
    section.leading_edge = w.nose;
    return section;
}

}  // namespace veer
