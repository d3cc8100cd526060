#include "solver/transition_flow_quantities.hpp"

#include <cmath>

#include "mesh/errors.hpp"
#include "solver/gradients.hpp"
#include "solver/loops.hpp"

namespace veer {

namespace {

/// Dirichlet 0 on walls, zero normal gradient on every other physical face.
ScalarColumn zero_on_walls() {
    ScalarColumn c;
    c.wall = {Condition::dirichlet, 0.0, {}};
    return c;
}

}  // namespace

TransitionFlowQuantities::TransitionFlowQuantities(const FaceGeometry& geom,
                                                   const std::vector<BoundaryFace>& faces,
                                                   const Connectivity& connectivity,
                                                   const std::vector<double>& wall_distance,
                                                   double nu)
    : m_geom(&geom),
      m_faces(&faces),
      m_connectivity(&connectivity),
      m_zero_on_walls(scalar_face_conditions(faces, zero_on_walls())),
      m_d(wall_distance),
      m_nu(nu) {
    VEER_VERIFY(wall_distance.size() == geom.volume.size(), "one wall distance per cell");
    for (CellField* f : {&m_ddx, &m_ddy, &m_ux, &m_uy, &m_vx, &m_vy, &m_w, &m_wx, &m_wy})
        *f = CellField(geom.ni, geom.nj);
    for (auto* v : {&m_omega, &m_strain, &m_h_l}) v->assign(geom.volume.size(), 0.0);
    CellField d(geom.ni, geom.nj);
    d.set_interior(wall_distance);
    fill_scalar_ghosts(faces, m_zero_on_walls, connectivity, d.view());
    green_gauss_gradient(geom, d.view(), m_ddx.view(), m_ddy.view());
}

void TransitionFlowQuantities::update(CellView u, CellView v) {
    const FaceGeometry& g = *m_geom;
    green_gauss_gradient(g, u, m_ux.view(), m_uy.view());
    green_gauss_gradient(g, v, m_vx.view(), m_vy.view());
    CellView w = m_w.view(), ddx = m_ddx.view(), ddy = m_ddy.view();
    for_each_cell({0, g.ni, 0, g.nj},
                  [&](int i, int j) { w(i, j) = u(i, j) * ddx(i, j) + v(i, j) * ddy(i, j); });
    fill_scalar_ghosts(*m_faces, m_zero_on_walls, *m_connectivity, w);
    green_gauss_gradient(g, w, m_wx.view(), m_wy.view());
    CellView ux = m_ux.view(), uy = m_uy.view(), vx = m_vx.view(), vy = m_vy.view();
    CellView wx = m_wx.view(), wy = m_wy.view();
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        const std::size_t k = g.cell(i, j);
        const double shear = uy(i, j) + vx(i, j);
        m_omega[k] = std::abs(vx(i, j) - uy(i, j));
        m_strain[k] = std::sqrt(2.0 * (ux(i, j) * ux(i, j) + vy(i, j) * vy(i, j)) + shear * shear);
        m_h_l[k] = m_d[k] * m_d[k] * (wx(i, j) * ddx(i, j) + wy(i, j) * ddy(i, j)) / m_nu;
    });
}

}  // namespace veer
