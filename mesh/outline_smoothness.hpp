#pragma once
/// Points that break the smoothness of a surface (a spike, a kink): each point is compared with
/// the smooth curve through its two neighbours on either side.
#include "mesh/raw_outline.hpp"
#include "mesh/trailing_edge.hpp"

namespace veer {

/// The offset d_k of point k is its signed distance from the cubic through its neighbours
/// (k-2, k-1, k+1, k+2, in chord length). On a smooth but coarse table those offsets are
/// systematic and vary slowly along the surface; an error in one point adds an isolated pattern
/// (+e at the point, about -2e/3 at its neighbours). The excess e_k = d_k - (d_{k-1} + d_{k+1})/2
/// removes the systematic part; a point is refused when |e_k| exceeds both limits: in chords, and
/// relative to the half-distance between its neighbours. Set from NACA sections from the
/// formula (Abbott & von Doenhoff 1959, section 6.4): 0006 to 0021, cambered up to 6 %, 12 to 161
/// stations per surface (cosine, even, or typical of published tables) rounded to 4-6 decimals.
/// Three or more stations from the nose they stay below 0.03 of the spacing (limit 0.1); one or
/// two stations from it a coarse nose of a thin section lies up to 2.7 spacings off such a curve
/// (0006 at 12 cosine stations), so there only errors beyond 3 spacings are caught.
struct SmoothnessLimits {
    static constexpr double offset = 5e-4;  ///< chords
    static constexpr double offset_to_spacing = 0.1;
    static constexpr std::size_t nose_stations = 2;  ///< stations each side of the nose
    static constexpr double nose_offset = 1e-3;      ///< chords
    static constexpr double nose_offset_to_spacing = 3.0;
};

/// Throws a one-line InputError for the point of `w` (base points set aside, any orientation)
/// farthest beyond the limits: its file line and coordinates, its neighbours, how far it is off
/// and where the curve through its neighbours passes. An error in one point also disturbs its
/// neighbours' figures, so the point named is the one farthest off among the two on either side
/// of the first found beyond the limits. `raw` names the points.
void check_smoothness(const RawOutline& raw, const OutlineWork& w);

}  // namespace veer
