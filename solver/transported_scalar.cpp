#include "solver/transported_scalar.hpp"

#include <algorithm>
#include <cmath>

#include "mesh/errors.hpp"
#include "solver/gradients.hpp"
#include "solver/loops.hpp"

namespace veer {

TransportedScalar::TransportedScalar(const FaceGeometry& geom,
                                     const std::vector<BoundaryFace>& faces,
                                     const Connectivity& connectivity, const ScalarColumn& column,
                                     double initial)
    : m_geom(&geom), m_faces(&faces), m_connectivity(&connectivity) {
    m_conditions = scalar_face_conditions(faces, column);
    for (CellField* f : {&m_q, &m_new, &m_unused, &m_gx, &m_gy}) *f = CellField(geom.ni, geom.nj);
    m_time_diag.assign(geom.volume.size(), 0.0);
    m_face_work.resize(geom);
    m_system.resize(geom.ni, geom.nj);
    m_work.prepare(connectivity, false);
    set_values(std::vector<double>(geom.volume.size(), initial));
}

void TransportedScalar::fill_ghosts(CellView q) {
    fill_scalar_ghosts(*m_faces, m_conditions, *m_connectivity, q);
}

void TransportedScalar::set_values(const std::vector<double>& values) {
    VEER_VERIFY(values.size() == m_geom->volume.size(), "one value per cell");
    m_q.set_interior(values);
    m_cells = values;
    fill_ghosts(m_q.view());
}

ScalarStepReport TransportedScalar::advance(const ModelStepInputs& in,
                                            const ScalarStepTerms& terms) {
    const FaceGeometry& g = *m_geom;
    CellView q = m_q.view();
    green_gauss_gradient(g, q, m_gx.view(), m_gy.view());
    fill_copy_ghosts(*m_faces, *m_connectivity, m_gx.view());
    fill_copy_ghosts(*m_faces, *m_connectivity, m_gy.view());
    const double scale = in.steady ? terms.time_step_scale : 1.0;
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        const std::size_t k = g.cell(i, j);
        m_time_diag[k] = g.volume[k] / (scale * (in.steady ? in.local_dt(i, j) : in.dt));
    });
    ScalarTransportInputs ti;
    ti.flux_i = in.flux_i;
    ti.flux_j = in.flux_j;
    ti.q = q;
    ti.grad_x = m_gx.view();
    ti.grad_y = m_gy.view();
    ti.mu_i = terms.mu_i;
    ti.mu_j = terms.mu_j;
    ti.time_diag = &m_time_diag;
    ti.source_explicit = terms.source_explicit;
    ti.source_implicit = terms.source_implicit;
    assemble_scalar(g, *m_faces, m_conditions, ti, m_face_work, m_system);
    m_new = m_q;
    relax_momentum(m_system, *m_connectivity, m_new.view(), m_unused.view(), 2, 0.0, m_work);
    return finish(terms.lowest, terms.highest);
}

/// Bounds, residual and finiteness; then the new level becomes current.
ScalarStepReport TransportedScalar::finish(double lowest, double highest) {
    const FaceGeometry& g = *m_geom;
    ScalarStepReport r;
    CellView q = m_q.view(), qn = m_new.view();
    double sum = 0.0;
    for (int j = 0; j < g.nj; ++j)
        for (int i = 0; i < g.ni; ++i) {
            const std::size_t k = g.cell(i, j);
            if (!std::isfinite(qn(i, j))) {
                if (r.finite) r.worst_i = i, r.worst_j = j;
                r.finite = false;
                continue;
            }
            qn(i, j) = std::clamp(qn(i, j), lowest, highest);
            const double rate = (qn(i, j) - q(i, j)) * m_time_diag[k] / g.volume[k];
            sum += rate * rate;
        }
    r.residual = std::sqrt(sum / static_cast<double>(g.volume.size()));
    r.finite = r.finite && std::isfinite(r.residual);
    std::swap(m_q, m_new);
    m_cells = m_q.interior();
    fill_ghosts(m_q.view());
    return r;
}

}  // namespace veer
