#include "postprocess/run_analysis.hpp"

#include "mesh/circle.hpp"
#include "postprocess/grid_contour.hpp"
#include "postprocess/outermost_contour.hpp"
#include "postprocess/recirculation.hpp"
#include "postprocess/wall_faces.hpp"

namespace veer {
namespace {

/// Separation angles, recirculation length and base pressure of the circle.
CircleFigures circle_figures(const StructuredGrid& grid, const GridMetrics& metrics,
                             const FlowFields& fields, const RunAnalysis& a, bool steady) {
    CircleFigures c;
    auto angle = [](const std::vector<SurfaceLocation>& v) {
        return v.empty() ? std::nullopt
                         : std::optional<double>(angle_from_rear_deg({v.front().x, v.front().y}));
    };
    c.separation_angle_upper = angle(a.separation.upper.separations);
    c.separation_angle_lower = angle(a.separation.lower.separations);
    if (steady) c.recirculation_length = recirculation_length(grid, metrics, fields);
    c.base_cp = 0.5 * (a.kutta.cp_upper + a.kutta.cp_lower);
    return c;
}

/// nu~ of a Spalart–Allmaras-family model among the fields, if any.
const std::vector<double>* find_nu_tilde(const FlowFields& fields) {
    for (const NamedArray& a : fields.model_fields)
        if (a.name == sa_working_variable) return &a.values;
    return nullptr;
}

/// The turbulence index on the surface points, the transition on each surface and the kind of
/// each separated region (a laminar model: no index, no transition, laminar regions).
void add_transition(const StructuredGrid& grid, const GridMetrics& metrics,
                    const FlowFields& fields, const std::vector<WallFaceState>& wall,
                    RunAnalysis& a) {
    if (const std::vector<double>* nu_tilde = find_nu_tilde(fields)) {
        const WallTurbulenceIndex index = turbulence_index(grid, metrics, *nu_tilde, wall);
        for (auto* side : {&a.surface.upper, &a.surface.lower})
            for (SurfacePoint& p : *side) p.turbulence_index = index.at(p.i);
        a.transition = find_transition(a.surface, index, a.separation.stagnation);
        a.has_turbulence_index = true;
    }
    a.regions_upper = separated_regions(a.separation.upper, a.transition.upper);
    a.regions_lower = separated_regions(a.separation.lower, a.transition.lower);
}

}  // namespace

RunAnalysis analyse_flow(const StructuredGrid& grid, const GridMetrics& metrics,
                         const FlowFields& fields, const FlowConditions& conditions,
                         const AnalysisPlaces& places) {
    RunAnalysis a;
    a.forces = integrate_surface_forces(grid, metrics, fields, conditions, places.forces);
    const std::vector<WallFaceState> wall =
        evaluate_wall_faces(grid, metrics, fields, conditions, WallPressure::extrapolated);
    a.surface = surface_distribution(grid, wall, conditions);
    a.separation = find_separation(a.surface);
    add_transition(grid, metrics, fields, wall, a);
    a.kutta = kutta_check(a.surface);
    const auto contours = contours_at_distances(grid, places.contours);
    a.momentum = contour_forces(grid, metrics, fields, conditions, contours);
    a.circulation = contour_circulation(grid, metrics, fields, contours);
    a.routes = compare_routes(a.forces, a.momentum, a.circulation);
    a.max_lift_disagreement = largest_lift_disagreement(a.routes);
    a.outermost = outermost_route(grid, metrics, fields, conditions, a.forces);
    WakeProfileOptions wake;
    wake.stations = places.wake_stations;
    a.wake = wake_profiles(grid, metrics, fields, conditions, wake);
    if (places.circle) a.circle = circle_figures(grid, metrics, fields, a, places.steady);
    return a;
}

void check_analysis_places(const StructuredGrid& grid, const GridMetrics& metrics,
                           const AnalysisPlaces& places) {
    contours_at_distances(grid, places.contours);
    const auto cells = static_cast<std::size_t>(grid.cell_count());
    FlowFields uniform;
    uniform.ni = grid.ni();
    uniform.nj = grid.nj();
    uniform.u.assign(cells, 1.0);
    uniform.v.assign(cells, 0.0);
    uniform.pressure.assign(cells, 0.0);
    WakeProfileOptions wake;
    wake.stations = places.wake_stations;
    wake_profiles(grid, metrics, uniform, FlowConditions{}, wake);
}

}  // namespace veer
