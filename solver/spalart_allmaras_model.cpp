#include "solver/spalart_allmaras_model.hpp"

#include "mesh/wall_distance.hpp"
#include "solver/spalart_allmaras.hpp"
#include "solver/transition_options.hpp"

namespace veer {
namespace {

constexpr const char* variable_name = "nu_tilde";

class SpalartAllmarasModel final : public FlowModel {
public:
    SpalartAllmarasModel(const ModelSetup& s, const SpalartAllmarasSettings& settings)
        : m_core(s.geom, s.faces, s.connectivity, wall_distance(s.grid, s.metrics), s.nu,
                 settings) {
        m_variables.push_back({variable_name, "nu~", m_core.boundary_column()});
        // Trips alone: no production where a trip holds the layer laminar (the rest of the
        // model as it is); without trips the standard model to the bit.
        const TripPositions trips = trips_of(s.options);
        if (trips.any()) {
            const std::vector<TripZone> zones = trip_zones(wall_feet(s.geom, s.faces), trips);
            m_production.resize(zones.size());
            for (std::size_t k = 0; k < zones.size(); ++k)
                m_production[k] = zones[k] == TripZone::laminar ? 0.0 : 1.0;
            m_core.set_source_modifiers(&m_production, nullptr);
        }
    }

    const std::vector<ModelVariable>& variables() const override { return m_variables; }

    ModelStepReport advance(const ModelStepInputs& in) override {
        const TurbulenceReport t = m_core.advance(in);
        ModelStepReport r;
        r.residuals = {t.residual};
        r.finite = t.finite;
        if (!t.finite) {
            r.worst_i = t.worst_i;
            r.worst_j = t.worst_j;
            r.worst_variable = variable_name;
        }
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

private:
    SpalartAllmaras m_core;
    std::vector<ModelVariable> m_variables;
    std::vector<double> m_production;  ///< per cell, with trips only
};

}  // namespace

ModelDescriptor spalart_allmaras_descriptor(const SpalartAllmarasSettings& settings) {
    ModelDescriptor d;
    d.name = "spalart-allmaras";
    d.description = "Spalart-Allmaras one-equation model (fully turbulent, SA-neg)";
    d.steady_pseudo_cfl = spalart_allmaras_pseudo_cfl;
    // Time-accurate: 0.8 (common practice for BDF2 with lagged convection terms; larger steps
    // not yet measured on y+ 1 grids).
    d.time_accurate_cfl = 0.8;
    d.default_y_plus = 1.0;  // first cell at y+ = 1 (common practice for wall-resolved SA)
    d.keys = trip_keys();
    d.make = [settings](const ModelSetup& s) -> std::unique_ptr<FlowModel> {
        return std::make_unique<SpalartAllmarasModel>(s, settings);
    };
    return d;
}

}  // namespace veer
