#pragma once
/// Each separated region of a surface told apart by where the layer turned turbulent
/// (transition_locator.hpp):
///
///   - laminar bubble: separates ahead of transition (or with no transition) and reattaches; the
///     transition, when there is one, lies inside the bubble (separation, transition,
///     reattachment) — the bubble of Reynolds numbers 1e5 to 1e6 that a turbulent layer closes;
///   - laminar separation: separates ahead of transition and never reattaches (a burst bubble,
///     or a laminar layer leaving the wall for good);
///   - turbulent separation: separates at or behind transition, closed or not.
///
/// A run without a transition position on a surface (laminar model, or a layer laminar to the
/// trailing edge) has laminar regions only.
#include <optional>
#include <string>
#include <vector>

#include "postprocess/separation.hpp"

namespace veer {

enum class SeparationKind { laminar_bubble, laminar_separation, turbulent_separation };

/// "laminar bubble", "laminar separation", "turbulent separation".
std::string kind_words(SeparationKind kind);

/// One region of reversed flow on one surface.
struct SeparatedRegion {
    SeparationKind kind = SeparationKind::laminar_bubble;
    SurfaceLocation start;               ///< separation
    std::optional<SurfaceLocation> end;  ///< reattachment; none: reversed to the trailing edge
    std::optional<SurfaceLocation> transition;  ///< the surface's transition when inside the region
};

/// The bubbles and the trailing-edge separation of one surface, ordered from the leading edge,
/// each with its kind.
std::vector<SeparatedRegion> separated_regions(const SurfaceSeparation& separation,
                                               const std::optional<SurfaceLocation>& transition);

}  // namespace veer
