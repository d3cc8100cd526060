#pragma once
/// The flow on a contour face, reconstructed from the two cells the face separates: each cell's
/// value is carried to the face centre with its least-squares gradient, q_c + grad q_c . (x_f -
/// x_c), and the two are blended with the face weight of contour_faces. Exact for linear fields
/// on any grid (skewed faces included), second order on smooth ones. The eddy viscosity is
/// blended without gradients so that it stays non-negative.
#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"
#include "postprocess/grid_contour.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// Flow state at a face centre.
struct FaceFlow {
    Vec2 velocity;                ///< (u, v)
    double pressure = 0.0;        ///< p - p_inf
    double eddy_viscosity = 0.0;  ///< 0 when the fields carry none
    Vec2 grad_u;                  ///< (du/dx, du/dy), blended cell gradients
    Vec2 grad_v;                  ///< (dv/dx, dv/dy)
};

FaceFlow sample_face(const StructuredGrid& grid, const GridMetrics& metrics,
                     const FlowFields& fields, const ContourFace& face);

}  // namespace veer
