#include "solver/sa_bcm_model.hpp"

#include "solver/spalart_allmaras_family.hpp"
#include "solver/spalart_allmaras_model.hpp"
#include "solver/transition_correlations.hpp"
#include "solver/transition_flow_quantities.hpp"
#include "solver/transition_options.hpp"

namespace veer {
namespace {

class SaBcmModel final : public SpalartAllmarasFamilyModel {
public:
    SaBcmModel(const ModelSetup& s, const SpalartAllmarasSettings& settings)
        : SpalartAllmarasFamilyModel(
              s, with_free_stream_ratio(settings, BcmConstants::free_stream_ratio)),
          m_flow(s.geom, s.faces, s.connectivity, m_core.wall_distance(), s.nu),
          m_zones(trip_zones(wall_feet(s.geom, s.faces), trips_of(s.options))),
          m_nu(s.nu),
          m_re_theta_c(bcm_critical_re_theta(turbulence_percent_of(s.options))) {
        m_no_trip_term.assign(s.geom.volume.size(), 0.0);  // SA-noft2
        m_gamma.assign(s.geom.volume.size(), 1.0);
        m_core.set_source_modifiers(&m_gamma, &m_no_trip_term);
    }

    ModelStepReport advance(const ModelStepInputs& in) override {
        m_flow.update(in.u, in.v);
        const std::vector<double> nut = m_core.eddy_viscosity();
        const std::vector<double>& d = m_core.wall_distance();
        for (std::size_t k = 0; k < m_gamma.size(); ++k)
            m_gamma[k] =
                m_zones[k] == TripZone::turbulent
                    ? 1.0
                    : bcm_intermittency(m_flow.omega()[k], d[k], m_nu, nut[k], m_re_theta_c);
        return report_of(m_core.advance(in));
    }

    std::vector<NamedArray> output_fields() const override { return {{"intermittency", m_gamma}}; }

private:
    TransitionFlowQuantities m_flow;
    std::vector<TripZone> m_zones;
    double m_nu, m_re_theta_c;
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
