/// One step of the incremental pressure-correction method (van Kan 1986, SIAM J. Sci. Stat.
/// Comput. 7(3), 870-891), BDF2 or BDF1 in time:
///   1. momentum with p^n: (alpha0 u* + alpha1 u^n + alpha2 u^{n-1}) / dt + N(u*) = -grad p^n
///      + nu lap u* + f, convection linearised on the extrapolated fluxes;
///   2. Rhie-Chow predicted fluxes F* (face_flux.hpp);
///   3. L(phi) = div F* / gamma with gamma = dt / alpha0 (steady: per-face local steps);
///   4. F^{n+1} = F* - gamma grad_f phi, u^{n+1} = u* + (cell change reconstructed from the
///      face-flux changes, face_flux.hpp), p^{n+1} = p^n + phi.
#include <algorithm>
#include <cmath>
#include <string>

#include "solver/boundary_ghosts.hpp"
#include "solver/face_flux.hpp"
#include "solver/far_field_vortex.hpp"
#include "solver/flow_solver_impl.hpp"
#include "solver/gradients.hpp"
#include "solver/loops.hpp"
#include "solver/time_steps.hpp"

namespace veer {

namespace {

/// Lagged velocity and fluxes: the extrapolation of levels n and n-1 to n+1.
void extrapolate(FlowSolverCore& s, const BdfCoefficients& c) {
    const double e0 = c.extrap0, e1 = c.extrap1;
    CellView u = s.vel.u.view(), v = s.vel.v.view();
    CellView uo = s.vel_old.u.view(), vo = s.vel_old.v.view();
    CellView ul = s.vel_lag.u.view(), vl = s.vel_lag.v.view();
    for_each_cell({0, s.geom.ni, 0, s.geom.nj}, [&](int i, int j) {
        ul(i, j) = e0 * u(i, j) + e1 * uo(i, j);
        vl(i, j) = e0 * v(i, j) + e1 * vo(i, j);
    });
    for (std::size_t k = 0; k < s.flux_i.size(); ++k)
        s.flux_i_new[k] = e0 * s.flux_i[k] + e1 * s.flux_i_old[k];
    for (std::size_t k = 0; k < s.flux_j.size(); ++k)
        s.flux_j_new[k] = e0 * s.flux_j[k] + e1 * s.flux_j_old[k];
}

/// Gradients of the lagged velocity and of p^n, ghosts filled.
void prepare_gradients(FlowSolverCore& s) {
    fill_velocity_ghosts(s.faces, s.connectivity, s.vel_lag.u.view(), s.vel_lag.v.view());
    green_gauss_gradient(s.geom, s.vel_lag.u.view(), s.ux.view(), s.uy.view());
    green_gauss_gradient(s.geom, s.vel_lag.v.view(), s.vx.view(), s.vy.view());
    fill_pressure_ghosts(s.faces, s.connectivity, s.pressure.view());
    green_gauss_gradient(s.geom, s.pressure.view(), s.px.view(), s.py.view());
    for (CellField* f : {&s.ux, &s.uy, &s.vx, &s.vy, &s.px, &s.py})
        fill_copy_ghosts(s.faces, s.connectivity, f->view());
}

/// Time-derivative coefficients and body force, per cell (x volume).
void time_terms(FlowSolverCore& s, const BdfCoefficients& c, double dt, bool steady, double t_new) {
    CellView u = s.vel.u.view(), v = s.vel.v.view();
    CellView uo = s.vel_old.u.view(), vo = s.vel_old.v.view();
    CellView ldt = s.local_dt.view();
    const bool forced = static_cast<bool>(s.settings.body_force);
    for_each_cell({0, s.geom.ni, 0, s.geom.nj}, [&](int i, int j) {
        const std::size_t k = s.geom.cell(i, j);
        const double vol = s.geom.volume[k];
        const double step = steady ? ldt(i, j) : dt;
        s.time_diag[k] = c.alpha0 * vol / step;
        s.time_rhs_u[k] = -vol * (c.alpha1 * u(i, j) + c.alpha2 * uo(i, j)) / step;
        s.time_rhs_v[k] = -vol * (c.alpha1 * v(i, j) + c.alpha2 * vo(i, j)) / step;
        if (forced) {
            const Vec2 f = s.settings.body_force(s.centroids[k], t_new);
            s.source_u[k] = vol * f.x;
            s.source_v[k] = vol * f.y;
        }
    });
}

/// Pressure increment from the predicted fluxes; fluxes and cell velocities projected.
PressureSolveStats project(FlowSolverCore& s, double gamma_uniform, bool steady) {
    net_outflow(s.geom, s.flux_i_new, s.flux_j_new, s.outflow);
    const double scale = steady ? 1.0 : 1.0 / gamma_uniform;
    for (std::size_t k = 0; k < s.rhs.size(); ++k) {
        s.rhs[k] = scale * s.outflow[k];
        s.phi[k] = 0.0;
    }
    const PressureSolveStats st = s.pressure_solver->solve(
        s.rhs, s.phi, steady ? s.settings.steady_pressure_tolerance : s.settings.pressure_tolerance,
        s.settings.pressure_max_iterations);
    s.increment.set_interior(s.phi);
    fill_increment_ghosts(s.faces, s.connectivity, s.increment.view());
    if (!steady) {
        std::fill(s.gamma_i.begin(), s.gamma_i.end(), gamma_uniform);
        std::fill(s.gamma_j.begin(), s.gamma_j.end(), gamma_uniform);
    }
    correct_face_flux(s.geom, s.increment.view(), s.gamma_i, s.gamma_j, s.flux_i_new, s.flux_j_new);
    // Cell velocities corrected from the face-flux corrections, not from a Green-Gauss
    // gradient of phi: on stretched, skewed cells (C-grid wake near the outlets) the two differ
    // enough for the cell-centred divergence to grow step after step.
    flux_consistent_correction(s.geom, s.increment.view(), s.gamma_i, s.gamma_j, s.phix.view(),
                               s.phiy.view());
    CellView un = s.vel_new.u.view(), vn = s.vel_new.v.view(), p = s.pressure.view();
    CellView gx = s.phix.view(), gy = s.phiy.view(), phi = s.increment.view();
    for_each_cell({0, s.geom.ni, 0, s.geom.nj}, [&](int i, int j) {
        un(i, j) += gx(i, j);
        vn(i, j) += gy(i, j);
        p(i, j) += phi(i, j);
    });
    return st;
}

/// Residuals, finiteness and the worst cell (serial, in memory order: deterministic).
void fill_report(FlowSolverCore& s, double dt, bool steady, StepReport& r) {
    CellView u = s.vel.u.view(), v = s.vel.v.view();
    CellView un = s.vel_new.u.view(), vn = s.vel_new.v.view(), p = s.pressure.view();
    CellView ldt = s.local_dt.view();
    static const std::string names[3] = {"u", "v", "pressure"};
    double su = 0.0, sv = 0.0, sc = 0.0, worst = -1.0;
    int worst_variable = 0;
    for (int j = 0; j < s.geom.nj; ++j)
        for (int i = 0; i < s.geom.ni; ++i) {
            const double step = steady ? ldt(i, j) : dt;
            const double ru = (un(i, j) - u(i, j)) / step, rv = (vn(i, j) - v(i, j)) / step;
            const std::size_t k = s.geom.cell(i, j);
            const double rc = s.outflow[k] / s.geom.volume[k];
            su += ru * ru;
            sv += rv * rv;
            sc += rc * rc;
            const double values[3] = {un(i, j), vn(i, j), p(i, j)};
            for (int q = 0; q < 3 && r.finite; ++q)
                if (!std::isfinite(values[q])) {
                    r.finite = false;
                    r.worst_i = i;
                    r.worst_j = j;
                    worst_variable = q;
                }
            if (r.finite && std::max(std::abs(ru), std::abs(rv)) > worst) {
                worst = std::max(std::abs(ru), std::abs(rv));
                r.worst_i = i;
                r.worst_j = j;
                worst_variable = std::abs(ru) >= std::abs(rv) ? 0 : 1;
            }
        }
    r.worst_variable = names[worst_variable];
    const double n = static_cast<double>(s.geom.volume.size());
    r.residual_u = std::sqrt(su / n);
    r.residual_v = std::sqrt(sv / n);
    r.residual_continuity = std::sqrt(sc / n);
    r.finite = r.finite && std::isfinite(r.residual_u + r.residual_v + r.residual_continuity);
}

}  // namespace

StepReport FlowSolverCore::step(double dt, bool steady, double nominal_dt) {
    // Second order needs a previous physical step: a steady history (a time-accurate run
    // restarted from a steady checkpoint) has none (its dt_previous is 0), so it starts first
    // order.
    const bool second = !steady && steps > 0 && dt_previous > 0.0;
    const BdfCoefficients c = bdf_coefficients(second, dt, dt_previous);
    if (steady && steps % settings.local_step_interval == 0) refresh_local_steps();
    const double t_new = steady ? time : time + dt;
    update_boundary_values(t_new);
    extrapolate(*this, c);
    prepare_gradients(*this);
    time_terms(*this, c, dt, steady, t_new);
    MomentumInputs in;
    in.nu = nu;
    in.flux_i = &flux_i_new;
    in.flux_j = &flux_j_new;
    in.u_lag = vel_lag.u.view();
    in.v_lag = vel_lag.v.view();
    in.ux = ux.view();
    in.uy = uy.view();
    in.vx = vx.view();
    in.vy = vy.view();
    in.grad_px = px.view();
    in.grad_py = py.view();
    in.u_now = vel.u.view();
    in.v_now = vel.v.view();
    in.time_diag = &time_diag;
    in.time_rhs_u = &time_rhs_u;
    in.time_rhs_v = &time_rhs_v;
    if (model->has_eddy_viscosity()) {
        update_face_eddy_viscosity();
        in.eddy_i = &eddy_i;
        in.eddy_j = &eddy_j;
    }
    if (settings.body_force) {
        in.source_u = &source_u;
        in.source_v = &source_v;
    }
    assemble_momentum(geom, faces, in, system);
    vel_new = vel;
    const RelaxationStats ms =
        steady
            ? relax_momentum(system, connectivity, vel_new.u.view(), vel_new.v.view(),
                             effective_momentum_sweeps(settings), 0.0, line_work)
            : relax_momentum(system, connectivity, vel_new.u.view(), vel_new.v.view(),
                             settings.momentum_max_sweeps, settings.momentum_tolerance, line_work);
    fill_velocity_ghosts(faces, connectivity, vel_new.u.view(), vel_new.v.view());
    const double gamma = steady ? 0.0 : dt / c.alpha0;
    if (!steady) {
        // The pressure smoothing of the predicted fluxes follows the nominal step with the
        // fixed-step BDF coefficient, not this step's gamma: with gamma, a step shortened to
        // land on an end time changed the smoothing, so the projection had to absorb the
        // divergence of that change in one short step (Cl moved by 1.6 % on a 128 x 32 NACA
        // 0012 grid at Re 1000, alpha 4, in a flow changing by 1e-8 per step).
        const double smoothing = nominal_dt / (second ? 1.5 : 1.0);
        std::fill(rc_i.begin(), rc_i.end(), smoothing);
        std::fill(rc_j.begin(), rc_j.end(), smoothing);
    }
    predicted_face_flux(geom, vel_new.u.view(), vel_new.v.view(), pressure.view(), px.view(),
                        py.view(), rc_i, rc_j, flux_i_new, flux_j_new);
    const PressureSolveStats ps = project(*this, gamma, steady);

    StepReport r;
    fill_report(*this, dt, steady, r);
    std::swap(vel_old, vel);
    std::swap(vel, vel_new);
    std::swap(flux_i_old, flux_i);
    std::swap(flux_i, flux_i_new);
    std::swap(flux_j_old, flux_j);
    std::swap(flux_j, flux_j_new);
    dt_previous = dt;
    time = t_new;
    ++steps;
    if (vortex_active) update_vortex();
    advance_model(dt, steady, r);
    r.step = steps;
    r.time = time;
    r.time_step = dt;
    if (steady) {
        double m = local_dt(0, 0);
        for (int j = 0; j < geom.nj; ++j)
            for (int i = 0; i < geom.ni; ++i) m = std::min(m, local_dt(i, j));
        r.time_step = m;
    }
    r.momentum_sweeps = ms.sweeps;
    r.pressure_iterations = ps.iterations;
    r.pressure_residual = ps.final_residual;
    r.circulation = circulation;
    return r;
}

void FlowSolverCore::advance_model(double dt, bool steady, StepReport& r) {
    if (model->variables().empty()) return;
    fill_velocity_ghosts(faces, connectivity, vel.u.view(), vel.v.view());
    ModelStepInputs in;
    in.u = vel.u.view();
    in.v = vel.v.view();
    in.flux_i = &flux_i;
    in.flux_j = &flux_j;
    if (steady) in.local_dt = local_dt.view();
    in.dt = dt;
    in.steady = steady;
    ModelStepReport m = model->advance(in);
    VEER_VERIFY(m.residuals.size() == model->variables().size(),
                "a model reports one residual per variable");
    r.model_residuals = std::move(m.residuals);
    if (!m.finite && r.finite) {
        r.finite = false;
        r.worst_i = m.worst_i;
        r.worst_j = m.worst_j;
        r.worst_variable = m.worst_variable;
    }
}

/// The model's face eddy viscosity, under-relaxed in steady schemes that ask for it (from the
/// second step of a history on: the first takes the model's value).
void FlowSolverCore::update_face_eddy_viscosity() {
    const double factor = steady_choices(settings).eddy_viscosity_relaxation;
    if (!relaxes_eddy_viscosity() || steps == 0) {
        model->face_eddy_viscosity(eddy_i, eddy_j);
        return;
    }
    model->face_eddy_viscosity(eddy_target_i, eddy_target_j);
    for (std::size_t k = 0; k < eddy_i.size(); ++k)
        eddy_i[k] += factor * (eddy_target_i[k] - eddy_i[k]);
    for (std::size_t k = 0; k < eddy_j.size(); ++k)
        eddy_j[k] += factor * (eddy_target_j[k] - eddy_j[k]);
}

void FlowSolverCore::update_vortex() {
    fill_pressure_ghosts(faces, connectivity, pressure.view());
    const Vec2 force = wall_force(geom, faces, vel.u.view(), vel.v.view(), pressure.view(), nu);
    const Vec2 lift_dir{-free_stream.y, free_stream.x};
    const double gamma_estimate = dot(force, lift_dir);  // L' / (rho U_inf), U_inf = 1
    circulation += settings.vortex_relaxation * (gamma_estimate - circulation);
}

}  // namespace veer
