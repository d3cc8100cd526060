#pragma once
/// Stagnation, separation and reattachment points from the sign of the wall shear (Cf of
/// surface_distribution.hpp, positive where the wall flow runs aft).
///
/// Stagnation: where the shear along +i changes from negative to positive (the flow leaves the
/// point both ways), taking the change nearest to the largest Cp. Each surface is then walked from
/// the stagnation point (or the leading edge) to the trailing edge: Cf going from positive to
/// negative is a separation, from negative to positive a reattachment, both interpolated linearly
/// in arc length. A separation followed by a reattachment is a bubble (start, end); a separation
/// that no reattachment follows leaves the flow reversed up to the trailing edge.
#include <optional>
#include <vector>

#include "postprocess/surface_distribution.hpp"

namespace veer {

/// A point on the section surface.
struct SurfaceLocation {
    SurfaceSide side = SurfaceSide::upper;
    double arc = 0.0;  ///< from the leading-edge node, chords
    double x = 0.0;    ///< chords
    double y = 0.0;
};

/// A closed region of reversed flow.
struct SeparationBubble {
    SurfaceLocation start;  ///< separation
    SurfaceLocation end;    ///< reattachment
};

/// What one surface's wall shear shows, ordered from the leading edge aft.
struct SurfaceSeparation {
    std::vector<SurfaceLocation> separations;
    std::vector<SurfaceLocation> reattachments;
    std::vector<SeparationBubble> bubbles;
    /// The separation after which the flow stays reversed to the trailing edge, if any.
    std::optional<SurfaceLocation> trailing_edge_separation;
};

/// Stagnation point and both surfaces.
struct SeparationReport {
    SurfaceLocation stagnation;
    SurfaceSeparation upper;
    SurfaceSeparation lower;
};

/// The stagnation point of a distribution.
SurfaceLocation find_stagnation_point(const SurfaceDistribution& distribution);

/// Separation and reattachment on one surface (points ordered from the leading edge aft),
/// ignoring points with arc < start_arc (ahead of the stagnation point).
SurfaceSeparation find_surface_separation(const std::vector<SurfacePoint>& side, double start_arc);

/// Stagnation point, then both surfaces walked from it.
SeparationReport find_separation(const SurfaceDistribution& distribution);

}  // namespace veer
