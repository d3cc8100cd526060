#pragma once
/// Circulation route to the lift: Gamma = sum over the faces of a closed grid contour of u_f . dl,
/// dl the face's step along the contour taken clockwise (the way i runs on the wall), so Gamma > 0
/// for a section lifting in a stream along +x. Kutta-Joukowski: L' = rho U_inf Gamma normal to the
/// free stream, hence cl = 2 Gamma (rho = U_inf = chord = 1). Face velocities are reconstructed as
/// for the control volume (contour_sampling.hpp). In viscous flow the contour's wake crossing
/// collects the vorticity shed into the wake up to that station: report it with the contour's
/// distance.
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "postprocess/grid_contour.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// Circulation about one contour and the lift it implies.
struct ContourCirculation {
    GridContour contour;
    double gamma = 0.0;  ///< clockwise circulation, U_inf * chord
    double cl = 0.0;     ///< 2 gamma
};

/// Circulation about one contour.
ContourCirculation contour_circulation(const StructuredGrid& grid, const GridMetrics& metrics,
                                       const FlowFields& fields, const GridContour& contour);

/// Circulation about each of several contours.
std::vector<ContourCirculation> contour_circulation(const StructuredGrid& grid,
                                                    const GridMetrics& metrics,
                                                    const FlowFields& fields,
                                                    const std::vector<GridContour>& contours);

}  // namespace veer
