#include "postprocess/separation.hpp"

#include <cmath>
#include <limits>

namespace veer {

namespace {

/// A surface point on one line through both surfaces: sigma = -arc on the lower surface, +arc on
/// the upper, and g the wall shear along +i (the direction of increasing sigma).
struct LinePoint {
    double sigma, g, cp, x, y;
};

std::vector<LinePoint> along_i(const SurfaceDistribution& d) {
    std::vector<LinePoint> line;
    for (auto p = d.lower.rbegin(); p != d.lower.rend(); ++p)
        line.push_back({-p->arc, -p->cf, p->cp, p->x, p->y});
    for (const SurfacePoint& p : d.upper) line.push_back({p.arc, p.cf, p.cp, p.x, p.y});
    return line;
}

/// Fraction t in [0, 1] where the linear interpolant of f between fa and fb vanishes.
double zero_fraction(double fa, double fb) {
    const double df = fa - fb;
    return df == 0.0 ? 0.5 : fa / df;
}

SurfaceLocation from_sigma(double sigma, double x, double y) {
    return {sigma < 0.0 ? SurfaceSide::lower : SurfaceSide::upper, std::abs(sigma), x, y};
}

SurfaceLocation on_side(const SurfacePoint& a, const SurfacePoint& b) {
    const double t = zero_fraction(a.cf, b.cf);
    return {a.side, a.arc + t * (b.arc - a.arc), a.x + t * (b.x - a.x), a.y + t * (b.y - a.y)};
}

}  // namespace

SurfaceLocation find_stagnation_point(const SurfaceDistribution& distribution) {
    const std::vector<LinePoint> line = along_i(distribution);
    VEER_VERIFY(!line.empty(), "stagnation point of an empty surface distribution");
    std::size_t peak = 0;
    for (std::size_t k = 1; k < line.size(); ++k)
        if (line[k].cp > line[peak].cp) peak = k;
    SurfaceLocation best = from_sigma(line[peak].sigma, line[peak].x, line[peak].y);
    double best_gap = std::numeric_limits<double>::max();
    for (std::size_t k = 0; k + 1 < line.size(); ++k) {
        const LinePoint &a = line[k], &b = line[k + 1];
        if (!(a.g < 0.0 && b.g >= 0.0)) continue;
        const double t = zero_fraction(a.g, b.g);
        const double sigma = a.sigma + t * (b.sigma - a.sigma);
        const double gap = std::abs(sigma - line[peak].sigma);
        if (gap < best_gap) {
            best_gap = gap;
            best = from_sigma(sigma, a.x + t * (b.x - a.x), a.y + t * (b.y - a.y));
        }
    }
    return best;
}

SurfaceSeparation find_surface_separation(const std::vector<SurfacePoint>& side, double start_arc) {
    SurfaceSeparation out;
    const SurfacePoint* previous = nullptr;
    std::optional<SurfaceLocation> open;  // separation not yet reattached
    for (const SurfacePoint& p : side) {
        if (p.arc < start_arc) continue;
        if (previous == nullptr) {
            if (p.cf < 0.0) open = SurfaceLocation{p.side, p.arc, p.x, p.y};  // reversed at once
            if (open) out.separations.push_back(*open);
        } else if (previous->cf >= 0.0 && p.cf < 0.0) {
            open = on_side(*previous, p);
            out.separations.push_back(*open);
        } else if (previous->cf < 0.0 && p.cf >= 0.0) {
            const SurfaceLocation reattach = on_side(*previous, p);
            out.reattachments.push_back(reattach);
            if (open) out.bubbles.push_back({*open, reattach});
            open.reset();
        }
        previous = &p;
    }
    out.trailing_edge_separation = open;
    return out;
}

SeparationReport find_separation(const SurfaceDistribution& distribution) {
    SeparationReport r;
    r.stagnation = find_stagnation_point(distribution);
    const bool on_upper = r.stagnation.side == SurfaceSide::upper;
    r.upper = find_surface_separation(distribution.upper, on_upper ? r.stagnation.arc : 0.0);
    r.lower = find_surface_separation(distribution.lower, on_upper ? 0.0 : r.stagnation.arc);
    return r;
}

}  // namespace veer
