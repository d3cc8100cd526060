#include "app/sweep_point.hpp"

#include <fmt/format.h>

#include <cmath>
#include <memory>

#include "app/model_range_note.hpp"
#include "app/point_bounded_cycle.hpp"
#include "app/residual_plateau.hpp"
#include "app/run_report.hpp"
#include "app/simulation.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_momentum_mean.hpp"
#include "app/sweep_stability.hpp"
#include "io/case_file.hpp"
#include "io/checkpoint.hpp"
#include "io/json_writer.hpp"
#include "io/output_dir.hpp"
#include "mesh/errors.hpp"
#include "postprocess/separation.hpp"
#include "postprocess/time_average.hpp"
#include "postprocess/transition_locator.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

constexpr long unsteady_step_guard = 1000000;

/// Separation figures of the analysed final fields (the last instant of time-accurate points).
void add_separation(PointRecord& r, const RunAnalysis& a) {
    const SeparationReport& s = a.separation;
    auto first_x = [](const std::vector<SurfaceLocation>& v) {
        return v.empty() ? std::nullopt : std::optional<double>(v.front().x);
    };
    r.separation_upper = first_x(s.upper.separations);
    r.reattachment_upper = first_x(s.upper.reattachments);
    r.separation_lower = first_x(s.lower.separations);
    r.reattachment_lower = first_x(s.lower.reattachments);
    if (s.upper.trailing_edge_separation)
        r.trailing_edge_separation_upper = s.upper.trailing_edge_separation->x;
    for (const SeparatedRegion& g : a.regions_upper) {
        const bool closed_by_transition = g.kind == SeparationKind::laminar_bubble && g.transition;
        if (g.end && g.start.x < trailing_edge_zone && !closed_by_transition) r.upper_bubble = true;
        if (closed_by_transition && !r.laminar_bubble_upper) {
            r.laminar_bubble_upper = g.start.x;
            r.laminar_bubble_upper_end = g.end->x;
        }
        if (g.kind == SeparationKind::turbulent_separation && !r.turbulent_separation_upper)
            r.turbulent_separation_upper = g.start.x;
    }
    if (a.transition.upper) r.transition_upper = reported_transition_x(*a.transition.upper);
    if (a.transition.lower) r.transition_lower = reported_transition_x(*a.transition.lower);
}

/// Control-volume lift on the largest contour.
std::optional<double> momentum_lift(const RunAnalysis& a, const std::vector<double>& distances) {
    std::optional<double> best;
    double largest = -1.0;
    for (std::size_t k = 0; k < a.routes.size() && k < distances.size(); ++k)
        if (distances[k] > largest) {
            largest = distances[k];
            best = a.routes[k].cl_momentum;
        }
    return best;
}

/// The distance of the largest contour as the grid places it.
std::optional<double> largest_contour_distance(const RunAnalysis& a,
                                               const std::vector<double>& distances) {
    std::optional<double> placed;
    double largest = -1.0;
    for (std::size_t k = 0; k < a.routes.size() && k < distances.size(); ++k)
        if (distances[k] > largest) {
            largest = distances[k];
            placed = a.routes[k].contour.distance;
        }
    return placed;
}

/// Time means, amplitudes and Strouhal number of a time-accurate run into the record.
void take_cycle_statistics(PointRecord& r, const UnsteadyStats& st) {
    r.cl_basis = st.periodic ? fmt::format("mean over {} whole cycles", st.cycles)
                             : std::string("mean over the second half of the record");
    r.cl = st.cl_mean;
    r.cd = st.cd_mean;
    r.cm = st.cm_mean;
    r.cl_amplitude = st.cl_amplitude;
    r.cd_amplitude = st.cd_amplitude;
    r.cm_amplitude = st.cm_amplitude;
    r.cycles = st.cycles;
    r.strouhal = st.strouhal;
}

/// "; not yet periodic: ..." when the last whole cycles of a record still differ (its averages
/// then hold part of the start-up transient), else "".
std::string periodicity_note(const ForceRecord& h) {
    const auto s = shedding_statistics(h.time, h.cl, h.cd, h.cm, summary_cycles);
    if (!s || s->periodic) return "";
    return "; not yet periodic over its last whole cycles: " + s->not_periodic +
           " (its averages still hold part of the start-up; a longer --unsteady-time settles it)";
}

/// Why a steady attempt did not converge: stalled (the plateau rule) or at its step cap.
std::string not_settled_note(const SweepCase& sweep, const CaseSpec& spec, bool stalled,
                             bool frozen, long steps) {
    if (frozen)
        return fmt::format(
            "the steady iteration froze (its residual stayed above {:g} of its reference over {} "
            "iterations while Cl stood still: a cycle of a few cells) after {} iterations",
            sweep.plateau.frozen_level, sweep.plateau.window, steps);
    return stalled ? fmt::format(
                         "the steady iteration stalled (its residual fell less than {:g} times "
                         "over {} iterations while Cl kept moving) after {} iterations",
                         sweep.plateau.required_drop, sweep.plateau.window, steps)
                   : fmt::format("the steady iteration did not settle in {} iterations",
                                 spec.run.steps);
}

struct RunPiece {
    RunResult result;
    std::unique_ptr<Simulation> sim;
    std::optional<RunAnalysis> analysis;  ///< of the final fields, when the run finished

    /// The control-volume lift on the largest contour of the final fields.
    std::optional<double> momentum_lift() const {
        return analysis ? veer::momentum_lift(*analysis, sim->spec().post.contours) : std::nullopt;
    }
};

using StopHook = decltype(SimulationOptions::stop_early);

RunPiece run_piece(const CaseSpec& spec, const StructuredGrid& grid, const fs::path& dir,
                   const FlowFields* start, const SweepCase& sweep, const std::string& label,
                   StopHook stop_early = {}, const Simulation** running = nullptr) {
    // Not held: the sweep folder's lock (taken by the root rank) already keeps other sweeps out,
    // and a point's pieces reopen the same folder one after another.
    (void)prepare_output_dir(dir, spec.text, false);
    SimulationOptions options;
    options.progress = sweep.progress;
    options.label = label;
    options.stop_early = std::move(stop_early);
    RunPiece p;
    p.sim = std::make_unique<Simulation>(spec, grid, dir, options);
    if (running) *running = p.sim.get();  // for a stop hook that reads the fields
    if (start) p.sim->start_from(*start);
    p.result = p.sim->run();
    if (p.result.status != RunStatus::diverged && p.result.status != RunStatus::interrupted)
        p.analysis = write_run_report(*p.sim, p.result,
                                      sweep.progress ? ClosingTable::print : ClosingTable::omit);
    return p;
}

/// How a time-accurate run of a point starts: from the steady fields of a point that did not
/// settle, or from the disturbed fields of a converged one (a stability check).
struct TimeAccurateStart {
    FlowFields fields;
    double check_time = 0.0;  ///< > 0: a stability check of a steady solution of lift cl_steady
    double cl_steady = 0.0;
};

/// The time-accurate run of a point in DIR/alpha_.../unsteady/: a stability check that the flow
/// passes ends it early (the steady record stands); otherwise it runs to its end time, or until
/// its forces settle, and the point is reported from it.
void run_time_accurate(PointRecord& r, PointOutcome& out, const SweepCase& sweep, double alpha,
                       const StructuredGrid& grid, const fs::path& dir,
                       const TimeAccurateStart& from, const std::string& label) {
    // A time-accurate point runs to its end time: the step cap of the steady attempt (the
    // case's or --steady-steps) is lifted to a guard against runaway runs only.
    std::vector<std::string> o = sweep.overrides;
    o.push_back(fmt::format("flow.alpha={:.17g}", alpha));
    o.push_back("run.mode=\"unsteady\"");
    o.push_back(fmt::format("run.steps={}", unsteady_step_guard));
    if (sweep.unsteady_time > 0)
        o.push_back(fmt::format("run.end_time={:.17g}", sweep.unsteady_time));
    const CaseSpec spec = parse_case_source(sweep.source, o);
    auto watch = std::make_shared<TimeAccurateWatch>(from.check_time, from.cl_steady);
    auto sampler = std::make_shared<MomentumLiftSampler>(grid, spec.post.contours);
    auto running = std::make_shared<const Simulation*>(nullptr);
    StopHook hook = [watch, sampler, running](const StepReport& step, double,
                                              const SurfaceForces& f) {
        if (*running) sampler->after_step(**running, step.step, step.time);
        return watch->add(step.time, f.cl.total, f.cd.total);
    };
    const std::string what = from.check_time > 0 ? "check " : "unsteady ";
    if (sweep.progress && from.check_time > 0)
        fmt::print(
            "\n  a disturbed time-accurate check of the steady solution follows; its table is of "
            "the check's last instant, not the point's result\n");
    RunPiece p = run_piece(spec, grid, dir / "unsteady", &from.fields, sweep, label + what, hook,
                           running.get());
    r.iterations += p.result.steps;
    r.wall_seconds += p.result.wall_seconds;
    if (p.result.status == RunStatus::interrupted) {
        out.interrupted = true;
        return;
    }
    const StabilityVerdict& v = watch->verdict();
    const std::string check =
        watch->judged()
            ? fmt::format(
                  "a disturbed time-accurate check of {:g} time units: lift oscillation {:.2e} "
                  "over its second quarter, {:.2e} over its last, ratio {:.3f} (kept below "
                  "{:.3f}, shedding above {:.3f}{})",
                  watch->judged_span(), v.early, v.late, v.ratio, 1.0 / (1.0 + stability_margin),
                  1.0 + stability_margin, v.decided ? "" : "; undecided, so run on")
            : std::string();
    if (watch->outcome() == TimeAccurateWatch::Outcome::kept) {
        r.note = "steady solution kept by " + check;
        r.cl_basis = "converged steady; kept by a time-accurate check";
        return;
    }
    if (p.result.status == RunStatus::diverged && from.check_time > 0 && !watch->judged()) {
        r.note =
            "the disturbed time-accurate check diverged before it could judge (the steady "
            "result is kept, unchecked): " +
            p.result.diagnosis;
        return;
    }
    if (!check.empty()) r.note = "the steady solution is not kept (" + check + ")";
    if (from.check_time > 0) r.cl_steady = from.cl_steady;  // shown beside the later result
    r.status = status_word(p.result.status);
    if (p.result.status == RunStatus::diverged) {
        r.regime = "failed";
        r.note += "; the time-accurate run diverged: " + p.result.diagnosis;
        return;
    }
    r.final_run = "unsteady";
    r.regime = "unsteady";
    r.cl_basis = "final instant of the time-accurate run";
    if (watch->outcome() == TimeAccurateWatch::Outcome::settled) {
        // Settled without shedding: the final instant is the steady flow.
        r.status = "settled";
        r.regime = "steady";
        r.note += fmt::format(
            "; the time-accurate run settled (Cl and Cd within 1e-4 over 2 time units) at t = "
            "{:.2f}",
            p.result.time);
        r.cl_basis = "settled time-accurate";
        r.cl = p.result.forces.cl.total;
        r.cd = p.result.forces.cd.total;
        r.cm = p.result.forces.cm.total;
        r.cl_amplitude = r.cd_amplitude = r.cm_amplitude = 0.0;
        r.cycles = 0;
        r.strouhal.reset();
    } else {
        if (p.result.status == RunStatus::step_cap)
            r.note += "; the time-accurate run reached the step cap before its end time";
        r.cl_momentum = p.momentum_lift();
        const ForceRecord& history = p.sim->force_history();
        if (history.time.size() >= 4) {
            const UnsteadyStats st = unsteady_stats(history);
            take_cycle_statistics(r, st);
            if (st.periodic) {
                if (auto m = sampler->mean(st.window_begin, st.window_end)) r.cl_momentum = m;
                r.note += periodicity_note(history);
            } else {
                r.regime = "steady";
                r.note +=
                    "; the time-accurate run settled without whole cycles (averaged over the "
                    "second half of its record)";
            }
        }
    }
    if (watch->outcome() == TimeAccurateWatch::Outcome::settled) r.cl_momentum = p.momentum_lift();
    if (p.analysis) add_separation(r, *p.analysis);
    out.fields = p.sim->solver().fields();
}

}  // namespace

std::vector<std::string> point_overrides(const SweepCase& sweep, double alpha) {
    std::vector<std::string> o = sweep.overrides;
    o.push_back(fmt::format("flow.alpha={:.17g}", alpha));
    if (sweep.steady_steps > 0) o.push_back(fmt::format("run.steps={}", sweep.steady_steps));
    return o;
}

CaseSpec point_case(const SweepCase& sweep, double alpha) {
    return parse_case_source(sweep.source, point_overrides(sweep, alpha));
}

PointOutcome run_sweep_point(const SweepCase& sweep, double alpha, const CaseSpec& spec,
                             const StructuredGrid& grid, const fs::path& sweep_dir,
                             const FlowFields* start, const std::string& label) {
    PointRecord r;
    r.alpha = alpha;
    r.folder = point_folder_name(alpha);
    r.case_text = spec.text;
    r.model_warning = model_range_note(spec).value_or("");
    const fs::path dir = sweep_dir / r.folder;
    PointOutcome out;
    const bool steady_mode = spec.run.mode == TimeMode::steady;
    StopHook stall_hook;
    std::shared_ptr<ResidualPlateau> plateau;
    if (steady_mode && sweep.plateau.window > 0) {
        PlateauCriteria c = sweep.plateau;
        c.force_tolerance = spec.run.force_tolerance;
        plateau = std::make_shared<ResidualPlateau>(c);
        stall_hook = [plateau](const StepReport&, double relative_residual,
                               const SurfaceForces& f) {
            return plateau->add(relative_residual, f.cl.total);
        };
    }
    RunPiece p = run_piece(spec, grid, dir, start, sweep, label, stall_hook);
    if (p.analysis) r.contour_distance = largest_contour_distance(*p.analysis, spec.post.contours);
    const bool stalled = plateau && plateau->stalled() && p.result.status == RunStatus::step_cap;
    r.iterations = p.result.steps;
    r.wall_seconds = p.result.wall_seconds;
    r.status = stalled ? "stalled" : status_word(p.result.status);
    const std::optional<BoundedCycle> cycle =
        steady_mode && p.result.status == RunStatus::step_cap
            ? bounded_cycle(p.sim->force_history().cl, p.sim->force_history().cd,
                            p.sim->force_history().cm, sweep.cycle)
            : std::nullopt;
    switch (p.result.status) {
        case RunStatus::interrupted:
            out.interrupted = true;
            return out;
        case RunStatus::diverged:
            r.regime = "failed";
            r.note = p.result.diagnosis;
            write_json_file(record_path(dir), record_to_json(r));
            out.record = r;
            return out;
        case RunStatus::step_cap:
            if (steady_mode && !cycle) {
                r.note = not_settled_note(sweep, spec, stalled, stalled && plateau->frozen(),
                                          p.result.steps);
                const TimeAccurateStart from{p.sim->solver().fields(), 0.0, 0.0};
                run_time_accurate(r, out, sweep, alpha, grid, dir, from, label);
                if (out.interrupted) return out;
                break;
            }
            [[fallthrough]];
        default:
            if (p.result.status == RunStatus::step_cap) r.cl_basis = "not converged";
            r.cl = p.result.forces.cl.total;
            r.cd = p.result.forces.cd.total;
            r.cm = p.result.forces.cm.total;
            if (cycle)
                take_bounded_cycle(r, *cycle,
                                   not_settled_note(sweep, spec, stalled,
                                                    stalled && plateau->frozen(), p.result.steps));
            r.cl_momentum = p.momentum_lift();
            if (p.analysis) add_separation(r, *p.analysis);
            out.fields = p.sim->solver().fields();
            if (steady_mode && (p.result.status == RunStatus::converged || cycle) &&
                sweep.stability_time > 0 && upper_surface_needs_stability_check(r)) {
                const TimeAccurateStart check{disturbed(p.sim->solver().fields(), p.sim->metrics()),
                                              sweep.stability_time, r.cl};
                run_time_accurate(r, out, sweep, alpha, grid, dir, check, label);
                if (out.interrupted) return out;
            }
            if (!steady_mode) {
                // A time-accurate case: every point is averaged like an unsteady one.
                const ForceRecord& history = p.sim->force_history();
                if (history.time.size() >= 4) {
                    const UnsteadyStats st = unsteady_stats(history);
                    r.regime = st.periodic ? "unsteady" : "steady";
                    take_cycle_statistics(r, st);
                    if (st.periodic) r.note += periodicity_note(history);
                }
            }
            break;
    }
    write_json_file(record_path(dir), record_to_json(r));
    out.record = r;
    return out;
}

std::optional<FlowFields> finished_point_fields(const fs::path& point_dir,
                                                const PointRecord& record,
                                                const StructuredGrid& grid) {
    try {
        const fs::path run_dir = point_dir / record.final_run;
        const CheckpointData c = read_checkpoint(run_dir / "checkpoint.h5");
        if (c.grid.ni() != grid.ni() || c.grid.nj() != grid.nj()) return std::nullopt;
        const CaseSpec spec = parse_case_text(c.case_text, (run_dir / "checkpoint.h5").string(),
                                              run_dir, {}, FileCheck::skip);
        SimulationOptions quiet;
        quiet.progress = false;
        Simulation finished(spec, grid, run_dir, quiet);
        finished.resume(c);
        return finished.solver().fields();
    } catch (const std::exception&) {
        return std::nullopt;  // the next point starts from the free stream instead
    }
}

}  // namespace veer
