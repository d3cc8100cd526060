#pragma once
/// One transported variable of a model other than nu_tilde (a transition model's n~ or
/// log-intermittency): its cell field with ghosts from its boundary column, one implicit step
/// of its transport equation (scalar_transport.hpp) solved by the solver's line relaxation, the
/// bounds the model keeps it in, and its step residual.
#include <vector>

#include "solver/boundary_faces.hpp"
#include "solver/boundary_ghosts.hpp"
#include "solver/cell_field.hpp"
#include "solver/connectivity.hpp"
#include "solver/face_geometry.hpp"
#include "solver/flow_model.hpp"
#include "solver/line_relaxation.hpp"
#include "solver/momentum_system.hpp"
#include "solver/scalar_transport.hpp"

namespace veer {

/// What one step of a scalar needs beside the flow.
struct ScalarStepTerms {
    const std::vector<double>* mu_i = nullptr;  ///< face diffusivity (FaceGeometry layouts)
    const std::vector<double>* mu_j = nullptr;
    const std::vector<double>* source_explicit = nullptr;  ///< per unit volume, ni * nj
    const std::vector<double>* source_implicit = nullptr;  ///< 1 / time, >= 0, ni * nj
    double time_step_scale = 1.0;  ///< steady: the pseudo-time step over the flow's
    double lowest = -1e300;        ///< the bounds the model keeps the variable in
    double highest = 1e300;
};

/// What one step did (as TurbulenceReport for nu_tilde).
struct ScalarStepReport {
    double residual = 0.0;  ///< rms of (q_new - q) / dt
    bool finite = true;
    int worst_i = 0, worst_j = 0;  ///< first non-finite cell
};

class TransportedScalar {
public:
    TransportedScalar(const FaceGeometry& geom, const std::vector<BoundaryFace>& faces,
                      const Connectivity& connectivity, const ScalarColumn& column, double initial);

    ScalarStepReport advance(const ModelStepInputs& in, const ScalarStepTerms& terms);

    /// Interior values (ni * nj) and their replacement (ghosts refilled).
    std::vector<double> values() const { return m_q.interior(); }
    void set_values(const std::vector<double>& values);
    double operator[](std::size_t cell) const { return m_cells[cell]; }
    void fold_wake_cut_lines(bool fold) { m_work.prepare(*m_connectivity, fold); }

private:
    void fill_ghosts(CellView q);
    ScalarStepReport finish(double lowest, double highest);

    const FaceGeometry* m_geom;
    const std::vector<BoundaryFace>* m_faces;
    const Connectivity* m_connectivity;
    std::vector<ScalarFaceCondition> m_conditions;
    CellField m_q, m_new, m_unused, m_gx, m_gy;
    std::vector<double> m_cells, m_time_diag;
    ScalarFaceWork m_face_work;
    MomentumSystem m_system;
    LineWork m_work;
};

}  // namespace veer
