#include "app/reader_labels.hpp"

#include <fmt/format.h>

#include <array>
#include <utility>

namespace veer {
namespace {

/// summary.json keys (a run's and a sweep's) and what a reader is shown for them.
constexpr std::array<std::pair<std::string_view, FigureLabel>, 50> labels = {{
    {"section", {"section", ""}},
    {"reynolds", {"Reynolds number (on the chord)", ""}},
    {"alpha", {"angle of attack", "deg"}},
    {"model", {"flow model", ""}},
    {"mode", {"mode", ""}},
    {"status", {"how the run ended", ""}},
    {"iterations", {"iterations", ""}},
    {"wall_seconds", {"wall time", "s"}},
    {"cl", {"Cl, surface (pressure + friction)", ""}},
    {"cl_pressure", {"Cl, pressure part", ""}},
    {"cl_friction", {"Cl, friction part", ""}},
    {"cd", {"Cd, surface (pressure + friction)", ""}},
    {"cd_pressure", {"Cd, pressure part", ""}},
    {"cd_friction", {"Cd, friction part", ""}},
    {"cm", {"Cm, about the quarter chord, nose-up positive", ""}},
    {"max_lift_disagreement", {"largest surface/control-volume lift disagreement", "ΔCl"}},
    {"outermost_contour_distance", {"far-boundary check: outermost contour at", "chords"}},
    {"cl_momentum_outermost", {"Cl, control volume on the outermost contour", ""}},
    {"cd_momentum_outermost", {"Cd, control volume on the outermost contour", ""}},
    {"outermost_lift_difference", {"outermost-contour Cl - surface Cl", "ΔCl"}},
    {"separation_upper", {"upper surface: separation", "x/c"}},
    {"reattachment_upper", {"upper surface: reattachment", "x/c"}},
    {"separation_lower", {"lower surface: separation", "x/c"}},
    {"reattachment_lower", {"lower surface: reattachment", "x/c"}},
    {"stagnation_x", {"stagnation point", "x/c"}},
    {"points", {"points with results", ""}},
    {"missing_points", {"angles without a result yet", "deg"}},
    {"lift_slope_per_deg", {"lift slope over the linear range", "per deg"}},
    {"lift_slope_per_rad", {"lift slope over the linear range", "per rad"}},
    {"linear_range", {"linear range of the lift", "deg"}},
    {"alpha_zero_lift", {"zero-lift angle", "deg"}},
    {"cl_max", {"largest Cl in the sweep", ""}},
    {"alpha_cl_max", {"angle of the largest Cl", "deg"}},
    {"stall_in_range", {"lift falls after its largest value within the sweep", ""}},
    {"stall_bracketed", {"largest Cl has a lower Cl on each side", ""}},
    {"alpha_cl_max_uncertainty", {"angle of the largest Cl: ± (the wider gap beside it)", "deg"}},
    {"cl_max_uncertainty", {"largest Cl: + (parabola through it and its neighbours)", ""}},
    {"stall_search", {"stall search (points added past the requested angles)", ""}},
    {"alpha_separation_onset", {"separation onset (upper surface)", "deg"}},
    {"cd_min", {"least Cd", ""}},
    {"alpha_cd_min", {"angle of the least Cd", "deg"}},
    {"unsteady_points", {"points run time-accurately", ""}},
    {"failed_points", {"failed points", ""}},
    {"bounded_cycle_points", {"points settled in a bounded cycle (mean with its band)", ""}},
    {"wall_seconds_points", {"wall time of the points", "s"}},
    {"far_field_circulation", {"far-field vortex strength (circulation)", "U c"}},
    {"base_cp", {"base Cp (rear point)", ""}},
    {"separation_angle_upper_deg", {"separation, upper half, from the rear point", "deg"}},
    {"separation_angle_lower_deg", {"separation, lower half, from the rear point", "deg"}},
    {"recirculation_length", {"recirculation length behind the rear point", "diameters"}},
}};

}  // namespace

std::string_view reader_caution() {
    return "caution: 2D and incompressible results, within the limits of the flow model; check "
           "grid and time-step convergence before relying on a figure; not a substitute for "
           "testing and licensed engineering review for anything that flies";
}

std::string grid_words(const CGridSpec& mesh, bool circle, int ni, int nj) {
    if (circle)
        return fmt::format("{} x {} (around x normal, O-grid), {} x {} cells", mesh.around,
                           mesh.normal, ni, nj);
    return fmt::format("{} x {} (around x normal; wake {} cells each side), {} x {} cells",
                       mesh.around, mesh.normal, mesh.wake, ni, nj);
}

const char* length_words(bool circle) { return circle ? "diameters" : "chords"; }

std::string control_volume_label(double placed_distance, bool circle) {
    return fmt::format("control volume at {:.2f} {}", placed_distance, length_words(circle));
}

std::string circulation_label(double placed_distance, bool circle) {
    return fmt::format("circulation at {:.2f} {}", placed_distance, length_words(circle));
}

std::string outermost_label(double placed_distance, bool circle) {
    return fmt::format("outermost contour at {:.1f} {}", placed_distance, length_words(circle));
}

std::string downward_flux_words(double half_height_chords) {
    return fmt::format(
        "downward momentum flux (per unit span, in rho U^2 c; positive when the flow is turned "
        "down; over |y - y_TE| <= {:g} chord)",
        half_height_chords);
}

std::optional<FigureLabel> figure_label(std::string_view key) {
    for (const auto& [k, label] : labels)
        if (k == key) return label;
    return std::nullopt;
}

}  // namespace veer
