#pragma once
/// The turbulence models behind a few calls: a std::variant of Laminar (no model: zero eddy
/// viscosity, nothing to advance) and SpalartAllmaras (spalart_allmaras.hpp).
#include <string>
#include <variant>
#include <vector>

#include "solver/spalart_allmaras.hpp"

namespace veer {

/// No turbulence model: eddy viscosity zero everywhere.
struct Laminar {
    TurbulenceReport advance(const TurbulenceInputs&) { return {}; }
};

using TurbulenceModel = std::variant<Laminar, SpalartAllmaras>;

/// Which model a run uses (the case file's [flow] model, in solver terms).
enum class TurbulenceModelKind { laminar, spalart_allmaras };

/// "laminar" or "spalart-allmaras"; throws InputError naming the value and what is allowed.
TurbulenceModelKind turbulence_model_kind(const std::string& name);

/// One step of the model's own equations (nothing for Laminar).
TurbulenceReport advance(TurbulenceModel& model, const TurbulenceInputs& in);

/// True where the model gives an eddy viscosity (not Laminar).
bool has_eddy_viscosity(const TurbulenceModel& model);

/// Cell eddy viscosity, `cells` values (zeros for Laminar).
std::vector<double> eddy_viscosity(const TurbulenceModel& model, std::size_t cells);

/// Face eddy viscosity on i- and j-faces (sizes kept; zeros for Laminar).
void face_eddy_viscosity(const TurbulenceModel& model, std::vector<double>& on_i,
                         std::vector<double>& on_j);

/// nu_tilde at the cells (empty for Laminar).
std::vector<double> nu_tilde(const TurbulenceModel& model);

}  // namespace veer
