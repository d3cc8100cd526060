#pragma once
/// The wall as post-processing sees it: the j = 0 faces of the section and, on each, the wall
/// pressure and wall shear reconstructed from the first two cells off the wall.
///
///   j = 1   o  cell (i, 1), centroid at wall distance d1
///   j = 0   o  cell (i, 0), centroid at wall distance d0
///   =====  wall face (i, 0): centre, unit normal n into the fluid, unit tangent t along +i
///
/// Along +i the wall runs from the trailing edge over the lower surface to the leading edge and
/// back over the upper surface (clockwise around the section), so n = t rotated +90 degrees points
/// into the fluid.
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// Wall faces j = 0, i in [begin, end).
struct WallRange {
    int begin = 0;
    int end = 0;
    int count() const { return end - begin; }
};

/// The wall of a grid: from its C-grid layout when set, else from its wall segment on side j_min.
/// Throws InputError when the grid has neither.
WallRange find_wall_faces(const StructuredGrid& grid);

/// How the wall pressure is taken from the cells.
enum class WallPressure {
    extrapolated,  ///< linear in wall distance through the first two cells (second order)
    first_cell,    ///< the first cell's value (the zero-normal-gradient ghost of the solver)
};

/// Flow state on one wall face (chord units, U_inf = rho = 1).
struct WallFaceState {
    int i = 0;                       ///< cell / face index along the C
    Vec2 center;                     ///< face midpoint
    Vec2 normal;                     ///< unit normal into the fluid
    Vec2 tangent;                    ///< unit tangent along +i
    double length = 0.0;             ///< face length
    double pressure = 0.0;           ///< p - p_inf on the wall
    double shear = 0.0;              ///< wall shear stress along +tangent, nu du_t/dn
    double first_cell_distance = 0;  ///< wall distance of the first cell's centroid
};

/// Wall derivative df/dn of a quantity that vanishes on the wall, f(d) = A d + B d^2 through the
/// first two cells (d0, f0), (d1, f1): returns A. The stencil of the wall shear (and of the
/// turbulence index, transition_locator.hpp).
double one_sided_wall_derivative(double d0, double f0, double d1, double f1);

/// Wall pressure and shear on every wall face. The shear is the one-sided second-order wall
/// derivative of the tangential velocity through the first two cells, u_t(d) = A d + B d^2 with
/// u_t(0) = 0 (no slip), times nu = 1/Re (the eddy viscosity vanishes on the wall).
/// Needs nj >= 2.
std::vector<WallFaceState> evaluate_wall_faces(const StructuredGrid& grid,
                                               const GridMetrics& metrics, const FlowFields& fields,
                                               const FlowConditions& conditions,
                                               WallPressure wall_pressure);

}  // namespace veer
