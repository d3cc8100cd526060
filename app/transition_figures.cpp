#include "app/transition_figures.hpp"

#include <fmt/format.h>

namespace veer {
namespace {

nlohmann::json x_or_null(const std::optional<SurfaceLocation>& l) {
    return l ? nlohmann::json(l->x) : nlohmann::json(nullptr);
}

nlohmann::json laminar_bubbles(const std::vector<SeparatedRegion>& regions) {
    nlohmann::json out = nlohmann::json::array();
    for (const SeparatedRegion& r : regions)
        if (r.kind == SeparationKind::laminar_bubble)
            out.push_back({r.start.x, x_or_null(r.transition), x_or_null(r.end)});
    return out;
}

nlohmann::json first_start(const std::vector<SeparatedRegion>& regions, SeparationKind kind) {
    const SeparatedRegion* r = first_of_kind(regions, kind);
    return r ? nlohmann::json(r->start.x) : nlohmann::json(nullptr);
}

nlohmann::json transition_or_null(const std::optional<SurfaceLocation>& t) {
    return t ? nlohmann::json(reported_transition_x(*t)) : nlohmann::json(nullptr);
}

std::string surface_transition(const std::optional<SurfaceLocation>& t, bool from_leading_edge) {
    if (!t) return "laminar to the trailing edge";
    if (from_leading_edge) return "turbulent from the leading edge";
    return fmt::format("x/c {:.3f}", reported_transition_x(*t));
}

}  // namespace

const SeparatedRegion* first_of_kind(const std::vector<SeparatedRegion>& regions,
                                     SeparationKind kind) {
    for (const SeparatedRegion& r : regions)
        if (r.kind == kind) return &r;
    return nullptr;
}

nlohmann::json transition_summary(const RunAnalysis& a) {
    const TransitionCriterion criterion;
    return {
        {"transition_upper", transition_or_null(a.transition.upper)},
        {"transition_lower", transition_or_null(a.transition.lower)},
        {"turbulent_from_leading_edge_upper", a.transition.upper_from_leading_edge},
        {"turbulent_from_leading_edge_lower", a.transition.lower_from_leading_edge},
        {"turbulence_index_threshold", criterion.threshold},
        {"turbulence_index_hold", criterion.hold_arc},
        {"laminar_bubbles_upper", laminar_bubbles(a.regions_upper)},
        {"laminar_bubbles_lower", laminar_bubbles(a.regions_lower)},
        {"laminar_separation_upper",
         first_start(a.regions_upper, SeparationKind::laminar_separation)},
        {"laminar_separation_lower",
         first_start(a.regions_lower, SeparationKind::laminar_separation)},
        {"turbulent_separation_upper",
         first_start(a.regions_upper, SeparationKind::turbulent_separation)},
        {"turbulent_separation_lower",
         first_start(a.regions_lower, SeparationKind::turbulent_separation)},
    };
}

std::string transition_line(const RunAnalysis& a) {
    if (!a.has_turbulence_index) return "";
    return fmt::format(
        "transition (turbulence index through {:g}): upper {}, lower {}",
        TransitionCriterion{}.threshold,
        surface_transition(a.transition.upper, a.transition.upper_from_leading_edge),
        surface_transition(a.transition.lower, a.transition.lower_from_leading_edge));
}

std::string regions_text(const std::vector<SeparatedRegion>& regions) {
    std::string out;
    for (const SeparatedRegion& r : regions) {
        out += out.empty() ? "" : ", ";
        out += kind_words(r.kind);
        out += r.end ? fmt::format(" {:.3f}-{:.3f}", r.start.x, r.end->x)
                     : fmt::format(" from {:.3f} to the trailing edge", r.start.x);
        if (r.transition) out += fmt::format(" (transition {:.3f} inside)", r.transition->x);
    }
    return out;
}

}  // namespace veer
