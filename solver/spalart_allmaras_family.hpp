#pragma once
/// What the models built on the Spalart-Allmaras numerics share behind the model interface
/// (flow_model.hpp): the SpalartAllmaras core with its variable nu_tilde (label "nu~"), its eddy
/// viscosity, its line solves and its restart state. The fully turbulent model, SA-AFT2017b and
/// SA-BCM derive from it and add their own variables and source modifiers.
#include "solver/flow_model.hpp"
#include "solver/spalart_allmaras.hpp"
#include "solver/spalart_allmaras_settings.hpp"

namespace veer {

/// The settings with nu_tilde's free-stream ratio replaced (a transition model's own value).
SpalartAllmarasSettings with_free_stream_ratio(SpalartAllmarasSettings s, double ratio);

class SpalartAllmarasFamilyModel : public FlowModel {
public:
    static constexpr const char* nu_tilde_name = "nu_tilde";

    SpalartAllmarasFamilyModel(const ModelSetup& s, const SpalartAllmarasSettings& settings);

    const std::vector<ModelVariable>& variables() const override { return m_variables; }
    bool has_eddy_viscosity() const override { return true; }
    std::vector<double> eddy_viscosity() const override { return m_core.eddy_viscosity(); }
    void face_eddy_viscosity(std::vector<double>& on_i, std::vector<double>& on_j) const override {
        m_core.face_eddy_viscosity(on_i, on_j);
    }
    void fold_wake_cut_lines(bool fold) override { m_core.fold_wake_cut_lines(fold); }
    std::vector<NamedArray> values() const override { return {{nu_tilde_name, m_core.nu_tilde()}}; }
    void set_values(const std::vector<NamedArray>& arrays) override;

protected:
    /// The model report of a nu_tilde step alone (one residual; the cell when not finite).
    static ModelStepReport report_of(const TurbulenceReport& t);

    SpalartAllmaras m_core;
    std::vector<ModelVariable> m_variables;  ///< nu_tilde first; derived models append theirs
};

}  // namespace veer
