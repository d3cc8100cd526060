#pragma once
/// The post-processing of a run's fields in one call: the surface route (forces, Cp, Cf, y+),
/// separation, transition and the kind of each separated region, the Kutta check, the
/// control-volume and circulation routes on the requested contours side by side with the surface
/// route, and the wake profiles. The run report, the closing table and the sweep records all read
/// this one result.
#include <optional>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "postprocess/circulation.hpp"
#include "postprocess/control_volume.hpp"
#include "postprocess/kutta_check.hpp"
#include "postprocess/lift_routes.hpp"
#include "postprocess/separation.hpp"
#include "postprocess/separation_regimes.hpp"
#include "postprocess/surface_distribution.hpp"
#include "postprocess/surface_forces.hpp"
#include "postprocess/transition_locator.hpp"
#include "postprocess/wake_profiles.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// Where the analysis looks (the case file's [post] table) and what it analyses.
struct AnalysisPlaces {
    std::vector<double> contours;       ///< control-volume contour distances, reference lengths
    std::vector<double> wake_stations;  ///< reference lengths behind the trailing edge
    SurfaceForceOptions forces;         ///< moment reference (the circle's centre for a circle)
    bool circle = false;                ///< the section is the circle (CircleFigures)
    bool steady = true;                 ///< steady fields (a recirculation length is read)
};

/// What the circle is read by beside the figures of a section (diameters, degrees).
struct CircleFigures {
    /// First separation on each half, degrees from the rear point (mesh/circle.hpp).
    std::optional<double> separation_angle_upper;
    std::optional<double> separation_angle_lower;
    /// Reversed flow behind the rear point (postprocess/recirculation.hpp), diameters; steady
    /// runs only (an instant of a shedding wake has no such length).
    std::optional<double> recirculation_length;
    double base_cp = 0.0;  ///< Cp at the rear point, the mean of both halves' extrapolations
};

/// The post-processing of one set of fields.
struct RunAnalysis {
    SurfaceForces forces;
    SurfaceDistribution surface;
    SeparationReport separation;
    KuttaCheck kutta;
    /// Whether the fields hold nu~ (a Spalart–Allmaras-family model): the surface points then
    /// carry the turbulence index and `transition` is searched for.
    bool has_turbulence_index = false;
    TransitionReport transition;  ///< where each surface turns turbulent (transition_locator.hpp)
    /// Each separated region with its kind (separation_regimes.hpp), from the leading edge aft.
    std::vector<SeparatedRegion> regions_upper;
    std::vector<SeparatedRegion> regions_lower;
    std::vector<ContourForces> momentum;          ///< one per contour distance
    std::vector<ContourCirculation> circulation;  ///< the same contours
    std::vector<RouteComparison> routes;          ///< both routes against the surface route
    double max_lift_disagreement = 0.0;           ///< largest |Cl control volume - Cl surface|
    /// The far-boundary force check: both routes on the largest contour (outermost_contour.hpp).
    RouteComparison outermost;
    std::vector<WakeProfile> wake;        ///< one per wake station
    std::optional<CircleFigures> circle;  ///< set for the circle
};

/// Analyses `fields` on a C-grid (or the circle's O-grid). Throws InputError for a contour or wake
/// station the grid cannot hold.
RunAnalysis analyse_flow(const StructuredGrid& grid, const GridMetrics& metrics,
                         const FlowFields& fields, const FlowConditions& conditions,
                         const AnalysisPlaces& places);

/// Throws the InputError analyse_flow would throw for these places on this grid, before any
/// flow exists (it locates the contours and samples a uniform stream at the wake stations).
void check_analysis_places(const StructuredGrid& grid, const GridMetrics& metrics,
                           const AnalysisPlaces& places);

}  // namespace veer
