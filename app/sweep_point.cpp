#include "app/sweep_point.hpp"

#include <fmt/format.h>

#include <cmath>
#include <memory>

#include "app/report_csv.hpp"
#include "app/residual_plateau.hpp"
#include "app/run_report.hpp"
#include "app/simulation.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_momentum_mean.hpp"
#include "app/sweep_stability.hpp"
#include "app/sweep_unsteady_stats.hpp"
#include "io/case_file.hpp"
#include "io/checkpoint.hpp"
#include "io/json_writer.hpp"
#include "io/output_dir.hpp"
#include "mesh/errors.hpp"
#include "postprocess/separation.hpp"
#include "postprocess/time_average.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

constexpr double trailing_edge_zone = 0.95;  // x/c aft of which a separation is the TE's own
constexpr long unsteady_step_guard = 1000000;

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

/// Separation figures of the final fields (the last instant for time-accurate points).
void add_separation(PointRecord& r, const Simulation& sim) {
    if (!sim.grid().c_layout()) return;
    const SurfaceDistribution d =
        surface_distribution(sim.grid(), sim.metrics(), sim.solver().fields(), sim.spec().flow);
    const SeparationReport s = find_separation(d);
    auto first_x = [](const std::vector<SurfaceLocation>& v) {
        return v.empty() ? std::nullopt : std::optional<double>(v.front().x);
    };
    r.separation_upper = first_x(s.upper.separations);
    r.reattachment_upper = first_x(s.upper.reattachments);
    r.separation_lower = first_x(s.lower.separations);
    r.reattachment_lower = first_x(s.lower.reattachments);
    if (s.upper.trailing_edge_separation)
        r.trailing_edge_separation_upper = s.upper.trailing_edge_separation->x;
    for (const SeparationBubble& b : s.upper.bubbles)
        if (b.start.x < trailing_edge_zone) r.upper_bubble = true;
}

/// Control-volume lift on the largest contour, from the run's summary.json (when it has it).
std::optional<double> momentum_lift(const fs::path& run_dir) {
    const nlohmann::json s = read_json_file(run_dir / "summary.json");
    if (!s.contains("cl_momentum")) return std::nullopt;
    const nlohmann::json& m = s["cl_momentum"];
    if (m.is_number()) return m.get<double>();
    if (!m.is_object()) return std::nullopt;
    std::optional<double> best;
    double largest = -1.0;
    for (const auto& [key, value] : m.items()) {
        const double distance = std::strtod(key.c_str(), nullptr);
        if (value.is_number() && distance > largest) {
            largest = distance;
            best = value.get<double>();
        }
    }
    return best;
}

/// Time means, amplitudes and Strouhal number of a time-accurate run into the record.
void take_cycle_statistics(PointRecord& r, const UnsteadyStats& st) {
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

ForceRecord read_force_record(const fs::path& history) {
    const CsvTable t = CsvTable::read(history);
    return {t.numbers("time"), t.numbers("cl"), t.numbers("cd"), t.numbers("cm")};
}

struct RunPiece {
    RunResult result;
    std::unique_ptr<Simulation> sim;
};

using StopHook = decltype(SimulationOptions::stop_early);

RunPiece run_piece(const CaseSpec& spec, const StructuredGrid& grid, const fs::path& dir,
                   const FlowFields* start, const SweepCase& sweep, const std::string& label,
                   StopHook stop_early = {}, const Simulation** running = nullptr) {
    prepare_output_dir(dir, spec.text, false);
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
        write_run_report(*p.sim, p.result,
                         sweep.progress ? ClosingTable::print : ClosingTable::omit);
    return p;
}

/// Whether the upper surface of a steady point has separated ahead of the trailing-edge zone
/// (the separation-onset criterion of the polar).
bool upper_surface_separated(const PointRecord& r) {
    return r.upper_bubble || (r.trailing_edge_separation_upper &&
                              *r.trailing_edge_separation_upper < trailing_edge_zone);
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
    const CaseSpec spec = read_case_file(sweep.case_file, o);
    auto watch = std::make_shared<TimeAccurateWatch>(from.check_time, from.cl_steady);
    auto sampler = std::make_shared<MomentumLiftSampler>(grid, spec.post.contours);
    auto running = std::make_shared<const Simulation*>(nullptr);
    StopHook hook = [watch, sampler, running](const StepReport& step, double,
                                              const SurfaceForces& f) {
        if (*running) sampler->after_step(**running, step.step, step.time);
        return watch->add(step.time, f.cl.total, f.cd.total);
    };
    const std::string what = from.check_time > 0 ? "check " : "unsteady ";
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
    r.status = status_word(p.result.status);
    if (p.result.status == RunStatus::diverged) {
        r.regime = "failed";
        r.note += "; the time-accurate run diverged: " + p.result.diagnosis;
        return;
    }
    r.final_run = "unsteady";
    r.regime = "unsteady";
    if (watch->outcome() == TimeAccurateWatch::Outcome::settled) {
        // Settled without shedding: the final instant is the steady flow.
        r.status = "settled";
        r.regime = "steady";
        r.note += fmt::format(
            "; the time-accurate run settled (Cl and Cd within 1e-4 over 2 time units) at t = "
            "{:.2f}",
            p.result.time);
        r.cl = p.result.forces.cl.total;
        r.cd = p.result.forces.cd.total;
        r.cm = p.result.forces.cm.total;
        r.cl_amplitude = r.cd_amplitude = r.cm_amplitude = 0.0;
        r.cycles = 0;
        r.strouhal.reset();
    } else {
        if (p.result.status == RunStatus::step_cap)
            r.note += "; the time-accurate run reached the step cap before its end time";
        r.cl_momentum = momentum_lift(dir / "unsteady");
        const ForceRecord history = read_force_record(dir / "unsteady" / "history.csv");
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
    if (watch->outcome() == TimeAccurateWatch::Outcome::settled)
        r.cl_momentum = momentum_lift(dir / "unsteady");
    add_separation(r, *p.sim);
    out.fields = p.sim->solver().fields();
}

}  // namespace

std::vector<std::string> point_overrides(const SweepCase& sweep, double alpha) {
    std::vector<std::string> o = sweep.overrides;
    o.push_back(fmt::format("flow.alpha={:.17g}", alpha));
    if (sweep.steady_steps > 0) o.push_back(fmt::format("run.steps={}", sweep.steady_steps));
    return o;
}

std::string point_case_text(const SweepCase& sweep, double alpha) {
    return read_case_file(sweep.case_file, point_overrides(sweep, alpha)).text;
}

PointOutcome run_sweep_point(const SweepCase& sweep, double alpha, const StructuredGrid& grid,
                             const fs::path& sweep_dir, const FlowFields* start,
                             const std::string& label) {
    const CaseSpec spec = read_case_file(sweep.case_file, point_overrides(sweep, alpha));
    PointRecord r;
    r.alpha = alpha;
    r.folder = point_folder_name(alpha);
    r.case_text = spec.text;
    const fs::path dir = sweep_dir / r.folder;
    PointOutcome out;
    const bool steady_mode = spec.run.mode == "steady";
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
    const bool stalled = plateau && plateau->stalled() && p.result.status == RunStatus::step_cap;
    r.iterations = p.result.steps;
    r.wall_seconds = p.result.wall_seconds;
    r.status = stalled ? "stalled" : status_word(p.result.status);
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
            if (steady_mode) {
                r.note =
                    stalled ? fmt::format(
                                  "the steady iteration stalled (its residual fell less than "
                                  "{:g} times over {} iterations while Cl kept moving) after "
                                  "{} iterations",
                                  sweep.plateau.required_drop, sweep.plateau.window, p.result.steps)
                            : fmt::format("the steady iteration did not settle in {} iterations",
                                          spec.run.steps);
                const TimeAccurateStart from{p.sim->solver().fields(), 0.0, 0.0};
                run_time_accurate(r, out, sweep, alpha, grid, dir, from, label);
                if (out.interrupted) return out;
                break;
            }
            [[fallthrough]];
        default:
            r.cl = p.result.forces.cl.total;
            r.cd = p.result.forces.cd.total;
            r.cm = p.result.forces.cm.total;
            r.cl_momentum = momentum_lift(dir);
            add_separation(r, *p.sim);
            out.fields = p.sim->solver().fields();
            if (steady_mode && p.result.status == RunStatus::converged &&
                sweep.stability_time > 0 && upper_surface_separated(r)) {
                const TimeAccurateStart check{disturbed(p.sim->solver().fields(), p.sim->metrics()),
                                              sweep.stability_time, r.cl};
                run_time_accurate(r, out, sweep, alpha, grid, dir, check, label);
                if (out.interrupted) return out;
            }
            if (!steady_mode) {
                // A time-accurate case: every point is averaged like an unsteady one.
                const ForceRecord history = read_force_record(dir / "history.csv");
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
        FlowSolver solver(grid, spec.flow, solver_settings_for(spec));
        std::vector<NamedArray> state;
        for (const NamedArray& a : c.arrays)
            if (a.name != "simulation_convergence") state.push_back(a);
        solver.restore(state);
        return solver.fields();
    } catch (const std::exception&) {
        return std::nullopt;  // the next point starts from the free stream instead
    }
}

}  // namespace veer
