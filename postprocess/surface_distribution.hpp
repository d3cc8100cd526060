#pragma once
/// Cp and Cf along the section, per wall face, split into the upper and lower surfaces at the
/// leading-edge node i = wake + around / 2 (faces below it are the lower surface).
///
///   Cp = (p - p_inf) / q_inf = 2 p,   Cf = tau_w / q_inf = 2 tau_w   (q_inf = 1/2, U_inf = 1)
///
/// Cf carries the sign of the wall shear along the surface from the leading edge towards the
/// trailing edge, so Cf < 0 marks reversed flow on either surface. y+ = d1 u_tau / nu of the first
/// cell's centroid, u_tau = sqrt(|tau_w|).
#include <limits>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "postprocess/wall_faces.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

enum class SurfaceSide { lower, upper };

/// One wall face seen from its surface.
struct SurfacePoint {
    int i = 0;       ///< face index along the C
    double x = 0.0;  ///< face centre, chords
    double y = 0.0;
    double arc = 0.0;  ///< distance along the surface from the leading-edge node, chords
    SurfaceSide side = SurfaceSide::upper;
    double cp = 0.0;
    double cf = 0.0;  ///< positive where the wall flow runs from the leading edge aft
    double y_plus = 0.0;
    /// Spalart–Allmaras turbulence index (transition_locator.hpp); NaN without nu~ (laminar).
    double turbulence_index = std::numeric_limits<double>::quiet_NaN();
};

/// Both surfaces, each ordered from the leading edge to the trailing edge.
struct SurfaceDistribution {
    std::vector<SurfacePoint> upper;
    std::vector<SurfacePoint> lower;
    double upper_length = 0.0;  ///< arc from the leading-edge node to the trailing edge, chords
    double lower_length = 0.0;
};

/// Index of the leading-edge node on j = 0 of a C-grid, wake + around / 2.
int leading_edge_node(const StructuredGrid& grid);

/// The distribution from wall states (wall_faces.hpp), for the wall of `grid`.
SurfaceDistribution surface_distribution(const StructuredGrid& grid,
                                         const std::vector<WallFaceState>& wall,
                                         const FlowConditions& conditions);

/// The distribution straight from the fields.
SurfaceDistribution surface_distribution(const StructuredGrid& grid, const GridMetrics& metrics,
                                         const FlowFields& fields, const FlowConditions& conditions,
                                         WallPressure wall_pressure = WallPressure::extrapolated);

}  // namespace veer
