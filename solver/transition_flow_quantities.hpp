#pragma once
/// The local flow quantities the transition models read per cell, from the velocity alone (no
/// boundary-layer edge search): vorticity magnitude Omega, strain-rate magnitude
/// S = sqrt(2 S_ij S_ij), and SA-AFT2017b's local shape-factor estimate
/// H_L = d^2 [grad(u . grad d)] . grad d / nu (transition_correlations.hpp). Green-Gauss
/// gradients; the wall-distance gradient is computed once, with d = 0 on walls (and u . grad d,
/// zero on walls as u is) and zero normal gradient on the other physical faces.
#include <vector>

#include "solver/boundary_faces.hpp"
#include "solver/boundary_ghosts.hpp"
#include "solver/cell_field.hpp"
#include "solver/connectivity.hpp"
#include "solver/face_geometry.hpp"

namespace veer {

class TransitionFlowQuantities {
public:
    /// `wall_distance`: ni * nj (chords); nu = 1 / Re.
    TransitionFlowQuantities(const FaceGeometry& geom, const std::vector<BoundaryFace>& faces,
                             const Connectivity& connectivity,
                             const std::vector<double>& wall_distance, double nu);

    /// Recomputes the quantities from the velocity (ghosts filled).
    void update(CellView u, CellView v);

    const std::vector<double>& omega() const { return m_omega; }
    const std::vector<double>& strain() const { return m_strain; }
    const std::vector<double>& shape_estimate() const { return m_h_l; }

private:
    const FaceGeometry* m_geom;
    const std::vector<BoundaryFace>* m_faces;
    const Connectivity* m_connectivity;
    std::vector<ScalarFaceCondition> m_zero_on_walls;
    std::vector<double> m_d;
    double m_nu;
    CellField m_ddx, m_ddy, m_ux, m_uy, m_vx, m_vy, m_w, m_wx, m_wy;
    std::vector<double> m_omega, m_strain, m_h_l;
};

}  // namespace veer
