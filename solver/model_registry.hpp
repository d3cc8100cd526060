#pragma once
/// The models a case can name ([flow] model), by name. The built-in ones are listed in
/// model_registry.cpp, one line each; register_model adds one at run time (tests do).
#include <string>
#include <string_view>
#include <vector>

#include "solver/flow_model.hpp"

namespace veer {

/// The model registered under `name`, or null.
const ModelDescriptor* find_model(std::string_view name);

/// The registered names, in registration order.
std::vector<std::string> model_names();

/// The model registered under `name`; throws InternalError when there is none (a name from
/// the case file is checked by find_model first).
const ModelDescriptor& model_named(std::string_view name);

/// Adds a model (or replaces the one of the same name). Descriptors found earlier stay valid.
void register_model(ModelDescriptor descriptor);

}  // namespace veer
