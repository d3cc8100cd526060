#include "solver/sa_bcm_model.hpp"

#include "mesh/wall_distance.hpp"
#include "solver/spalart_allmaras.hpp"
#include "solver/spalart_allmaras_model.hpp"
#include "solver/transition_correlations.hpp"
#include "solver/transition_flow_quantities.hpp"
#include "solver/transition_options.hpp"

namespace veer {
namespace {

constexpr const char* variable_name = "nu_tilde";

SpalartAllmarasSettings with_bcm_free_stream(SpalartAllmarasSettings s) {
    s.free_stream_ratio = BcmConstants::free_stream_ratio;
    return s;
}

class SaBcmModel final : public FlowModel {
public:
    SaBcmModel(const ModelSetup& s, const SpalartAllmarasSettings& settings)
        : m_core(s.geom, s.faces, s.connectivity, wall_distance(s.grid, s.metrics), s.nu,
                 with_bcm_free_stream(settings)),
          m_flow(s.geom, s.faces, s.connectivity, m_core.wall_distance(), s.nu),
          m_zones(trip_zones(wall_feet(s.geom, s.faces), trips_of(s.options))),
          m_nu(s.nu),
          m_re_theta_c(bcm_critical_re_theta(turbulence_percent_of(s.options))) {
        m_variables.push_back({variable_name, "nu~", m_core.boundary_column()});
        m_no_trip_term.assign(s.geom.volume.size(), 0.0);  // SA-noft2
        m_gamma.assign(s.geom.volume.size(), 1.0);
        m_core.set_source_modifiers(&m_gamma, &m_no_trip_term);
    }

    const std::vector<ModelVariable>& variables() const override { return m_variables; }

    ModelStepReport advance(const ModelStepInputs& in) override {
        m_flow.update(in.u, in.v);
        const std::vector<double> nut = m_core.eddy_viscosity();
        const std::vector<double>& d = m_core.wall_distance();
        for (std::size_t k = 0; k < m_gamma.size(); ++k)
            m_gamma[k] =
                m_zones[k] == TripZone::turbulent
                    ? 1.0
                    : bcm_intermittency(m_flow.omega()[k], d[k], m_nu, nut[k], m_re_theta_c);
        const TurbulenceReport t = m_core.advance(in);
        ModelStepReport r;
        r.residuals = {t.residual};
        r.finite = t.finite;
        if (!t.finite)
            r.worst_i = t.worst_i, r.worst_j = t.worst_j, r.worst_variable = variable_name;
        return r;
    }

    bool has_eddy_viscosity() const override { return true; }
    std::vector<double> eddy_viscosity() const override { return m_core.eddy_viscosity(); }
    void face_eddy_viscosity(std::vector<double>& on_i, std::vector<double>& on_j) const override {
        m_core.face_eddy_viscosity(on_i, on_j);
    }
    void fold_wake_cut_lines(bool fold) override { m_core.fold_wake_cut_lines(fold); }
    std::vector<NamedArray> values() const override { return {{variable_name, m_core.nu_tilde()}}; }
    void set_values(const std::vector<NamedArray>& arrays) override {
        for (const NamedArray& a : arrays)
            if (a.name == variable_name) m_core.set_nu_tilde(a.values);
    }
    std::vector<NamedArray> output_fields() const override { return {{"intermittency", m_gamma}}; }

private:
    SpalartAllmaras m_core;
    TransitionFlowQuantities m_flow;
    std::vector<TripZone> m_zones;
    double m_nu, m_re_theta_c;
    std::vector<ModelVariable> m_variables;
    std::vector<double> m_gamma, m_no_trip_term;
};

}  // namespace

ModelDescriptor sa_bcm_descriptor(const SpalartAllmarasSettings& settings) {
    ModelDescriptor d;
    d.name = "sa-bcm";
    d.description = "SA-BCM: Spalart-Allmaras with an algebraic intermittency (free transition)";
    d.steady_pseudo_cfl = spalart_allmaras_pseudo_cfl;
    d.time_accurate_cfl = 0.8;  // as the Spalart-Allmaras model (common practice)
    d.default_y_plus = 1.0;     // wall-resolved (common practice)
    d.keys = intermittency_keys();
    d.make = [settings](const ModelSetup& s) -> std::unique_ptr<FlowModel> {
        return std::make_unique<SaBcmModel>(s, settings);
    };
    return d;
}

}  // namespace veer
