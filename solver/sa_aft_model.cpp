#include "solver/sa_aft_model.hpp"

#include <cmath>

#include "solver/spalart_allmaras_family.hpp"
#include "solver/spalart_allmaras_model.hpp"
#include "solver/spalart_allmaras_terms.hpp"
#include "solver/transition_correlations.hpp"
#include "solver/transition_flow_quantities.hpp"
#include "solver/transition_options.hpp"
#include "solver/transported_scalar.hpp"

namespace veer {
namespace {

constexpr const char* amplification_name = "amplification";
constexpr const char* log_intermittency_name = "log_intermittency";
/// g~ is kept >= -30 (our choice): exp(-30) ~ 1e-13 is zero intermittency to any output
/// precision and keeps exp finite; the equation's own equilibrium is ln(1/c3) = -3.9.
constexpr double lowest_log_intermittency = -30.0;

/// Far field 0, zero normal gradient at walls and outflow, 0 on prescribed-velocity faces.
ScalarColumn transition_column() {
    ScalarColumn c;
    c.inflow = {Condition::dirichlet, 0.0, {}};
    c.prescribed_velocity = {Condition::dirichlet, 0.0, {}};
    return c;
}

class SaAftModel final : public SpalartAllmarasFamilyModel {
public:
    SaAftModel(const ModelSetup& s, const SpalartAllmarasSettings& settings)
        : SpalartAllmarasFamilyModel(
              s, with_free_stream_ratio(settings, AftConstants::free_stream_ratio)),
          m_flow(s.geom, s.faces, s.connectivity, m_core.wall_distance(), s.nu),
          m_n(s.geom, s.faces, s.connectivity, transition_column(), 0.0),
          m_g(s.geom, s.faces, s.connectivity, transition_column(), 0.0),
          m_zones(trip_zones(wall_feet(s.geom, s.faces), trips_of(s.options))),
          m_nu(s.nu),
          m_n_crit(critical_amplification_of(s.options)),
          m_time_scale(settings.time_step_scale) {
        m_variables.push_back({amplification_name, "n~", transition_column()});
        m_variables.push_back({log_intermittency_name, "g~", transition_column()});
        const std::size_t n = s.geom.volume.size();
        for (auto* v : {&m_ft2, &m_explicit, &m_implicit}) v->assign(n, 0.0);
        m_core.set_source_modifiers(nullptr, &m_ft2);
        update_ft2();
    }

    ModelStepReport advance(const ModelStepInputs& in) override {
        update_ft2();
        const TurbulenceReport t = m_core.advance(in);
        m_flow.update(in.u, in.v);
        m_core.face_eddy_viscosity(m_nut_i, m_nut_j);
        m_nut = m_core.eddy_viscosity();
        const ScalarStepReport n = step_amplification(in);
        const ScalarStepReport g = step_intermittency(in);
        ModelStepReport r = report_of(t);
        r.residuals.push_back(n.residual);
        r.residuals.push_back(g.residual);
        for (const auto& [step, name] :
             {std::pair{n, amplification_name}, std::pair{g, log_intermittency_name}})
            if (r.finite && !step.finite) {
                r.finite = false;
                r.worst_i = step.worst_i;
                r.worst_j = step.worst_j;
                r.worst_variable = name;
            }
        return r;
    }

    void fold_wake_cut_lines(bool fold) override {
        SpalartAllmarasFamilyModel::fold_wake_cut_lines(fold);
        m_n.fold_wake_cut_lines(fold);
        m_g.fold_wake_cut_lines(fold);
    }

    std::vector<NamedArray> values() const override {
        return {{nu_tilde_name, m_core.nu_tilde()},
                {amplification_name, m_n.values()},
                {log_intermittency_name, m_g.values()}};
    }
    void set_values(const std::vector<NamedArray>& arrays) override {
        SpalartAllmarasFamilyModel::set_values(arrays);
        for (const NamedArray& a : arrays) {
            if (a.name == amplification_name) m_n.set_values(a.values);
            if (a.name == log_intermittency_name) m_g.set_values(a.values);
        }
        update_ft2();
    }
    std::vector<NamedArray> output_fields() const override {
        std::vector<double> gamma = m_g.values();
        for (std::size_t k = 0; k < gamma.size(); ++k)
            gamma[k] = m_zones[k] == TripZone::turbulent ? 1.0 : std::exp(gamma[k]);
        // H12 as the model estimates it from the local flow (aft_shape_factor of H_L): the
        // quantity its stability correlations read, to compare with a boundary-layer solution.
        std::vector<double> h12 = m_flow.shape_estimate();
        for (double& h : h12) h = aft_shape_factor(h);
        return {{"intermittency", gamma}, {"shape_factor_estimate", h12}};
    }

private:
    void update_ft2() {
        for (std::size_t k = 0; k < m_ft2.size(); ++k)
            m_ft2[k] = m_zones[k] == TripZone::turbulent ? 0.0 : aft_ft2(m_g[k]);
    }

    /// Face diffusivity a (nu + b nu_t) on both families.
    void diffusivity(double a, double b) {
        m_mu_i.resize(m_nut_i.size());
        m_mu_j.resize(m_nut_j.size());
        for (std::size_t f = 0; f < m_nut_i.size(); ++f) m_mu_i[f] = a * (m_nu + b * m_nut_i[f]);
        for (std::size_t f = 0; f < m_nut_j.size(); ++f) m_mu_j[f] = a * (m_nu + b * m_nut_j[f]);
    }

    ScalarStepTerms terms(double lowest, double highest) {
        return {&m_mu_i, &m_mu_j, &m_explicit, &m_implicit, m_time_scale, lowest, highest};
    }

    ScalarStepReport step_amplification(const ModelStepInputs& in) {
        const std::vector<double>& d = m_core.wall_distance();
        for (std::size_t k = 0; k < m_explicit.size(); ++k) {
            const AftCell c{m_flow.omega()[k], m_flow.strain()[k],        d[k], m_nu,
                            m_nut[k],          m_flow.shape_estimate()[k]};
            m_explicit[k] = aft_amplification_source(c);
            m_implicit[k] = 0.0;
        }
        diffusivity(AftConstants::sigma_n, 1.0);
        return m_n.advance(in, terms(0.0, 1e300));
    }

    ScalarStepReport step_intermittency(const ModelStepInputs& in) {
        for (std::size_t k = 0; k < m_explicit.size(); ++k) {
            const double r_t = m_nut[k] / m_nu;
            const TransitionSourceSplit s =
                aft_intermittency_source(m_g[k], m_flow.strain()[k], m_flow.omega()[k],
                                         aft_onset(m_n[k], m_n_crit, r_t), aft_turbulent(r_t));
            m_explicit[k] = s.explicit_part;
            m_implicit[k] = s.implicit_coefficient;
        }
        diffusivity(1.0, 1.0 / AftConstants::sigma_gamma);
        return m_g.advance(in, terms(lowest_log_intermittency, 0.0));
    }

    TransitionFlowQuantities m_flow;
    TransportedScalar m_n, m_g;
    std::vector<TripZone> m_zones;
    double m_nu, m_n_crit, m_time_scale;
    std::vector<double> m_ft2, m_explicit, m_implicit, m_nut, m_nut_i, m_nut_j, m_mu_i, m_mu_j;
};

}  // namespace

ModelDescriptor sa_aft_descriptor(const SpalartAllmarasSettings& settings) {
    ModelDescriptor d;
    d.name = "sa-aft";
    d.description =
        "SA-AFT2017b: Spalart-Allmaras with amplification-factor transport (free transition)";
    d.steady_pseudo_cfl = spalart_allmaras_pseudo_cfl;
    d.time_accurate_cfl = 0.8;  // as the Spalart-Allmaras model (common practice)
    d.default_y_plus = 1.0;     // wall-resolved, y+ <= 1 (numerics notes; common practice)
    d.keys = amplification_keys();
    d.check_options = check_amplification_options;
    d.make = [settings](const ModelSetup& s) -> std::unique_ptr<FlowModel> {
        return std::make_unique<SaAftModel>(s, settings);
    };
    return d;
}

}  // namespace veer
