#include "postprocess/transition_locator.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

#include "solver/spalart_allmaras_terms.hpp"

namespace veer {

double WallTurbulenceIndex::at(int i) const {
    const int k = i - first_i;
    VEER_VERIFY(k >= 0 && k < static_cast<int>(values.size()),
                "turbulence index asked for a face that is not on the wall");
    return values[static_cast<std::size_t>(k)];
}

WallTurbulenceIndex turbulence_index(const StructuredGrid& grid, const GridMetrics& metrics,
                                     const std::vector<double>& nu_tilde,
                                     const std::vector<WallFaceState>& wall) {
    VEER_VERIFY(nu_tilde.size() == static_cast<std::size_t>(grid.ni()) * grid.nj(),
                "nu_tilde does not match the grid");
    VEER_VERIFY(!wall.empty(), "turbulence index of an empty wall");
    const double kappa = SpalartAllmarasConstants::kappa;
    WallTurbulenceIndex out;
    out.first_i = wall.front().i;
    out.values.reserve(wall.size());
    for (const WallFaceState& f : wall) {
        VEER_VERIFY(f.i == out.first_i + static_cast<int>(out.values.size()),
                    "wall faces are not consecutive");
        const std::size_t c0 = metrics.cell(f.i, 0), c1 = metrics.cell(f.i, 1);
        const double d0 = dot(metrics.centroid[c0] - f.center, f.normal);
        const double d1 = dot(metrics.centroid[c1] - f.center, f.normal);
        const double dnu_dn = one_sided_wall_derivative(d0, nu_tilde[c0], d1, nu_tilde[c1]);
        // nu Omega_wall = nu |du_t/dn| = |tau_w| (tau_w is already nu du_t/dn).
        const double u_tau = std::sqrt(std::abs(f.shear));
        out.values.push_back(u_tau > 0.0 ? dnu_dn / (kappa * u_tau)
                                         : std::numeric_limits<double>::quiet_NaN());
    }
    return out;
}

namespace {

/// Whether i_t stays at or above the threshold from points[k] over the hold arc (NaN fails).
bool holds_from(const std::vector<SurfacePoint>& side, const WallTurbulenceIndex& index,
                std::size_t k, const TransitionCriterion& c) {
    for (std::size_t m = k; m < side.size(); ++m) {
        if (side[m].arc > side[k].arc + c.hold_arc) break;
        if (!(index.at(side[m].i) >= c.threshold)) return false;
    }
    return true;
}

SurfaceLocation location_of(const SurfacePoint& p) { return {p.side, p.arc, p.x, p.y}; }

/// Between a (below the threshold) and b (at or above it), linear in i_t.
SurfaceLocation crossing(const SurfacePoint& a, double ia, const SurfacePoint& b, double ib,
                         double threshold) {
    const double t = std::isfinite(ia) && ib > ia ? (threshold - ia) / (ib - ia) : 1.0;
    return {a.side, a.arc + t * (b.arc - a.arc), a.x + t * (b.x - a.x), a.y + t * (b.y - a.y)};
}

}  // namespace

namespace {

/// find_surface_transition, also telling whether the surface is turbulent from its first point.
std::optional<SurfaceLocation> locate(const std::vector<SurfacePoint>& side,
                                      const WallTurbulenceIndex& index, double start_arc,
                                      const TransitionCriterion& criterion, bool& from_first) {
    from_first = false;
    const SurfacePoint* previous = nullptr;
    for (std::size_t k = 0; k < side.size(); ++k) {
        const SurfacePoint& p = side[k];
        if (p.arc < start_arc) continue;
        if (index.at(p.i) >= criterion.threshold && holds_from(side, index, k, criterion)) {
            from_first = previous == nullptr;
            if (from_first) return location_of(p);
            return crossing(*previous, index.at(previous->i), p, index.at(p.i),
                            criterion.threshold);
        }
        previous = &p;
    }
    return std::nullopt;
}

}  // namespace

std::optional<SurfaceLocation> find_surface_transition(const std::vector<SurfacePoint>& side,
                                                       const WallTurbulenceIndex& index,
                                                       double start_arc,
                                                       const TransitionCriterion& criterion) {
    bool from_first = false;
    return locate(side, index, start_arc, criterion, from_first);
}

TransitionReport find_transition(const SurfaceDistribution& distribution,
                                 const WallTurbulenceIndex& index,
                                 const SurfaceLocation& stagnation,
                                 const TransitionCriterion& criterion) {
    const bool on_upper = stagnation.side == SurfaceSide::upper;
    TransitionReport r;
    r.upper = locate(distribution.upper, index, on_upper ? stagnation.arc : 0.0, criterion,
                     r.upper_from_leading_edge);
    r.lower = locate(distribution.lower, index, on_upper ? 0.0 : stagnation.arc, criterion,
                     r.lower_from_leading_edge);
    return r;
}

double reported_transition_x(const SurfaceLocation& at) { return std::max(0.0, at.x); }

}  // namespace veer
