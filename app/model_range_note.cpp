#include "app/model_range_note.hpp"

#include <fmt/format.h>

#include <cmath>

#include "solver/model_registry.hpp"
#include "solver/transition_options.hpp"

namespace veer {
namespace {

/// The free-transition models this build has, in order of preference, as the case file names
/// them; empty when none is registered.
std::string transition_alternative() {
    std::string out;
    for (const char* name : {"sa-aft", "sa-bcm"})
        if (find_model(name))
            out += fmt::format("{}model = \"{}\"", out.empty() ? "" : " or ", name);
    return out;
}

/// 5e4, 1e6: a Reynolds number as people write it.
std::string short_number(double v) {
    const int exponent = static_cast<int>(std::floor(std::log10(v)));
    return fmt::format("{:g}e{}", v / std::pow(10.0, exponent), exponent);
}

}  // namespace

std::optional<std::string> model_range_note(const std::string& model, double reynolds,
                                            bool tripped) {
    const std::string free = transition_alternative();
    if (model == "laminar" && reynolds > laminar_reynolds_limit)
        return fmt::format(
            "Re {:g} is above about {}, where a laminar model misleads (the real boundary "
            "layer turns turbulent, often through a laminar separation bubble); use {} "
            "(threshold: common practice)",
            reynolds, short_number(laminar_reynolds_limit),
            free.empty() ? std::string("model = \"spalart-allmaras\" with trips") : free);
    if (model == "spalart-allmaras" && !tripped && reynolds < fully_turbulent_reynolds_limit)
        return fmt::format(
            "Re {:g} is below about {}, where fully turbulent Spalart-Allmaras without trips "
            "misleads (the real layer stays laminar over much of the chord: drag too high, "
            "separation misplaced); use {} (threshold: common practice)",
            reynolds, short_number(fully_turbulent_reynolds_limit),
            free.empty() ? std::string("a transition model (none in this build)") : free);
    return std::nullopt;
}

std::optional<std::string> model_range_note(const CaseSpec& spec) {
    // A trip on either surface ([flow] trip_upper / trip_lower, solver/transition_options.hpp).
    const ModelOptions& o = spec.model.options;
    const bool tripped = o.count(trip_upper_key) > 0 || o.count(trip_lower_key) > 0;
    return model_range_note(spec.model.name, spec.flow.reynolds, tripped);
}

}  // namespace veer
