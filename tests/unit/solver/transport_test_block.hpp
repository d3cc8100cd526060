#pragma once
/// A block for the transport-operator tests of model variables (manufactured solutions): grid,
/// metrics, connectivity, faces with every wall turned into a prescribed-velocity face moving at
/// the given uniform velocity, face fluxes A . u, and the cell fields a model step reads.
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "solver/boundary_faces.hpp"
#include "solver/cell_field.hpp"
#include "solver/connectivity.hpp"
#include "solver/face_geometry.hpp"
#include "solver/flow_model.hpp"

namespace veer::test {

/// A block with everything the model needs, face fluxes from a prescribed velocity.
struct TransportBlock {
    StructuredGrid grid;
    GridMetrics metrics;
    Connectivity connectivity;
    std::vector<BoundaryFace> faces;
    FaceGeometry geom;
    std::vector<double> flux_i, flux_j;
    CellField u, v, local_dt;

    TransportBlock(StructuredGrid g, Vec2 velocity) : grid(std::move(g)) {
        metrics = compute_metrics(grid);
        connectivity = make_connectivity(grid, metrics);
        std::vector<VelocityOverride> overrides;
        for (const BoundarySegment& s : grid.segments())
            if (s.kind == SegmentKind::wall) overrides.push_back(moving_wall(s.name, velocity));
        faces = collect_boundary_faces(grid, metrics, {1.0, 0.0}, overrides);
        geom = make_face_geometry(metrics, connectivity, faces);
        // F = A . u exactly (uniform velocity: discretely divergence-free).
        for (const Vec2& a : geom.i_faces.area) flux_i.push_back(dot(a, velocity));
        for (const Vec2& a : geom.j_faces.area) flux_j.push_back(dot(a, velocity));
        u = CellField(grid.ni(), grid.nj(), velocity.x);
        v = CellField(grid.ni(), grid.nj(), velocity.y);
        local_dt = CellField(grid.ni(), grid.nj(), 0.0);
    }

    ModelStepInputs inputs() {
        ModelStepInputs in;
        in.u = u.view();
        in.v = v.view();
        in.flux_i = &flux_i;
        in.flux_j = &flux_j;
        in.local_dt = local_dt.view();
        in.steady = true;
        return in;
    }
};

}  // namespace veer::test
