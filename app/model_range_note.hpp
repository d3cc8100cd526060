#pragma once
/// One line for a run whose Reynolds number lies where its model is known to mislead, naming
/// the alternative. Thresholds (common practice; README, "Which model for which Reynolds
/// number"):
///   - laminar above about Re 5e4: the real boundary layer turns turbulent somewhere on the
///     section (often through a laminar separation bubble), which a laminar model cannot show;
///   - fully turbulent Spalart–Allmaras below about Re 1e6 without trips: the real layer stays
///     laminar over much of the chord, so the model's drag is too high and its separation wrong.
/// Printed by `veer run` and `veer sweep`, recorded in summary.json as `model_warning`.
#include <optional>
#include <string>

#include "io/case_spec.hpp"

namespace veer {

/// Re above which a laminar model misleads (common practice).
constexpr double laminar_reynolds_limit = 5.0e4;
/// Re below which untripped fully turbulent Spalart–Allmaras misleads (common practice).
constexpr double fully_turbulent_reynolds_limit = 1.0e6;

/// The line (without a "warning:" prefix), or nothing when the model suits the Reynolds
/// number. `tripped`: the case sets a forced-transition position on either surface.
std::optional<std::string> model_range_note(const std::string& model, double reynolds,
                                            bool tripped);

/// The same for a case (its model, Reynolds number and trips).
std::optional<std::string> model_range_note(const CaseSpec& spec);

}  // namespace veer
