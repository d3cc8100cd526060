#include "solver/spalart_allmaras.hpp"

#include <cmath>
#include <sstream>

#include "solver/boundary_ghosts.hpp"
#include "solver/gradients.hpp"
#include "solver/loops.hpp"
#include "solver/spalart_allmaras_terms.hpp"

namespace veer {

namespace {

void check_settings(const SpalartAllmarasSettings& s, double nu, std::size_t cells,
                    std::size_t distances) {
    auto fail = [](const char* key, double value, const char* allowed) {
        std::ostringstream msg;
        msg << "Spalart-Allmaras setting " << key << " = " << value << ": allowed " << allowed;
        throw InputError(msg.str());
    };
    if (!(nu > 0.0)) fail("nu", nu, "> 0");
    if (!(s.free_stream_ratio >= 0.0)) fail("free_stream_ratio", s.free_stream_ratio, ">= 0");
    if (s.sweeps < 1) fail("sweeps", s.sweeps, ">= 1");
    if (!(s.time_step_scale > 0.0)) fail("time_step_scale", s.time_step_scale, "> 0");
    VEER_VERIFY(distances == cells, "one wall distance per cell");
}

}  // namespace

SpalartAllmaras::SpalartAllmaras(const FaceGeometry& geom, const std::vector<BoundaryFace>& faces,
                                 const Connectivity& connectivity,
                                 std::vector<double> wall_distance, double nu,
                                 SpalartAllmarasSettings settings)
    : m_geom(&geom),
      m_faces(&faces),
      m_connectivity(&connectivity),
      m_wall_distance(std::move(wall_distance)),
      m_nu(nu),
      m_settings(std::move(settings)) {
    check_settings(m_settings, nu, geom.volume.size(), m_wall_distance.size());
    m_conditions = scalar_face_conditions(faces, boundary_column());
    const int ni = geom.ni, nj = geom.nj;
    for (CellField* f : {&m_nu_tilde, &m_nu_tilde_new, &m_unused, &m_grad_x, &m_grad_y, &m_ux,
                         &m_uy, &m_vx, &m_vy})
        *f = CellField(ni, nj);
    const std::size_t n = geom.volume.size();
    for (auto* v : {&m_time_diag, &m_source_explicit, &m_source_implicit, &m_manufactured})
        v->assign(n, 0.0);
    if (m_settings.manufactured_source)
        for (std::size_t k = 0; k < n; ++k)
            m_manufactured[k] = m_settings.manufactured_source(geom.centroid[k]);
    m_face_work.resize(geom);
    m_system.resize(ni, nj);
    m_work.prepare(connectivity, m_settings.fold_wake_cut_lines);
    set_nu_tilde(std::vector<double>(n, free_stream_nu_tilde()));
}

ScalarColumn SpalartAllmaras::boundary_column() const {
    return nu_tilde_column(free_stream_nu_tilde(), m_settings.prescribed_value);
}

void SpalartAllmaras::set_source_modifiers(const std::vector<double>* production_factor,
                                           const std::vector<double>* trip_ft2) {
    for (const std::vector<double>* v : {production_factor, trip_ft2})
        VEER_VERIFY(!v || v->size() == m_geom->volume.size(), "one source modifier per cell");
    m_production_factor = production_factor;
    m_trip_ft2 = trip_ft2;
}

void SpalartAllmaras::fill_ghosts(CellView q) {
    fill_scalar_ghosts(*m_faces, m_conditions, *m_connectivity, q);
}

void SpalartAllmaras::set_nu_tilde(const std::vector<double>& values) {
    VEER_VERIFY(values.size() == m_geom->volume.size(), "one nu_tilde per cell");
    m_nu_tilde.set_interior(values);
    fill_ghosts(m_nu_tilde.view());
}

std::vector<double> SpalartAllmaras::nu_tilde() const { return m_nu_tilde.interior(); }

/// Vorticity magnitude from Green-Gauss velocity gradients, then the split source per cell.
void SpalartAllmaras::compute_sources(const ModelStepInputs& in) {
    const FaceGeometry& g = *m_geom;
    const std::size_t n = g.volume.size();
    if (!m_settings.model_sources) {
        for (std::size_t k = 0; k < n; ++k) {
            m_source_explicit[k] = m_manufactured[k];
            m_source_implicit[k] = 0.0;
        }
        return;
    }
    green_gauss_gradient(g, in.u, m_ux.view(), m_uy.view());
    green_gauss_gradient(g, in.v, m_vx.view(), m_vy.view());
    CellView q = m_nu_tilde.view(), uy = m_uy.view(), vx = m_vx.view();
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        const std::size_t k = g.cell(i, j);
        const double omega = std::abs(vx(i, j) - uy(i, j));
        SaSourceModifiers modifiers;
        if (m_production_factor) modifiers.production_factor = (*m_production_factor)[k];
        if (m_trip_ft2) modifiers.ft2 = (*m_trip_ft2)[k];
        const SaSourceSplit s =
            sa_source_linearised(q(i, j), omega, m_wall_distance[k], m_nu, modifiers);
        m_source_explicit[k] = s.explicit_part + m_manufactured[k];
        m_source_implicit[k] = s.implicit_coefficient;
    });
}

TurbulenceReport SpalartAllmaras::advance(const ModelStepInputs& in) {
    const FaceGeometry& g = *m_geom;
    CellView q = m_nu_tilde.view();
    fill_ghosts(q);
    green_gauss_gradient(g, q, m_grad_x.view(), m_grad_y.view());
    fill_copy_ghosts(*m_faces, *m_connectivity, m_grad_x.view());
    fill_copy_ghosts(*m_faces, *m_connectivity, m_grad_y.view());
    compute_sources(in);
    const double scale = in.steady ? m_settings.time_step_scale : 1.0;
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        const std::size_t k = g.cell(i, j);
        const double dt = in.steady ? in.local_dt(i, j) : in.dt;
        m_time_diag[k] = g.volume[k] / (scale * dt);
    });
    NuTildeInputs ti;
    ti.nu = m_nu;
    ti.flux_i = in.flux_i;
    ti.flux_j = in.flux_j;
    ti.nu_tilde = q;
    ti.grad_x = m_grad_x.view();
    ti.grad_y = m_grad_y.view();
    ti.second_order = m_settings.second_order_convection;
    ti.time_diag = &m_time_diag;
    ti.source_explicit = &m_source_explicit;
    ti.source_implicit = &m_source_implicit;
    assemble_nu_tilde(g, *m_faces, m_conditions, ti, m_face_work, m_system);
    m_nu_tilde_new = m_nu_tilde;
    relax_momentum(m_system, *m_connectivity, m_nu_tilde_new.view(), m_unused.view(),
                   m_settings.sweeps, 0.0, m_work);
    return finish(in);
}

/// Residual, finiteness, the worst cell; then the new level becomes current.
TurbulenceReport SpalartAllmaras::finish(const ModelStepInputs& in) {
    const FaceGeometry& g = *m_geom;
    TurbulenceReport r;
    CellView q = m_nu_tilde.view(), qn = m_nu_tilde_new.view();
    double sum = 0.0, worst = -1.0;
    r.min_nu_tilde = qn(0, 0);
    for (int j = 0; j < g.nj; ++j)
        for (int i = 0; i < g.ni; ++i) {
            const std::size_t k = g.cell(i, j);
            const double rate = (qn(i, j) - q(i, j)) * m_time_diag[k] / g.volume[k];
            sum += rate * rate;
            r.min_nu_tilde = std::min(r.min_nu_tilde, qn(i, j));
            if (!std::isfinite(qn(i, j))) {
                if (r.finite) r.worst_i = i, r.worst_j = j;
                r.finite = false;
            } else if (r.finite && std::abs(rate) > worst) {
                worst = std::abs(rate);
                r.worst_i = i;
                r.worst_j = j;
            }
        }
    r.residual = std::sqrt(sum / static_cast<double>(g.volume.size()));
    r.finite = r.finite && std::isfinite(r.residual);
    (void)in;
    std::swap(m_nu_tilde, m_nu_tilde_new);
    fill_ghosts(m_nu_tilde.view());
    return r;
}

void SpalartAllmaras::fold_wake_cut_lines(bool fold) {
    m_settings.fold_wake_cut_lines = fold;
    m_work.prepare(*m_connectivity, fold);
}

std::vector<double> SpalartAllmaras::eddy_viscosity() const {
    std::vector<double> q = m_nu_tilde.interior();
    for (double& x : q) x = sa_eddy_viscosity(x, m_nu);
    return q;
}

void SpalartAllmaras::face_eddy_viscosity(std::vector<double>& on_i,
                                          std::vector<double>& on_j) const {
    const FaceGeometry& g = *m_geom;
    on_i.resize(g.i_faces.area.size());
    on_j.resize(g.j_faces.area.size());
    const CellField& q = m_nu_tilde;
    for (int j = 0; j < g.nj; ++j)
        for (int f = 0; f <= g.ni; ++f)
            on_i[g.face_i(f, j)] = sa_eddy_viscosity(0.5 * (q(f - 1, j) + q(f, j)), m_nu);
    for (int f = 0; f <= g.nj; ++f)
        for (int i = 0; i < g.ni; ++i)
            on_j[g.face_j(i, f)] = sa_eddy_viscosity(0.5 * (q(i, f - 1) + q(i, f)), m_nu);
}

}  // namespace veer
