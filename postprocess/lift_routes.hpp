#pragma once
/// The three routes to the forces side by side: for every contour, the control-volume Cl and Cd
/// and the circulation Cl, each with its difference from the surface route (route - surface).
#include <vector>

#include "postprocess/circulation.hpp"
#include "postprocess/control_volume.hpp"
#include "postprocess/surface_forces.hpp"

namespace veer {

/// One contour's routes against the surface route.
struct RouteComparison {
    GridContour contour;
    double cl_momentum = 0.0;
    double cd_momentum = 0.0;
    double cl_circulation = 0.0;
    double cl_momentum_difference = 0.0;     ///< cl_momentum - surface cl
    double cd_momentum_difference = 0.0;     ///< cd_momentum - surface cd
    double cl_circulation_difference = 0.0;  ///< cl_circulation - surface cl
};

/// Pairs the k-th momentum balance with the k-th circulation (the same contours, in order).
std::vector<RouteComparison> compare_routes(const SurfaceForces& surface,
                                            const std::vector<ContourForces>& momentum,
                                            const std::vector<ContourCirculation>& circulation);

/// The largest |cl_momentum - surface cl| over the contours (0 without contours): the error
/// indicator printed with every run.
double largest_lift_disagreement(const std::vector<RouteComparison>& routes);

}  // namespace veer
