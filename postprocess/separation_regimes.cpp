#include "postprocess/separation_regimes.hpp"

namespace veer {

std::string kind_words(SeparationKind kind) {
    switch (kind) {
        case SeparationKind::laminar_bubble:
            return "laminar bubble";
        case SeparationKind::laminar_separation:
            return "laminar separation";
        case SeparationKind::turbulent_separation:
            return "turbulent separation";
    }
    return "";
}

namespace {

SeparatedRegion classify(const SurfaceLocation& start, const std::optional<SurfaceLocation>& end,
                         const std::optional<SurfaceLocation>& transition) {
    SeparatedRegion r;
    r.start = start;
    r.end = end;
    const bool turbulent_ahead = transition && transition->arc <= start.arc;
    if (turbulent_ahead) {
        r.kind = SeparationKind::turbulent_separation;
        return r;
    }
    r.kind = end ? SeparationKind::laminar_bubble : SeparationKind::laminar_separation;
    if (transition && (!end || transition->arc <= end->arc)) r.transition = transition;
    return r;
}

}  // namespace

std::vector<SeparatedRegion> separated_regions(const SurfaceSeparation& separation,
                                               const std::optional<SurfaceLocation>& transition) {
    std::vector<SeparatedRegion> out;
    for (const SeparationBubble& b : separation.bubbles)
        out.push_back(classify(b.start, b.end, transition));
    if (separation.trailing_edge_separation)
        out.push_back(classify(*separation.trailing_edge_separation, std::nullopt, transition));
    return out;
}

}  // namespace veer
