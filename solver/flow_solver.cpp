#include "solver/flow_solver.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <numbers>
#include <set>
#include <sstream>

#include "solver/boundary_ghosts.hpp"
#include "solver/face_flux.hpp"
#include "solver/far_field_vortex.hpp"
#include "solver/flow_solver_impl.hpp"
#include "solver/projection_stencil.hpp"
#include "solver/time_steps.hpp"

namespace veer {

namespace {

void check_settings(const FlowConditions& c, const SolverSettings& s) {
    auto fail = [](const char* key, double value, const char* allowed) {
        std::ostringstream msg;
        msg << "solver setting " << key << " = " << value << ": allowed " << allowed;
        throw InputError(msg.str());
    };
    if (!(c.reynolds > 0.0)) fail("reynolds", c.reynolds, "> 0");
    if (!(s.pseudo_cfl >= 0.0)) fail("pseudo_cfl", s.pseudo_cfl, "> 0 (or 0: the default)");
    // Rhie-Chow modes decay by 1 - D_f / gamma per step: |.| < 1 needs gamma > D_f / 2.
    const double fraction = steady_choices(s).projection_fraction;
    if (s.mode == TimeMode::steady &&
        !(effective_pseudo_cfl(s) * fraction > 0.5 * s.rhie_chow_scale))
        fail("pseudo_cfl", effective_pseudo_cfl(s),
             fraction == 1.0 ? "> rhie_chow_scale / 2 (pressure smoothing stability)"
                             : "> rhie_chow_scale / (2 x the scheme's projection fraction) "
                               "(pressure smoothing stability)");
    if (!(s.rhie_chow_scale > 0.0)) fail("rhie_chow_scale", s.rhie_chow_scale, "> 0");
    if (s.local_step_interval < 1) fail("local_step_interval", s.local_step_interval, ">= 1");
    if (s.stall_rule.patience < 1) fail("stall_rule.patience", s.stall_rule.patience, ">= 1");
    if (!(s.stall_rule.progress_factor > 0.0 && s.stall_rule.progress_factor < 1.0))
        fail("stall_rule.progress_factor", s.stall_rule.progress_factor, "in (0, 1)");
    if (s.momentum_sweeps < 0)
        fail("momentum_sweeps", s.momentum_sweeps, ">= 1 (or 0: the scheme's number)");
    if (s.momentum_max_sweeps < 1) fail("momentum_max_sweeps", s.momentum_max_sweeps, ">= 1");
    if (!(s.pressure_tolerance > 0.0)) fail("pressure_tolerance", s.pressure_tolerance, "> 0");
    if (!(s.steady_pressure_tolerance > 0.0 && s.steady_pressure_tolerance < 1.0))
        fail("steady_pressure_tolerance", s.steady_pressure_tolerance, "in (0, 1)");
    if (!(s.vortex_relaxation >= 0.0 && s.vortex_relaxation <= 1.0))
        fail("vortex_relaxation", s.vortex_relaxation, "in [0, 1]");
}

/// A model's variable names become checkpoint arrays, VTK arrays and history columns.
void check_model_variables(const FlowModel& model) {
    std::set<std::string> seen;
    for (const ModelVariable& v : model.variables()) {
        const bool usable =
            !v.name.empty() && std::all_of(v.name.begin(), v.name.end(), [](char c) {
                return std::isalnum(static_cast<unsigned char>(c)) != 0 || c == '_';
            });
        VEER_VERIFY(usable, "model variable name '" + v.name + "': letters, digits and '_' only");
        VEER_VERIFY(seen.insert(v.name).second, "model variable '" + v.name + "' given twice");
    }
}

}  // namespace

FlowSolverCore::FlowSolverCore(const StructuredGrid& g, const FlowConditions& c,
                               const SolverSettings& s)
    : grid(g), conditions(c), settings(s), requested_scheme(s.steady_scheme) {
    check_settings(c, s);
    nu = 1.0 / c.reynolds;
    const double a = c.alpha_deg * std::numbers::pi / 180.0;
    free_stream = {std::cos(a), std::sin(a)};
    const GridMetrics metrics = compute_metrics(grid);
    connectivity = make_connectivity(grid, metrics);
    faces = collect_boundary_faces(grid, metrics, free_stream, s.velocity_overrides);
    geom = make_face_geometry(metrics, connectivity, faces);
    centroids = metrics.centroid;
    vortex_active = s.far_field_vortex && grid.c_layout().has_value();
    allocate();
    pressure_solver = make_pressure_solver(s.pressure_solver);
    // The model may keep pointers to geom, faces and connectivity: members of this heap object.
    VEER_VERIFY(static_cast<bool>(s.model.make), "model '" + s.model.name + "' cannot be built");
    model = s.model.make(ModelSetup{grid, metrics, geom, faces, connectivity, nu, s.model.options});
    check_model_variables(*model);
    model->fold_wake_cut_lines(folds_wake_cut_lines());
    if (model->has_eddy_viscosity()) {
        eddy_i.assign(geom.i_faces.area.size(), 0.0);
        eddy_j.assign(geom.j_faces.area.size(), 0.0);
        eddy_target_i = eddy_i;
        eddy_target_j = eddy_j;
    }
    FlowFields start;
    start.u.assign(geom.volume.size(), free_stream.x);
    start.v.assign(geom.volume.size(), free_stream.y);
    start.pressure.assign(geom.volume.size(), 0.0);
    vel.u.set_interior(start.u);
    vel.v.set_interior(start.v);
    pressure.set_interior(start.pressure);
    reset_history();
}

void FlowSolverCore::allocate() {
    const int ni = geom.ni, nj = geom.nj;
    for (VelocityField* f : {&vel, &vel_old, &vel_new, &vel_lag}) *f = VelocityField(ni, nj);
    for (CellField* f :
         {&pressure, &increment, &ux, &uy, &vx, &vy, &px, &py, &phix, &phiy, &local_dt})
        *f = CellField(ni, nj);
    const std::size_t nfi = geom.i_faces.area.size(), nfj = geom.j_faces.area.size();
    for (auto* f : {&flux_i, &flux_i_old, &flux_i_new, &gamma_i, &rc_i}) f->assign(nfi, 0.0);
    for (auto* f : {&flux_j, &flux_j_old, &flux_j_new, &gamma_j, &rc_j}) f->assign(nfj, 0.0);
    const std::size_t n = geom.volume.size();
    for (auto* f :
         {&time_diag, &time_rhs_u, &time_rhs_v, &source_u, &source_v, &outflow, &rhs, &phi})
        f->assign(n, 0.0);
    system.resize(ni, nj);
    line_work.prepare(connectivity, folds_wake_cut_lines());
}

bool FlowSolverCore::relaxes_eddy_viscosity() const {
    return settings.mode == TimeMode::steady && model->has_eddy_viscosity() &&
           steady_choices(settings).eddy_viscosity_relaxation < 1.0;
}

void FlowSolverCore::watch_progress(const StepReport& r) {
    if (settings.steady_scheme != SteadyScheme::fast || !r.finite) return;
    // Every equation solved: u, v, continuity and the model's variables.
    std::vector<double> residuals = {r.residual_u, r.residual_v, r.residual_continuity};
    residuals.insert(residuals.end(), r.model_residuals.begin(), r.model_residuals.end());
    if (stall_guard.stalled_after(residuals)) {
        scheme_fallback_step = steps;
        fall_back_to_classic();
    }
}

/// The same discrete equations (the Rhie-Chow coefficient does not depend on the scheme), the
/// path of "classic": its pseudo CFL, sweeps, unfolded lines, SIMPLEC increment, and the model's
/// eddy viscosity as it is. The local steps and the Poisson set-up are renewed at once.
void FlowSolverCore::fall_back_to_classic() {
    use_scheme(SteadyScheme::classic);
    refresh_local_steps();
}

void FlowSolverCore::use_scheme(SteadyScheme scheme) {
    settings.steady_scheme = scheme;
    line_work.prepare(connectivity, folds_wake_cut_lines());
    model->fold_wake_cut_lines(folds_wake_cut_lines());
}

bool FlowSolverCore::folds_wake_cut_lines() const {
    return settings.mode == TimeMode::steady && steady_choices(settings).fold_wake_cut;
}

void FlowSolverCore::reset_history() {
    // A new history starts on the scheme the settings asked for.
    if (settings.steady_scheme != requested_scheme) use_scheme(requested_scheme);
    scheme_fallback_step = 0;
    stall_guard = StallGuard(settings.stall_rule);
    time = 0.0;
    dt_previous = 0.0;
    steps = 0;
    circulation = 0.0;
    update_boundary_values(0.0);
    fill_velocity_ghosts(faces, connectivity, vel.u.view(), vel.v.view());
    interpolated_face_flux(geom, vel.u.view(), vel.v.view(), flux_i, flux_j);
    flux_i_old = flux_i;
    flux_j_old = flux_j;
    vel_old = vel;
    if (settings.mode == TimeMode::time_accurate) setup_uniform_pressure();
}

void FlowSolverCore::update_boundary_values(double t) {
    for (BoundaryFace& f : faces) {
        Vec2 far = free_stream;
        if (vortex_active)
            far = far + point_vortex_velocity(f.center, settings.vortex_center, circulation);
        switch (f.role) {
            case FaceRole::wall:
                f.velocity = {};
                break;
            case FaceRole::inflow:
                f.velocity = far;
                break;
            case FaceRole::outflow:
                f.velocity = far;
                f.pressure = 0.5 * (1.0 - dot(far, far));
                break;
            case FaceRole::prescribed_velocity:
                f.velocity = settings.velocity_overrides[static_cast<std::size_t>(f.override_index)]
                                 .velocity(f.center, t);
                break;
        }
    }
}

void FlowSolverCore::setup_uniform_pressure() {
    std::fill(gamma_i.begin(), gamma_i.end(), 1.0);
    std::fill(gamma_j.begin(), gamma_j.end(), 1.0);
    pressure_solver->setup(
        make_projection_stencil(geom, connectivity, grid.c_layout(), faces, gamma_i, gamma_j));
}

void FlowSolverCore::refresh_local_steps() {
    std::vector<double> dt;
    local_time_steps(geom, vel.u.view(), vel.v.view(), nu, effective_pseudo_cfl(settings),
                     settings.viscous_weight, dt);
    local_dt.set_interior(dt);
    apply_local_steps();
}

void FlowSolverCore::apply_local_steps() {
    fill_copy_ghosts(faces, connectivity, local_dt.view());
    const int ni = geom.ni, nj = geom.nj;
    CellView d = local_dt.view();
    // D_f = rhie_chow_scale / radius whatever the scheme (the discretisation); gamma is the
    // scheme's fraction of the local step (the path).
    const double rc = settings.rhie_chow_scale / effective_pseudo_cfl(settings);
    const double fraction = steady_choices(settings).projection_fraction;
    for (int j = 0; j < nj; ++j)
        for (int f = 0; f <= ni; ++f) {
            const std::size_t k = geom.face_i(f, j);
            const double step = 0.5 * (d(f - 1, j) + d(f, j));
            gamma_i[k] = fraction * step;
            rc_i[k] = rc * step;
        }
    for (int f = 0; f <= nj; ++f)
        for (int i = 0; i < ni; ++i) {
            const std::size_t k = geom.face_j(i, f);
            const double step = 0.5 * (d(i, f - 1) + d(i, f));
            gamma_j[k] = fraction * step;
            rc_j[k] = rc * step;
        }
    pressure_solver->setup(
        make_projection_stencil(geom, connectivity, grid.c_layout(), faces, gamma_i, gamma_j));
}

FlowSolver::FlowSolver(const StructuredGrid& grid, const FlowConditions& conditions,
                       const SolverSettings& settings)
    : m_impl(std::make_unique<FlowSolverCore>(grid, conditions, settings)) {}

FlowSolver::~FlowSolver() = default;

void FlowSolver::initialize(const FlowFields& initial) {
    FlowSolverCore& s = *m_impl;
    s.vel.u.set_interior(initial.u);
    s.vel.v.set_interior(initial.v);
    s.pressure.set_interior(initial.pressure);
    // A sweep's next point starts from the last one's model variables too (those it has).
    std::vector<NamedArray> carried;
    for (const ModelVariable& v : s.model->variables())
        for (const NamedArray& a : initial.model_fields)
            if (a.name == v.name) carried.push_back(a);
    for (const NamedArray& a : carried)
        VEER_VERIFY(a.values.size() == s.geom.volume.size(),
                    "initial model field '" + a.name + "' does not match the grid");
    s.model->set_values(carried);
    s.reset_history();
}

StepReport FlowSolver::advance(double dt, double nominal_dt) {
    VEER_VERIFY(m_impl->settings.mode == TimeMode::time_accurate,
                "advance(dt) is the time-accurate step; steady runs call advance_pseudo_time()");
    VEER_VERIFY(dt > 0.0 && std::isfinite(dt), "a time step must be positive and finite");
    VEER_VERIFY(nominal_dt >= 0.0 && std::isfinite(nominal_dt), "a nominal step must be finite");
    return m_impl->step(dt, false, nominal_dt > 0.0 ? nominal_dt : dt);
}

StepReport FlowSolver::advance_pseudo_time() {
    VEER_VERIFY(m_impl->settings.mode == TimeMode::steady,
                "advance_pseudo_time() is the steady step; time-accurate runs call advance(dt)");
    StepReport r = m_impl->step(0.0, true);
    m_impl->watch_progress(r);
    return r;
}

double FlowSolver::time_step_for_cfl(double cfl) const {
    return convective_time_step(m_impl->geom, m_impl->vel.u.view(), m_impl->vel.v.view(), cfl);
}

FlowFields FlowSolver::fields() const {
    FlowFields f;
    f.ni = m_impl->geom.ni;
    f.nj = m_impl->geom.nj;
    f.u = m_impl->vel.u.interior();
    f.v = m_impl->vel.v.interior();
    f.pressure = m_impl->pressure.interior();
    f.eddy_viscosity = m_impl->model->eddy_viscosity();
    f.model_fields = m_impl->model->values();
    for (NamedArray& a : m_impl->model->output_fields()) f.model_fields.push_back(std::move(a));
    return f;
}

double FlowSolver::time() const { return m_impl->time; }
long FlowSolver::step_count() const { return m_impl->steps; }
double FlowSolver::far_field_circulation() const { return m_impl->circulation; }
const std::vector<ModelVariable>& FlowSolver::model_variables() const {
    return m_impl->model->variables();
}
long FlowSolver::scheme_fallback_step() const { return m_impl->scheme_fallback_step; }

}  // namespace veer
