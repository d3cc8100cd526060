#include "mesh/outline_smoothness.hpp"

#include <algorithm>
#include <sstream>

#include "mesh/errors.hpp"
#include "mesh/outline_checks.hpp"

namespace veer {
namespace {

/// The cubic through the four neighbours of point k, in cumulative chord length (the point's
/// own parameter from its distances to them), evaluated where point k sits.
Vec2 neighbour_curve(const std::vector<Vec2>& p, std::size_t k) {
    double t[5] = {0.0, 0.0, 0.0, 0.0, 0.0};
    for (std::size_t q = 1; q < 5; ++q) t[q] = t[q - 1] + norm(p[k - 2 + q] - p[k - 3 + q]);
    const double at = t[2];
    const std::size_t idx[4] = {k - 2, k - 1, k + 1, k + 2};
    const double ts[4] = {t[0], t[1], t[3], t[4]};
    Vec2 sum{0.0, 0.0};
    for (std::size_t a = 0; a < 4; ++a) {
        double weight = 1.0;
        for (std::size_t b = 0; b < 4; ++b) {
            if (b != a) weight *= (at - ts[b]) / (ts[a] - ts[b]);
        }
        sum = sum + weight * p[idx[a]];
    }
    return sum;
}

/// Signed offset of point k from the cubic through its neighbours (positive to the left of the
/// outline's direction), and that curve's point.
struct Offset {
    double signed_offset = 0.0;
    Vec2 curve;
};

Offset offset_at(const std::vector<Vec2>& p, std::size_t k) {
    const Vec2 curve = neighbour_curve(p, k);
    const double side = cross(p[k + 1] - p[k - 1], p[k] - curve) >= 0.0 ? 1.0 : -1.0;
    return {side * norm(p[k] - curve), curve};
}

struct Offender {
    std::size_t k = 0;
    double score = 0.0;    ///< above 1: beyond both limits
    double excess = 0.0;   ///< chords
    double spacing = 0.0;  ///< chords
};

std::string surface_of(const OutlineWork& w, std::size_t k, std::size_t nose) {
    if (k == nose) return "nose";
    const bool before = k < nose;
    // clockwise outlines (negative area) run along the lower surface first
    double area = 0.0;
    for (std::size_t q = 0; q < w.points.size(); ++q)
        area += cross(w.points[q], w.points[(q + 1) % w.points.size()]);
    return (before == (area < 0.0)) ? "lower surface" : "upper surface";
}

std::size_t nose_of(const std::vector<Vec2>& p) {
    const Vec2 te = 0.5 * (p.front() + p.back());
    std::size_t nose = 0;
    for (std::size_t k = 1; k < p.size(); ++k)
        if (norm(p[k] - te) > norm(p[nose] - te)) nose = k;
    return nose;
}

}  // namespace

void check_smoothness(const RawOutline& raw, const OutlineWork& w) {
    const auto& p = w.points;
    if (p.size() < 7) return;
    const std::size_t nose = nose_of(p);
    const double chord = norm(p[nose] - 0.5 * (p.front() + p.back()));
    std::vector<double> d(p.size(), 0.0);
    for (std::size_t k = 2; k + 2 < p.size(); ++k) d[k] = offset_at(p, k).signed_offset / chord;
    Offender worst;
    for (std::size_t k = 3; k + 3 < p.size(); ++k) {
        const double excess = std::abs(d[k] - 0.5 * (d[k - 1] + d[k + 1]));
        const double spacing = 0.5 * norm(p[k + 1] - p[k - 1]) / chord;
        const bool near_nose = (k > nose ? k - nose : nose - k) <= SmoothnessLimits::nose_stations;
        const double d_lim = near_nose ? SmoothnessLimits::nose_offset : SmoothnessLimits::offset;
        const double r_lim = near_nose ? SmoothnessLimits::nose_offset_to_spacing
                                       : SmoothnessLimits::offset_to_spacing;
        const double score = std::min(excess / d_lim, excess / spacing / r_lim);
        if (score > worst.score) worst = {k, score, excess, spacing};
    }
    if (worst.score <= 1.0) return;
    // The culprit: of the points within two places, the one farthest off (relative to its
    // spacing) among those that stand out the way a wrong point does, off to the other side
    // from both neighbours; a coarse nose is off to one side throughout and is not picked.
    const auto relative = [&](std::size_t q) {
        return std::abs(d[q]) / (0.5 * norm(p[q + 1] - p[q - 1]) / chord);
    };
    std::size_t k = worst.k;
    double best = 0.0;
    for (std::size_t q = std::max<std::size_t>(3, worst.k - 2);
         q <= worst.k + 2 && q + 3 < p.size(); ++q) {
        const bool stands_out = d[q] * d[q - 1] < 0.0 && d[q] * d[q + 1] < 0.0;
        if (stands_out && relative(q) > best) {
            best = relative(q);
            k = q;
        }
    }
    const std::size_t at = w.source[k];
    VEER_VERIFY(at != OutlineWork::added, "smoothness is checked on source points only");
    const Offset off = offset_at(p, k);
    const double spacing = 0.5 * norm(p[k + 1] - p[k - 1]);
    std::ostringstream out;
    out << outline_location(raw, at) << ": point " << format_point(p[k])
        << " breaks the smoothness of the " << surface_of(w, k, nose)
        << " (a spike or a kink): it lies " << std::abs(off.signed_offset) / chord << " chords ("
        << std::abs(off.signed_offset) / spacing
        << " times the local spacing) off the smooth curve through its neighbours, which passes "
        << format_point(off.curve) << "; check the line for a typing error"
        << neighbours_text(raw, at, at);
    throw InputError(out.str());
}

}  // namespace veer
