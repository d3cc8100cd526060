#pragma once
/// The Spalart-Allmaras turbulence model (spalart_allmaras_terms.hpp gives the exact definition
/// followed and its sources): the cell-centred working variable nu_tilde, advanced by one
/// implicit step of its transport equation (spalart_allmaras_transport.hpp) with the flow's
/// velocity and face fluxes, and the eddy viscosity it gives.
///
/// One step: ghosts of nu_tilde from the boundary conditions and connectivity (the wake cut and
/// periodic sides are filled exactly as for the flow), Green-Gauss gradients of nu_tilde and of
/// the velocity (vorticity magnitude), the point source split (gains explicit, losses implicit),
/// assembly, then line relaxation (wall-normal j-lines, then i-lines) of the solver
/// (line_relaxation.hpp). The matrix has a dominant, positive diagonal and non-negative
/// neighbour couplings, and the explicit part is non-negative apart from the deferred
/// corrections, so nu_tilde stays positive wherever the corrections are small; where it does go
/// negative, the SA-neg branch keeps the equations well posed and pulls it back to zero.
#include <vector>

#include "solver/boundary_faces.hpp"
#include "solver/cell_field.hpp"
#include "solver/connectivity.hpp"
#include "solver/face_geometry.hpp"
#include "solver/flow_model.hpp"
#include "solver/line_relaxation.hpp"
#include "solver/momentum_system.hpp"
#include "solver/spalart_allmaras_settings.hpp"
#include "solver/spalart_allmaras_transport.hpp"

namespace veer {

/// What one step did.
struct TurbulenceReport {
    double residual = 0.0;         ///< rms over cells of (nu~_new - nu~) / dt (nu~ per time unit)
    double min_nu_tilde = 0.0;     ///< smallest nu_tilde after the step
    bool finite = true;            ///< every nu_tilde finite
    int worst_i = 0, worst_j = 0;  ///< first non-finite cell, else the largest change
};

class SpalartAllmaras {
public:
    /// The model on a block whose face geometry, boundary faces and connectivity outlive it;
    /// `wall_distance` (chords, ni * nj, mesh/wall_distance.hpp), nu = 1 / Re. nu_tilde starts
    /// at free_stream_ratio * nu everywhere. Throws InputError for bad settings.
    SpalartAllmaras(const FaceGeometry& geom, const std::vector<BoundaryFace>& faces,
                    const Connectivity& connectivity, std::vector<double> wall_distance, double nu,
                    SpalartAllmarasSettings settings = {});

    /// One implicit step of the nu_tilde equation.
    TurbulenceReport advance(const ModelStepInputs& in);

    /// Cell eddy viscosity nu~ f_v1 (0 where nu~ < 0), ni * nj (chords x free-stream speed).
    std::vector<double> eddy_viscosity() const;
    /// Eddy viscosity on the faces from the face mean of nu_tilde (0 on walls), i-face and
    /// j-face layouts of FaceGeometry.
    void face_eddy_viscosity(std::vector<double>& on_i, std::vector<double>& on_j) const;

    /// nu_tilde at the cells, ni * nj; set_nu_tilde replaces it (restarts, initial fields).
    std::vector<double> nu_tilde() const;
    void set_nu_tilde(const std::vector<double>& values);
    double free_stream_nu_tilde() const { return m_settings.free_stream_ratio * m_nu; }
    /// The nu_tilde column of the boundary table this model applies.
    ScalarColumn boundary_column() const;

    /// Per-cell changes of the source by a transition model built on this one
    /// (SaSourceModifiers, spalart_allmaras_terms.hpp): a production factor and f_t2, ni * nj
    /// each, owned by the caller and read at every step; null: the standard model.
    void set_source_modifiers(const std::vector<double>* production_factor,
                              const std::vector<double>* trip_ft2);
    const std::vector<double>& wall_distance() const { return m_wall_distance; }
    /// Whether the j-lines of the line solves continue across the wake cut (the steady scheme's
    /// choice; the converged state does not depend on it).
    void fold_wake_cut_lines(bool fold);

private:
    void fill_ghosts(CellView q);
    void compute_sources(const ModelStepInputs& in);
    TurbulenceReport finish(const ModelStepInputs& in);

    const FaceGeometry* m_geom;
    const std::vector<BoundaryFace>* m_faces;
    const Connectivity* m_connectivity;
    std::vector<double> m_wall_distance;
    double m_nu;
    SpalartAllmarasSettings m_settings;
    std::vector<ScalarFaceCondition> m_conditions;
    const std::vector<double>* m_production_factor = nullptr;
    const std::vector<double>* m_trip_ft2 = nullptr;

    CellField m_nu_tilde, m_nu_tilde_new, m_unused, m_grad_x, m_grad_y;
    CellField m_ux, m_uy, m_vx, m_vy;
    std::vector<double> m_time_diag, m_source_explicit, m_source_implicit, m_manufactured;
    NuTildeFaceWork m_face_work;
    MomentumSystem m_system;
    LineWork m_work;
};

}  // namespace veer
