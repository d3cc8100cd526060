#include "solver/transition_options.hpp"

#include "mesh/errors.hpp"
#include "solver/transition_correlations.hpp"

namespace veer {

namespace {

std::optional<double> value(const ModelOptions& options, const char* key) {
    const auto it = options.find(key);
    if (it == options.end()) return std::nullopt;
    return it->second;
}

ModelKey turbulence_key_spec() {
    return {turbulence_key, 0.01, 10.0,
            "a free-stream turbulence intensity from 0.01 to 10 percent"};
}

}  // namespace

std::vector<ModelKey> trip_keys() {
    const char* allowed = "a trip position from 0 to 1 (x/c along the chord from the leading edge)";
    return {{trip_upper_key, 0.0, 1.0, allowed}, {trip_lower_key, 0.0, 1.0, allowed}};
}

TripPositions trips_of(const ModelOptions& options) {
    return {value(options, trip_upper_key), value(options, trip_lower_key)};
}

std::vector<ModelKey> amplification_keys() {
    std::vector<ModelKey> keys = trip_keys();
    keys.push_back(turbulence_key_spec());
    keys.push_back({critical_n_key, 0.1, 20.0, "a critical amplification factor from 0.1 to 20"});
    return keys;
}

void check_amplification_options(const ModelOptions& options) {
    if (value(options, turbulence_key) && value(options, critical_n_key))
        throw InputError(std::string("[flow] give ") + turbulence_key + " or " + critical_n_key +
                         ", not both (the critical amplification factor follows from the "
                         "turbulence intensity by Mack's relation)");
}

double critical_amplification_of(const ModelOptions& options) {
    if (const auto n = value(options, critical_n_key)) return *n;
    if (const auto tu = value(options, turbulence_key)) return mack_critical_amplification(*tu);
    return 9.0;
}

std::vector<ModelKey> intermittency_keys() {
    std::vector<ModelKey> keys = trip_keys();
    keys.push_back(turbulence_key_spec());
    return keys;
}

double turbulence_percent_of(const ModelOptions& options) {
    return value(options, turbulence_key).value_or(0.1);
}

}  // namespace veer
