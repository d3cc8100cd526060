#include "postprocess/kutta_check.hpp"

#include "mesh/errors.hpp"

namespace veer {

namespace {

/// Cp at arc `end` from the line through the last two points of a surface.
double extrapolate_to_end(const std::vector<SurfacePoint>& side, double end) {
    VEER_VERIFY(side.size() >= 2, "the Kutta check needs two faces on each surface");
    const SurfacePoint& a = side[side.size() - 2];
    const SurfacePoint& b = side.back();
    return b.cp + (b.cp - a.cp) * (end - b.arc) / (b.arc - a.arc);
}

}  // namespace

KuttaCheck kutta_check(const SurfaceDistribution& d) {
    KuttaCheck k;
    k.cp_upper = extrapolate_to_end(d.upper, d.upper_length);
    k.cp_lower = extrapolate_to_end(d.lower, d.lower_length);
    k.difference = k.cp_upper - k.cp_lower;
    k.cp_upper_last_face = d.upper.back().cp;
    k.cp_lower_last_face = d.lower.back().cp;
    return k;
}

}  // namespace veer
