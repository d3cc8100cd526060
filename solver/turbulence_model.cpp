#include "solver/turbulence_model.hpp"

#include <algorithm>

namespace veer {

TurbulenceModelKind turbulence_model_kind(const std::string& name) {
    if (name == "laminar") return TurbulenceModelKind::laminar;
    if (name == "spalart-allmaras") return TurbulenceModelKind::spalart_allmaras;
    throw InputError("turbulence model \"" + name +
                     "\": allowed \"laminar\" or \"spalart-allmaras\"");
}

TurbulenceReport advance(TurbulenceModel& model, const TurbulenceInputs& in) {
    return std::visit([&](auto& m) { return m.advance(in); }, model);
}

bool has_eddy_viscosity(const TurbulenceModel& model) {
    return std::holds_alternative<SpalartAllmaras>(model);
}

std::vector<double> eddy_viscosity(const TurbulenceModel& model, std::size_t cells) {
    if (const auto* sa = std::get_if<SpalartAllmaras>(&model)) return sa->eddy_viscosity();
    return std::vector<double>(cells, 0.0);
}

void face_eddy_viscosity(const TurbulenceModel& model, std::vector<double>& on_i,
                         std::vector<double>& on_j) {
    if (const auto* sa = std::get_if<SpalartAllmaras>(&model)) {
        sa->face_eddy_viscosity(on_i, on_j);
        return;
    }
    std::fill(on_i.begin(), on_i.end(), 0.0);
    std::fill(on_j.begin(), on_j.end(), 0.0);
}

std::vector<double> nu_tilde(const TurbulenceModel& model) {
    if (const auto* sa = std::get_if<SpalartAllmaras>(&model)) return sa->nu_tilde();
    return {};
}

}  // namespace veer
