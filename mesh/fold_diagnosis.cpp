#include "mesh/fold_diagnosis.hpp"

#include <algorithm>
#include <cmath>
#include <iomanip>
#include <numbers>
#include <sstream>

namespace veer {
namespace {

constexpr double degrees(double radians) { return radians * 180.0 / std::numbers::pi; }

/// Signed turn at surface node k (radians): the nodes run clockwise around the section, so a
/// convex turn is negative and a concave (inward) bend positive.
double turn_at(const std::vector<Vec2>& s, std::size_t k) {
    const Vec2 a = s[k] - s[k - 1], b = s[k + 1] - s[k];
    return std::atan2(cross(a, b), dot(a, b));
}

struct LocalShape {
    std::size_t tightest = 0;  ///< node of the tightest concave bend (0: none)
    double concave_radius = HUGE_VAL;
    std::size_t sharpest = 0;  ///< node of the largest turn
    double sharpest_turn = 0.0;
};

LocalShape local_shape(const std::vector<Vec2>& s, std::size_t centre) {
    LocalShape shape;
    const std::size_t reach = FoldCauseLimits::reach;
    const std::size_t lo = std::max<std::size_t>(1, centre > reach ? centre - reach : 1);
    const std::size_t hi = std::min(s.size() - 2, centre + reach);
    for (std::size_t k = lo; k <= hi; ++k) {
        const double turn = turn_at(s, k);
        if (std::abs(turn) > std::abs(shape.sharpest_turn)) {
            shape.sharpest = k;
            shape.sharpest_turn = turn;
        }
        if (turn > 0.0) {
            const double radius = 0.5 * (norm(s[k] - s[k - 1]) + norm(s[k + 1] - s[k])) / turn;
            if (radius < shape.concave_radius) {
                shape.concave_radius = radius;
                shape.tightest = k;
            }
        }
    }
    return shape;
}

std::size_t nearest_point(const Section& section, Vec2 p) {
    std::size_t best = 0;
    for (std::size_t k = 1; k < section.points.size(); ++k)
        if (norm(section.points[k] - p) < norm(section.points[best] - p)) best = k;
    return best;
}

/// " (near file line L)" for the section point nearest p; "" when veer added that point.
std::string line_near(const Section& section, Vec2 p) {
    const std::size_t k = nearest_point(section, p);
    const int line = k < section.lines.size() ? section.lines[k] : 0;
    return line > 0 ? " (near file line " + std::to_string(line) + ")" : "";
}

/// Whether the section point nearest p belongs to the closure of a blunt trailing edge: the
/// points veer added at either end of the outline, beyond the first and last source points.
bool on_closure(const Section& section, Vec2 p) {
    if (section.closure.form == TrailingEdgeClosure::Form::sharp) return false;
    const auto& lines = section.lines;
    const auto first = std::find_if(lines.begin(), lines.end(), [](int l) { return l > 0; });
    if (first == lines.end()) return false;  // a generated outline: its tip is the closure
    const auto last = std::find_if(lines.rbegin(), lines.rend(), [](int l) { return l > 0; });
    const auto k = static_cast<std::ptrdiff_t>(nearest_point(section, p));
    return k < first - lines.begin() ||
           k > static_cast<std::ptrdiff_t>(lines.size()) - 1 - (last - lines.rbegin());
}

std::string region(const GridFoldError& e, const Section& section, const std::vector<Vec2>& surface,
                   const CGridSpec& spec, Vec2 at) {
    const int i_surface = e.fold.i - spec.wake;
    std::ostringstream out;
    out << std::setprecision(4);
    if (i_surface < 0 || i_surface >= spec.around) {
        out << "above the wake cut " << e.fold.where.x - surface.front().x
            << " chords behind the trailing edge";
        return out.str();
    }
    const Vec2 nose = surface[static_cast<std::size_t>(spec.around / 2)];
    if (on_closure(section, at))
        out << "off the trailing-edge closure veer added (blunt edge, gap "
            << 100.0 * section.closure.gap << "% chord)";
    else if (norm(at - nose) <= 0.05)
        out << "off the nose" << line_near(section, at);
    else
        out << "off the " << (i_surface < spec.around / 2 ? "lower" : "upper")
            << " surface at x = " << at.x << line_near(section, at);
    return out.str();
}

}  // namespace

std::string explain_fold(const GridFoldError& e, const Section& section,
                         const std::vector<Vec2>& surface, const CGridSpec& spec) {
    const int i_surface = std::clamp(e.fold.i - spec.wake, 0, spec.around - 1);
    const bool in_wake = e.fold.i < spec.wake || e.fold.i >= spec.wake + spec.around;
    const auto m = static_cast<std::size_t>(i_surface);
    const Vec2 at = 0.5 * (surface[m] + surface[m + 1]);
    std::ostringstream out;
    out << std::setprecision(4) << "mesh: the C-grid folds at cell (" << e.fold.i << ", "
        << e.fold.j << ") near (" << e.fold.where.x << ", " << e.fold.where.y << "), "
        << region(e, section, surface, spec, at) << "; ";
    const LocalShape shape = local_shape(surface, m);
    const std::size_t last = surface.size() - 1;
    if (shape.tightest > 0 &&
        shape.concave_radius < FoldCauseLimits::concave_radius_to_distance * e.distance) {
        const Vec2 p = surface[shape.tightest];
        out << "the outline bends inwards at (" << p.x << ", " << p.y << ")"
            << line_near(section, p) << " with a radius of " << shape.concave_radius
            << " chords, and lines marched from a concave bend meet about one radius out (these "
               "folded "
            << e.distance << " chords out); check the coordinates there, or give the bend a "
            << "radius several times larger";
    } else if (std::abs(degrees(shape.sharpest_turn)) >= FoldCauseLimits::corner_degrees) {
        const Vec2 p = surface[shape.sharpest];
        out << "the outline turns by " << std::abs(degrees(shape.sharpest_turn))
            << " degrees at one surface node (" << p.x << ", " << p.y << ")"
            << line_near(section, p)
            << "; check the coordinates there for a corner or a wrong point, or use more cells "
               "around (around = "
            << spec.around << ") to follow it";
    } else if (in_wake &&
               e.fold.where.x - surface.front().x < FoldCauseLimits::near_trailing_edge) {
        const double half =
            0.5 * degrees(std::acos(std::clamp(
                      dot(surface[1] - surface[0], surface[last - 1] - surface[0]) /
                          (norm(surface[1] - surface[0]) * norm(surface[last - 1] - surface[0])),
                      -1.0, 1.0)));
        out << "the trailing-edge tip, where the wall meets the wake cut at a half-angle of "
            << half << " degrees; use more normal cells (normal = " << spec.normal
            << ") or a smaller first_cell (" << spec.first_cell << ")";
    } else {
        out << "no sharp feature of the outline lies below it; use more normal cells (normal = "
            << spec.normal << "), a smaller first_cell (" << spec.first_cell
            << "), a smaller far_field (" << spec.far_field
            << ") or more cells around (around = " << spec.around << ")";
    }
    return out.str();
}

}  // namespace veer
