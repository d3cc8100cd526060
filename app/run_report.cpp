#include "app/run_report.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <nlohmann/json.hpp>

#include "app/closing_table.hpp"
#include "app/model_range_note.hpp"
#include "app/transition_figures.hpp"
#include "io/case_choices.hpp"
#include "io/json_writer.hpp"
#include "io/run_tables.hpp"
#include "postprocess/time_average.hpp"

namespace veer {
namespace {

nlohmann::json location_or_null(const std::optional<SurfaceLocation>& l) {
    return l ? nlohmann::json(l->x) : nlohmann::json(nullptr);
}

std::optional<SurfaceLocation> first(const std::vector<SurfaceLocation>& v) {
    return v.empty() ? std::nullopt : std::optional<SurfaceLocation>(v.front());
}

/// First reattachment downstream of the first separation.
std::optional<SurfaceLocation> reattachment_after_first_separation(const SurfaceSeparation& s) {
    if (s.separations.empty()) return std::nullopt;
    for (const SurfaceLocation& r : s.reattachments)
        if (r.arc > s.separations.front().arc) return r;
    return std::nullopt;
}

nlohmann::json bubbles_json(const SurfaceSeparation& s) {
    nlohmann::json b = nlohmann::json::array();
    for (const SeparationBubble& x : s.bubbles) b.push_back({x.start.x, x.end.x});
    return b;
}

/// The time_average object: statistics over the last whole cycles, each figure beside its
/// cycle-to-cycle spread, and the control-volume route's means over the same cycles.
nlohmann::json time_average_json(const UnsteadyFigures& u, const CaseSpec& spec) {
    if (!u.shedding) return nullptr;
    const SheddingStatistics& s = *u.shedding;
    nlohmann::json t = {
        {"cycles", s.cycles},
        {"window", {s.window.begin, s.window.end}},
        {"periodic", s.periodic},
        {"not_periodic", s.periodic ? nlohmann::json(nullptr) : nlohmann::json(s.not_periodic)},
        {"period", s.window.period()},
        {"strouhal", s.strouhal.value},
        {"strouhal_spread", s.strouhal.spread},
        {"mean", {{"cl", s.cl_mean.value}, {"cd", s.cd_mean.value}, {"cm", s.cm_mean.value}}},
        {"mean_spread",
         {{"cl", s.cl_mean.spread}, {"cd", s.cd_mean.spread}, {"cm", s.cm_mean.spread}}},
        {"cl_rms", s.cl_rms.value},
        {"cl_rms_spread", s.cl_rms.spread},
        {"cl_peak", s.cl_peak.value},
        {"cl_peak_spread", s.cl_peak.spread},
        {"cl_amplitude", s.cl_amplitude.value},
        {"cd_amplitude", s.cd_amplitude.value},
    };
    if (u.routes) {
        nlohmann::json cl = nlohmann::json::object(), cd = nlohmann::json::object();
        double worst = 0.0;
        for (std::size_t k = 0; k < u.routes->size(); ++k) {
            const RouteMean& r = (*u.routes)[k];
            const std::string key = fmt::format("{:g}", spec.post.contours[k]);
            cl[key] = r.cl;
            cd[key] = r.cd;
            worst = std::max(worst, std::abs(r.cl - s.cl_mean.value));
        }
        t["momentum"] = {{"cl", cl}, {"cd", cd}};
        t["max_lift_disagreement"] = worst;
    }
    return t;
}

nlohmann::json optional_json(const std::optional<double>& v) {
    return v ? nlohmann::json(*v) : nlohmann::json(nullptr);
}

}  // namespace

RunAnalysis analyse_run(const Simulation& sim) {
    const CaseSpec& spec = sim.spec();
    return analyse_flow(sim.grid(), sim.metrics(), sim.solver().fields(), spec.flow,
                        analysis_places(spec));
}

UnsteadyFigures unsteady_figures(const Simulation& sim, const ControlVolumeHistory* routes) {
    UnsteadyFigures u;
    const ForceRecord& h = sim.force_history();
    u.shedding = shedding_statistics(h.time, h.cl, h.cd, h.cm, summary_cycles);
    if (u.shedding && routes)
        u.routes = routes->means(u.shedding->window, sim.spec().flow.alpha_deg);
    return u;
}

nlohmann::json summary_json(const Simulation& sim, const RunResult& r, const RunAnalysis& a,
                            const UnsteadyFigures* unsteady) {
    const CaseSpec& spec = sim.spec();
    const SurfaceForces& f = a.forces;
    nlohmann::json cl_momentum = nlohmann::json::object(), cd_momentum = nlohmann::json::object(),
                   cl_circulation = nlohmann::json::object(), placed = nlohmann::json::object();
    for (std::size_t k = 0; k < a.routes.size(); ++k) {
        const std::string key = fmt::format("{:g}", spec.post.contours[k]);
        placed[key] = a.routes[k].contour.distance;  // where the grid put the contour asked for
        cl_momentum[key] = a.routes[k].cl_momentum;
        cd_momentum[key] = a.routes[k].cd_momentum;
        cl_circulation[key] = a.routes[k].cl_circulation;
    }
    const bool settled = r.status == RunStatus::converged || r.status == RunStatus::end_time;
    nlohmann::json s = {
        {"section", spec.geometry.name},
        {"reynolds", spec.flow.reynolds},
        {"alpha", spec.flow.alpha_deg},
        {"model", spec.model.name},
        {"mode", mode_word(spec.run.mode)},
        {"cl", f.cl.total},
        {"cd", f.cd.total},
        {"cm", f.cm.total},
        {"cl_pressure", f.cl.pressure},
        {"cl_friction", f.cl.friction},
        {"cd_pressure", f.cd.pressure},
        {"cd_friction", f.cd.friction},
        {"cm_pressure", f.cm.pressure},
        {"cm_friction", f.cm.friction},
        {"cl_momentum", cl_momentum},
        {"cd_momentum", cd_momentum},
        {"cl_circulation", cl_circulation},
        {"contour_distances", placed},
        {"max_lift_disagreement", a.max_lift_disagreement},
        {"outermost_contour_distance", a.outermost.contour.distance},
        {"cl_momentum_outermost", a.outermost.cl_momentum},
        {"cd_momentum_outermost", a.outermost.cd_momentum},
        {"outermost_lift_difference", a.outermost.cl_momentum_difference},
        {"stagnation_x", a.separation.stagnation.x},
        {"separation_upper", location_or_null(first(a.separation.upper.separations))},
        {"reattachment_upper",
         location_or_null(reattachment_after_first_separation(a.separation.upper))},
        {"separation_lower", location_or_null(first(a.separation.lower.separations))},
        {"reattachment_lower",
         location_or_null(reattachment_after_first_separation(a.separation.lower))},
        {"bubbles_upper", bubbles_json(a.separation.upper)},
        {"bubbles_lower", bubbles_json(a.separation.lower)},
        {"converged", settled},
        {"status", status_word(r.status)},
        {"iterations", r.steps},
        {"time", r.time},
        {"wall_seconds", r.wall_seconds},
        {"residual_u", r.last.residual_u},
        {"residual_v", r.last.residual_v},
        {"residual_continuity", r.last.residual_continuity},
        {"far_field_circulation", sim.solver().far_field_circulation()},
    };
    nlohmann::json wake = nlohmann::json::array();
    for (const WakeProfile& w : a.wake)
        wake.push_back({{"station", w.station},
                        {"downward_momentum_flux", w.downward_momentum_flux},
                        {"mean_flow_angle_deg", w.mean_flow_angle_deg},
                        {"downwash_deg", w.downwash_deg}});
    s["wake"] = wake;
    const std::vector<ModelVariable>& variables = sim.solver().model_variables();
    for (std::size_t k = 0; k < variables.size() && k < r.last.model_residuals.size(); ++k)
        s["residual_" + variables[k].name] = r.last.model_residuals[k];
    s["reference_length"] = a.circle ? "diameter" : "chord";
    if (a.circle) {
        s["separation_angle_upper_deg"] = optional_json(a.circle->separation_angle_upper);
        s["separation_angle_lower_deg"] = optional_json(a.circle->separation_angle_lower);
        s["recirculation_length"] = optional_json(a.circle->recirculation_length);
        s["base_cp"] = a.circle->base_cp;
    } else {
        s["trailing_edge_cp_upper"] = a.kutta.cp_upper;
        s["trailing_edge_cp_lower"] = a.kutta.cp_lower;
        s["trailing_edge_cp_difference"] = a.kutta.difference;
        s.update(transition_summary(a));
    }
    const auto note = model_range_note(spec);
    s["model_warning"] = note ? nlohmann::json(*note) : nlohmann::json(nullptr);
    if (spec.run.mode == TimeMode::time_accurate)
        s["time_average"] = unsteady ? time_average_json(*unsteady, spec)
                                     : time_average_json(unsteady_figures(sim, nullptr), spec);
    return s;
}

std::optional<RunAnalysis> write_run_report(const Simulation& sim, const RunResult& r,
                                            ClosingTable table,
                                            const ControlVolumeHistory* routes) {
    const std::filesystem::path dir = sim.checkpoint_path().parent_path();
    if (!sim.grid().c_layout()) {  // verification blocks: no section, no forces
        write_json_file(dir / "summary.json", {{"converged", r.status == RunStatus::converged},
                                               {"iterations", r.steps},
                                               {"wall_seconds", r.wall_seconds}});
        return std::nullopt;
    }
    const RunAnalysis a = analyse_run(sim);
    write_surface_csv(dir / "surface.csv", a.surface);
    write_wake_csv(dir / "wake.csv", a.wake);
    write_surface_vtp_file(dir / "surface.vtp", a.surface);
    const bool unsteady = sim.spec().run.mode == TimeMode::time_accurate;
    const UnsteadyFigures u = unsteady ? unsteady_figures(sim, routes) : UnsteadyFigures{};
    write_json_file(dir / "summary.json", summary_json(sim, r, a, unsteady ? &u : nullptr));
    if (table == ClosingTable::print) print_closing_table(sim.spec(), a, unsteady ? &u : nullptr);
    return a;
}

}  // namespace veer
