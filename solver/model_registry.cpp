#include "solver/model_registry.hpp"

#include <deque>

#include "mesh/errors.hpp"
#include "solver/laminar_model.hpp"
#include "solver/sa_aft_model.hpp"
#include "solver/sa_bcm_model.hpp"
#include "solver/spalart_allmaras_model.hpp"

namespace veer {
namespace {

/// A deque: registering a model never moves the ones already handed out.
std::deque<ModelDescriptor>& registry() {
    static std::deque<ModelDescriptor> models = {
        laminar_descriptor(),
        spalart_allmaras_descriptor(),
        sa_aft_descriptor(),
        sa_bcm_descriptor(),
    };
    return models;
}

}  // namespace

const ModelDescriptor* find_model(std::string_view name) {
    for (const ModelDescriptor& d : registry())
        if (d.name == name) return &d;
    return nullptr;
}

std::vector<std::string> model_names() {
    std::vector<std::string> names;
    for (const ModelDescriptor& d : registry()) names.push_back(d.name);
    return names;
}

const ModelDescriptor& model_named(std::string_view name) {
    const ModelDescriptor* d = find_model(name);
    VEER_VERIFY(d != nullptr, "no model is registered as '" + std::string(name) + "'");
    return *d;
}

void register_model(ModelDescriptor descriptor) {
    for (ModelDescriptor& d : registry())
        if (d.name == descriptor.name) {
            d = std::move(descriptor);
            return;
        }
    registry().push_back(std::move(descriptor));
}

}  // namespace veer
