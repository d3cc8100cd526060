#include "app/run_report.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <fstream>
#include <nlohmann/json.hpp>
#include <sstream>

#include "app/run_tables.hpp"
#include "io/json_writer.hpp"
#include "io/vtk_grid_writer.hpp"
#include "postprocess/time_average.hpp"

namespace veer {
namespace {

const char* status_word(RunStatus s) {
    switch (s) {
        case RunStatus::converged:
            return "converged";
        case RunStatus::step_cap:
            return "step cap reached";
        case RunStatus::end_time:
            return "end time reached";
        case RunStatus::interrupted:
            return "interrupted";
        case RunStatus::diverged:
            return "diverged";
    }
    return "?";
}

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

/// Averages of Cl, Cd, Cm over the last whole cycles of the lift in history.csv (unsteady).
nlohmann::json cycle_averages(const std::filesystem::path& history) {
    std::ifstream in(history);
    std::string line;
    std::getline(in, line);
    std::vector<double> t, cl, cd, cm;
    while (std::getline(in, line)) {
        std::vector<double> v;
        std::stringstream s(line);
        for (std::string cell; std::getline(s, cell, ',');) v.push_back(std::stod(cell));
        if (v.size() < 8) continue;
        t.push_back(v[1]);
        cl.push_back(v[5]);
        cd.push_back(v[6]);
        cm.push_back(v[7]);
    }
    const auto window = last_whole_cycles(t, cl, 5);
    if (!window) return nullptr;
    auto amplitude = [&](const std::vector<double>& x) {
        double lo = 1e300, hi = -1e300;
        for (std::size_t k = 0; k < t.size(); ++k)
            if (t[k] >= window->begin && t[k] <= window->end) {
                lo = std::min(lo, x[k]);
                hi = std::max(hi, x[k]);
            }
        return 0.5 * (hi - lo);
    };
    return {{"cycles", window->cycles},
            {"period", window->period()},
            {"strouhal", 1.0 / window->period()},
            {"cl_mean", window_average(t, cl, *window)},
            {"cd_mean", window_average(t, cd, *window)},
            {"cm_mean", window_average(t, cm, *window)},
            {"cl_amplitude", amplitude(cl)},
            {"cd_amplitude", amplitude(cd)}};
}

}  // namespace

RunAnalysis analyse_run(const Simulation& sim) {
    RunAnalysis a;
    const CaseSpec& spec = sim.spec();
    const FlowFields f = sim.solver().fields();
    a.forces = integrate_surface_forces(sim.grid(), sim.metrics(), f, spec.flow);
    a.surface = surface_distribution(sim.grid(), sim.metrics(), f, spec.flow);
    a.separation = find_separation(a.surface);
    a.kutta = kutta_check(a.surface);
    const auto contours = contours_at_distances(sim.grid(), spec.post.contours);
    a.momentum = contour_forces(sim.grid(), sim.metrics(), f, spec.flow, contours);
    a.circulation = contour_circulation(sim.grid(), sim.metrics(), f, contours);
    WakeProfileOptions wake;
    wake.stations = spec.post.wake_stations;
    a.wake = wake_profiles(sim.grid(), sim.metrics(), f, spec.flow, wake);
    return a;
}

nlohmann::json summary_json(const Simulation& sim, const RunResult& r, const RunAnalysis& a) {
    const CaseSpec& spec = sim.spec();
    const SurfaceForces& f = a.forces;
    nlohmann::json cl_momentum = nlohmann::json::object(), cd_momentum = nlohmann::json::object(),
                   cl_circulation = nlohmann::json::object();
    double worst = 0.0;
    for (std::size_t k = 0; k < a.momentum.size(); ++k) {
        const std::string key = fmt::format("{:g}", spec.post.contours[k]);
        cl_momentum[key] = a.momentum[k].cl.total;
        cd_momentum[key] = a.momentum[k].cd.total;
        cl_circulation[key] = a.circulation[k].cl;
        worst = std::max(worst, std::abs(a.momentum[k].cl.total - f.cl.total));
    }
    const bool settled = r.status == RunStatus::converged || r.status == RunStatus::end_time;
    nlohmann::json s = {
        {"section", spec.geometry.name},
        {"reynolds", spec.flow.reynolds},
        {"alpha", spec.flow.alpha_deg},
        {"model", spec.model},
        {"mode", spec.run.mode},
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
        {"max_lift_disagreement", worst},
        {"stagnation_x", a.separation.stagnation.x},
        {"separation_upper", location_or_null(first(a.separation.upper.separations))},
        {"reattachment_upper",
         location_or_null(reattachment_after_first_separation(a.separation.upper))},
        {"separation_lower", location_or_null(first(a.separation.lower.separations))},
        {"reattachment_lower",
         location_or_null(reattachment_after_first_separation(a.separation.lower))},
        {"bubbles_upper", bubbles_json(a.separation.upper)},
        {"bubbles_lower", bubbles_json(a.separation.lower)},
        {"trailing_edge_cp_upper", a.kutta.cp_upper},
        {"trailing_edge_cp_lower", a.kutta.cp_lower},
        {"trailing_edge_cp_difference", a.kutta.difference},
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
    if (spec.run.mode == "unsteady")
        s["time_average"] = cycle_averages(sim.checkpoint_path().parent_path() / "history.csv");
    return s;
}

void write_run_report(const Simulation& sim, const RunResult& r, ClosingTable table) {
    const std::filesystem::path dir = sim.checkpoint_path().parent_path();
    if (!sim.grid().c_layout()) {  // verification blocks: no section, no forces
        write_json_file(dir / "summary.json", {{"converged", r.status == RunStatus::converged},
                                               {"iterations", r.steps},
                                               {"wall_seconds", r.wall_seconds}});
        return;
    }
    const RunAnalysis a = analyse_run(sim);
    write_surface_csv(dir / "surface.csv", a.surface);
    write_wake_csv(dir / "wake.csv", a.wake);
    write_surface_vtp_file(dir / "surface.vtp", a.surface);
    write_json_file(dir / "summary.json", summary_json(sim, r, a));
    if (table == ClosingTable::print) print_closing_table(sim.spec(), a);
}

}  // namespace veer
