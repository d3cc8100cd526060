#include "app/run_report.hpp"

#include <fmt/format.h>

#include <nlohmann/json.hpp>

#include "io/json_writer.hpp"

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

}  // namespace

void write_run_report(const Simulation& sim, const RunResult& r) {
    const SurfaceForces& f = r.forces;
    const CaseSpec& spec = sim.spec();
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
    write_json_file(sim.checkpoint_path().parent_path() / "summary.json", s);
    fmt::print("\n  Cl {:9.5f}  (pressure {:9.5f}, friction {:9.5f})\n", f.cl.total, f.cl.pressure,
               f.cl.friction);
    fmt::print("  Cd {:9.5f}  (pressure {:9.5f}, friction {:9.5f})\n", f.cd.total, f.cd.pressure,
               f.cd.friction);
    fmt::print("  Cm {:9.5f}  about the quarter chord, nose-up positive\n", f.cm.total);
}

}  // namespace veer
