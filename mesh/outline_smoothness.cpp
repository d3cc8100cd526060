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

struct Offender {
    std::size_t k = 0;
    double score = 0.0;  ///< above 1: beyond both limits
    double offset = 0.0;
    double spacing = 0.0;
    Vec2 curve;
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

}  // namespace

void check_smoothness(const RawOutline& raw, const OutlineWork& w) {
    const auto& p = w.points;
    if (p.size() < 5) return;
    const Vec2 te = 0.5 * (p.front() + p.back());
    std::size_t nose = 0;
    for (std::size_t k = 1; k < p.size(); ++k) {
        if (norm(p[k] - te) > norm(p[nose] - te)) nose = k;
    }
    const double chord = norm(p[nose] - te);
    Offender worst;
    for (std::size_t k = 2; k + 2 < p.size(); ++k) {
        const Vec2 curve = neighbour_curve(p, k);
        const double offset = norm(p[k] - curve) / chord;
        const double spacing = 0.5 * norm(p[k + 1] - p[k - 1]) / chord;
        const bool near_nose = norm(p[k] - p[nose]) / chord <= SmoothnessLimits::nose_zone;
        const double d_lim = near_nose ? SmoothnessLimits::nose_offset : SmoothnessLimits::offset;
        const double r_lim = near_nose ? SmoothnessLimits::nose_offset_to_spacing
                                       : SmoothnessLimits::offset_to_spacing;
        const double score = std::min(offset / d_lim, offset / spacing / r_lim);
        if (score > worst.score) worst = {k, score, offset, spacing, curve};
    }
    if (worst.score <= 1.0) return;
    // A point far off pulls the curves of its neighbours off by up to 2/3 of its own offset: the
    // culprit is the point farthest off within two places of the first one found.
    for (std::size_t k = std::max<std::size_t>(2, worst.k - 2);
         k <= worst.k + 2 && k + 2 < p.size(); ++k) {
        const Vec2 curve = neighbour_curve(p, k);
        const double offset = norm(p[k] - curve) / chord;
        if (offset > worst.offset)
            worst = {k, worst.score, offset, 0.5 * norm(p[k + 1] - p[k - 1]) / chord, curve};
    }
    const std::size_t k = worst.k, at = w.source[k];
    VEER_VERIFY(at != OutlineWork::added, "smoothness is checked on source points only");
    std::ostringstream out;
    out << outline_location(raw, at) << ": point " << format_point(p[k])
        << " breaks the smoothness of the " << surface_of(w, k, nose)
        << " (a spike or a kink): it lies " << worst.offset << " chords ("
        << worst.offset / worst.spacing
        << " times the local spacing) off the smooth curve through its neighbours, which passes "
        << format_point(worst.curve) << "; check the line for a typing error"
        << neighbours_text(raw, at, at);
    throw InputError(out.str());
}

}  // namespace veer
