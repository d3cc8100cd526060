/// FlowSolver::state() and restore(): the complete state for bit-identical restarts.
#include <sstream>

#include "solver/boundary_ghosts.hpp"
#include "solver/flow_solver_impl.hpp"

namespace veer {

namespace {

const NamedArray& find_array(const std::vector<NamedArray>& state, const std::string& name,
                             std::size_t size) {
    for (const NamedArray& a : state)
        if (a.name == name) {
            if (a.values.size() != size) {
                std::ostringstream msg;
                msg << "solver state array '" << name << "' has " << a.values.size()
                    << " values; this grid needs " << size;
                throw InputError(msg.str());
            }
            return a;
        }
    throw InputError("solver state has no array '" + name +
                     "' (a state written by veer's "
                     "flow solver has it)");
}

bool has_array(const std::vector<NamedArray>& state, const std::string& name) {
    for (const NamedArray& a : state)
        if (a.name == name) return true;
    return false;
}

/// The stall guard and the scheme it left the run on (a state without the record, from an
/// older version or a "classic" run: a fresh guard).
void restore_stall_guard(FlowSolverCore& s, const std::vector<NamedArray>& state) {
    if (s.settings.steady_scheme != s.requested_scheme) s.use_scheme(s.requested_scheme);
    s.scheme_fallback_step = 0;
    s.stall_guard = StallGuard(s.settings.stall_rule);
    const NamedArray* record = nullptr;
    for (const NamedArray& a : state)
        if (a.name == "steady_stall_guard") record = &a;
    if (record == nullptr) return;
    const std::vector<double>& g = record->values;
    if (g.empty()) throw InputError("solver state array 'steady_stall_guard' is empty");
    s.stall_guard.load(std::vector<double>(g.begin() + 1, g.end()));
    if (s.requested_scheme != SteadyScheme::fast) return;  // nothing to fall back from
    s.scheme_fallback_step = static_cast<long>(g[0]);
    if (s.scheme_fallback_step > 0) s.use_scheme(SteadyScheme::classic);
}

}  // namespace

std::vector<NamedArray> FlowSolver::state() const {
    const FlowSolverCore& s = *m_impl;
    std::vector<NamedArray> out = {
        {"velocity_u", s.vel.u.interior()},
        {"velocity_v", s.vel.v.interior()},
        {"velocity_u_previous", s.vel_old.u.interior()},
        {"velocity_v_previous", s.vel_old.v.interior()},
        {"pressure", s.pressure.interior()},
        {"flux_i", s.flux_i},
        {"flux_j", s.flux_j},
        {"flux_i_previous", s.flux_i_old},
        {"flux_j_previous", s.flux_j_old},
        {"local_time_step", s.local_dt.interior()},
        {"clock", {s.time, static_cast<double>(s.steps), s.dt_previous, s.circulation}},
    };
    for (NamedArray& a : s.model->values()) out.push_back(std::move(a));
    if (s.settings.mode == TimeMode::steady) {
        std::vector<double> guard = s.stall_guard.save();
        guard.insert(guard.begin(), static_cast<double>(s.scheme_fallback_step));
        out.push_back({"steady_stall_guard", guard});
    }
    if (s.relaxes_eddy_viscosity()) {
        out.push_back({"eddy_viscosity_i", s.eddy_i});
        out.push_back({"eddy_viscosity_j", s.eddy_j});
    }
    return out;
}

void FlowSolver::restore(const std::vector<NamedArray>& state) {
    FlowSolverCore& s = *m_impl;
    const std::size_t n = s.geom.volume.size();
    const std::size_t nfi = s.flux_i.size(), nfj = s.flux_j.size();
    s.vel.u.set_interior(find_array(state, "velocity_u", n).values);
    s.vel.v.set_interior(find_array(state, "velocity_v", n).values);
    s.vel_old.u.set_interior(find_array(state, "velocity_u_previous", n).values);
    s.vel_old.v.set_interior(find_array(state, "velocity_v_previous", n).values);
    s.pressure.set_interior(find_array(state, "pressure", n).values);
    s.flux_i = find_array(state, "flux_i", nfi).values;
    s.flux_j = find_array(state, "flux_j", nfj).values;
    s.flux_i_old = find_array(state, "flux_i_previous", nfi).values;
    s.flux_j_old = find_array(state, "flux_j_previous", nfj).values;
    const std::vector<double>& clock = find_array(state, "clock", 4).values;
    s.time = clock[0];
    s.steps = static_cast<long>(clock[1]);
    s.dt_previous = clock[2];
    s.circulation = clock[3];
    std::vector<NamedArray> model_state;
    for (const ModelVariable& v : s.model->variables())
        model_state.push_back(find_array(state, v.name, n));
    s.model->set_values(model_state);
    if (s.settings.mode == TimeMode::steady) restore_stall_guard(s, state);
    if (s.relaxes_eddy_viscosity()) {
        // A state from a scheme without relaxation has none: start from the model's value.
        if (has_array(state, "eddy_viscosity_i")) {
            s.eddy_i = find_array(state, "eddy_viscosity_i", s.eddy_i.size()).values;
            s.eddy_j = find_array(state, "eddy_viscosity_j", s.eddy_j.size()).values;
        } else {
            s.model->face_eddy_viscosity(s.eddy_i, s.eddy_j);
        }
    }
    if (s.settings.mode == TimeMode::steady) {
        // Rebuild the face steps and Poisson set-up from the stored local steps, as the
        // uninterrupted run built them at its last renewal.
        s.local_dt.set_interior(find_array(state, "local_time_step", n).values);
        s.apply_local_steps();
    }
}

}  // namespace veer
