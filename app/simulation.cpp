#include "app/simulation.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <chrono>
#include <cmath>
#include <map>
#include <numbers>

#include "app/free_stream_reference.hpp"
#include "app/interrupt.hpp"
#include "app/progress_line.hpp"
#include "io/field_series.hpp"
#include "io/history_file.hpp"
#include "mesh/circle.hpp"
#include "mesh/errors.hpp"
#include "postprocess/run_analysis.hpp"

namespace veer {
namespace {

constexpr const char* convergence_record = "simulation_convergence";

bool is_steady(const CaseSpec& spec) { return spec.run.mode == TimeMode::steady; }

/// How long the start spin of a circle lasts (free-stream time units, diameters / U_inf): about
/// a third of a shedding period at Re 100, enough to tip the wake to one side.
constexpr double start_spin_time = 2.0;

}  // namespace

const char* status_word(RunStatus s) {
    switch (s) {
        case RunStatus::converged:
            return "converged";
        case RunStatus::step_cap:
            return "step cap";
        case RunStatus::end_time:
            return "end time";
        case RunStatus::interrupted:
            return "interrupted";
        case RunStatus::diverged:
            return "diverged";
    }
    return "?";
}

SolverSettings solver_settings_for(const CaseSpec& spec) {
    SolverSettings s;
    s.mode = is_steady(spec) ? TimeMode::steady : TimeMode::time_accurate;
    s.pressure_solver = spec.run.pressure_solver;
    if (is_steady(spec) && spec.run.cfl > 0) s.pseudo_cfl = spec.run.cfl;
    s.steady_scheme = spec.run.steady_scheme;
    s.model = spec.model;
    if (spec.geometry.circle) {
        // The point vortex stands for a steady lift; a shedding circle's lift has zero mean and
        // its shed vortices carry the opposite circulation, so the far field stays the free
        // stream (the outer boundary 60 diameters or more away: numerics notes).
        s.far_field_vortex = false;
        if (!is_steady(spec) && spec.run.start_spin > 0.0)
            s.velocity_overrides.push_back(
                spinning_wall("wall", circle_centre, [spin = spec.run.start_spin](double t) {
                    return t < start_spin_time
                               ? spin * std::sin(std::numbers::pi * t / start_spin_time)
                               : 0.0;
                }));
    }
    return s;
}

SurfaceForceOptions surface_force_options(const CaseSpec& spec) {
    SurfaceForceOptions o;
    if (spec.geometry.circle) o.moment_reference = circle_centre;
    return o;
}

AnalysisPlaces analysis_places(const CaseSpec& spec) {
    AnalysisPlaces p;
    p.contours = spec.post.contours;
    p.wake_stations = spec.post.wake_stations;
    p.forces = surface_force_options(spec);
    p.circle = spec.geometry.circle;
    p.steady = is_steady(spec);
    return p;
}

Simulation::Simulation(const CaseSpec& spec, StructuredGrid grid, std::filesystem::path out_dir,
                       SimulationOptions options)
    : m_spec(spec),
      m_grid(std::move(grid)),
      m_metrics(compute_metrics(m_grid)),
      m_out(std::move(out_dir)),
      m_options(std::move(options)),
      m_solver(std::make_unique<FlowSolver>(m_grid, spec.flow, solver_settings_for(spec))),
      m_monitor(convergence_criteria(spec.run)) {
    if (!m_grid.c_layout()) return;  // verification blocks: no section to analyse
    // A contour or wake station the grid cannot hold is refused now, not after the run.
    try {
        check_analysis_places(m_grid, m_metrics, analysis_places(spec));
    } catch (const InputError& e) {
        throw InputError(spec.path.string() + ": [post] " + e.what());
    }
}

Simulation::~Simulation() = default;

void Simulation::resume(const CheckpointData& checkpoint) {
    std::vector<NamedArray> solver_state;
    for (const NamedArray& a : checkpoint.arrays) {
        if (a.name == convergence_record)
            m_monitor.load(a.values);
        else
            solver_state.push_back(a);
    }
    // A record from before the model's residual was monitored has no reference for it; past the
    // reference steps it cannot be rebuilt, and guessing one would change what "converged" means.
    if (m_monitor.legacy_record() && !m_solver->model_variables().empty() &&
        m_monitor.count() > convergence_criteria(m_spec.run).reference_steps) {
        std::string names;
        for (const ModelVariable& v : m_solver->model_variables())
            names += (names.empty() ? "" : ", ") + v.name;
        throw InputError("this checkpoint of a " + m_spec.model.name +
                         " run was written by an older veer that did not monitor the residual of " +
                         names +
                         "; start the run afresh (veer run CASE) to get a convergence check of "
                         "every equation");
    }
    m_solver->restore(solver_state);
    m_resumed = true;
    m_last_checkpoint_step = m_solver->step_count();
}

void Simulation::start_from(const FlowFields& initial) {
    m_solver->initialize(initial);
    if (is_steady(m_spec))
        m_monitor.raise_references(
            free_stream_references(m_grid, m_spec.flow, solver_settings_for(m_spec),
                                   convergence_criteria(m_spec.run).reference_steps));
}

double Simulation::nominal_time_step() const {
    const double cfl = m_spec.run.cfl > 0 ? m_spec.run.cfl : m_spec.model.time_accurate_cfl;
    return m_solver->time_step_for_cfl(cfl);
}

double Simulation::next_time_step() const {
    const double dt = nominal_time_step();
    const double left = m_spec.run.end_time - m_solver->time();
    // Land on end_time exactly, without a sliver of a last step.
    return left < 1.5 * dt ? (left > dt ? 0.5 * left : left) : dt;
}

void Simulation::write_checkpoint_now() {
    CheckpointData c;
    c.grid = m_grid;
    c.case_text = m_spec.text;
    c.step = m_solver->step_count();
    c.time = m_solver->time();
    c.arrays = m_solver->state();
    c.arrays.push_back({convergence_record, m_monitor.save()});
    write_checkpoint(checkpoint_path(), c);
    m_last_checkpoint_step = m_solver->step_count();
}

std::vector<std::pair<std::string, double>> Simulation::labelled_model_residuals(
    const StepReport& r) const {
    std::vector<std::pair<std::string, double>> out;
    const std::vector<ModelVariable>& v = m_solver->model_variables();
    for (std::size_t k = 0; k < v.size() && k < r.model_residuals.size(); ++k)
        out.emplace_back(v[k].label, r.model_residuals[k]);
    return out;
}

void Simulation::record_forces(double time, const SurfaceForces& f) {
    m_forces.time.push_back(time);
    m_forces.cl.push_back(f.cl.total);
    m_forces.cd.push_back(f.cd.total);
    m_forces.cm.push_back(f.cm.total);
}

std::string Simulation::divergence_diagnosis(const StepReport& r) const {
    const Vec2 where = m_metrics.centroid[m_metrics.cell(r.worst_i, r.worst_j)];
    const std::string kept = m_last_checkpoint_step >= 0
                                 ? fmt::format("the last good state is {} (step {})",
                                               checkpoint_path().string(), m_last_checkpoint_step)
                                 : std::string("no checkpoint was written before it");
    std::string origin;
    if (!r.finite && !m_recent_worst.empty()) {
        std::map<std::pair<int, int>, int> led;
        for (const auto& c : m_recent_worst) ++led[c];
        const auto top = std::max_element(led.begin(), led.end(), [](const auto& a, const auto& b) {
            return a.second < b.second;
        });
        const Vec2 w = m_metrics.centroid[m_metrics.cell(top->first.first, top->first.second)];
        origin = fmt::format(
            " (the first such cell in memory order); the largest change of the velocity was in "
            "cell ({}, {}) at x = {:.4f}, y = {:.4f} chords in {} of the last {} finite steps",
            top->first.first, top->first.second, w.x, w.y, top->second, m_recent_worst.size());
    }
    return fmt::format(
        "run diverged at step {}: {} is {} in cell ({}, {}) at x = {:.4f}, y = {:.4f} chords{}; "
        "{}. Try a smaller [run] cfl, a finer or smoother grid near that point, or mode = "
        "\"unsteady\" if the flow does not settle",
        r.step, r.worst_variable, r.finite ? "growing without bound" : "not finite", r.worst_i,
        r.worst_j, where.x, where.y, origin, kept);
}

RunResult Simulation::run() {
    const auto start = std::chrono::steady_clock::now();
    const bool steady = is_steady(m_spec);
    const bool has_wall = m_grid.c_layout().has_value();
    std::vector<std::string> variables;
    for (const ModelVariable& v : m_solver->model_variables()) variables.push_back(v.name);
    HistoryFile history(m_out / "history.csv", variables, m_resumed, m_solver->step_count());
    m_forces = history.kept_forces();
    FieldSeries series(m_out, m_resumed ? SeriesStart::resume : SeriesStart::fresh);
    auto frame_time = [&] {
        return steady ? static_cast<double>(m_solver->step_count()) : m_solver->time();
    };
    if (m_resumed)
        series.discard_after(frame_time());
    else
        series.write_frame(frame_time(), m_grid, m_metrics, m_solver->fields());
    if (!m_resumed) write_checkpoint_now();  // a diverging run always has a good state to keep
    ProgressLine progress(m_options.progress, m_options.label);
    install_interrupt_handlers();

    RunResult res;
    res.status = RunStatus::step_cap;
    for (;;) {
        if (interrupt_requested()) {
            res.status = RunStatus::interrupted;
            break;
        }
        if (m_solver->step_count() >= m_spec.run.steps) break;
        if (!steady && m_solver->time() >= m_spec.run.end_time * (1 - 1e-12)) {
            res.status = RunStatus::end_time;
            break;
        }
        const StepReport r = steady ? m_solver->advance_pseudo_time()
                                    : m_solver->advance(next_time_step(), nominal_time_step());
        res.last = r;
        if (!r.finite) {
            res.status = RunStatus::diverged;
            res.diagnosis = divergence_diagnosis(r);
            break;
        }
        m_recent_worst.emplace_back(r.worst_i, r.worst_j);
        if (m_recent_worst.size() > 20) m_recent_worst.pop_front();
        if (has_wall)
            res.forces = integrate_surface_forces(m_grid, m_metrics, m_solver->fields(),
                                                  m_spec.flow, surface_force_options(m_spec));
        history.append({r.step, r.time, r.residual_u, r.residual_v, r.residual_continuity,
                        res.forces.cl.total, res.forces.cd.total, res.forces.cm.total,
                        r.model_residuals});
        record_forces(r.time, res.forces);
        const bool converged =
            m_monitor.add({step_residuals(r), res.forces.cl.total, res.forces.cd.total});
        if (m_monitor.blowing_up()) {
            res.status = RunStatus::diverged;
            res.diagnosis = divergence_diagnosis(r);
            break;
        }
        const double by_steps = static_cast<double>(r.step) / static_cast<double>(m_spec.run.steps);
        const double by_goal = steady ? std::log(std::max(m_monitor.relative_residual(), 1e-300)) /
                                            std::log(m_spec.run.residual_drop)
                                      : r.time / m_spec.run.end_time;
        progress.update({r.step, r.time, r.residual_u, r.residual_v, r.residual_continuity,
                         res.forces.cl.total, res.forces.cd.total,
                         std::clamp(std::max(by_steps, by_goal), 0.0, 1.0), steady,
                         labelled_model_residuals(r), steady && by_goal >= 1.0 && !converged});
        if (m_spec.run.output_every > 0 && r.step % m_spec.run.output_every == 0)
            series.write_frame(frame_time(), m_grid, m_metrics, m_solver->fields());
        if (r.step % m_spec.run.checkpoint_every == 0) write_checkpoint_now();
        if (steady && converged) {
            res.status = RunStatus::converged;
            break;
        }
        if (m_options.stop_early &&
            m_options.stop_early(r, m_monitor.relative_residual(), res.forces))
            break;
    }
    progress.finish();
    if (res.status != RunStatus::diverged) {
        if (series.frames().empty() || series.frames().back().time < frame_time())
            series.write_frame(frame_time(), m_grid, m_metrics, m_solver->fields());
        if (m_last_checkpoint_step != m_solver->step_count()) write_checkpoint_now();
    }
    res.steps = m_solver->step_count();
    res.scheme_fallback_step = m_solver->scheme_fallback_step();
    res.time = m_solver->time();
    res.last_checkpoint_step = m_last_checkpoint_step;
    res.wall_seconds =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    return res;
}

}  // namespace veer
