#pragma once
/// The [flow] keys of the Spalart-Allmaras family about transition, read from ModelOptions:
/// forced-transition trips per surface (every model of the family), and the critical
/// amplification factor or free-stream turbulence of the free-transition models.
#include <vector>

#include "solver/flow_model.hpp"
#include "solver/trip_region.hpp"

namespace veer {

/// Key names (README, "Case files").
inline constexpr const char* trip_upper_key = "trip_upper";
inline constexpr const char* trip_lower_key = "trip_lower";
inline constexpr const char* turbulence_key = "turbulence_percent";
inline constexpr const char* critical_n_key = "critical_amplification";

/// trip_upper and trip_lower: x/c from 0 to 1.
std::vector<ModelKey> trip_keys();
/// The trips a case gave (none where a key is absent).
TripPositions trips_of(const ModelOptions& options);

/// SA-AFT2017b's keys: the trips, turbulence_percent and critical_amplification.
std::vector<ModelKey> amplification_keys();
/// Refuses turbulence_percent together with critical_amplification (InputError).
void check_amplification_options(const ModelOptions& options);
/// N_crit: critical_amplification as given, else Mack's relation at turbulence_percent
/// (mack_critical_amplification), else 9 (the value usually quoted for a quiet wind tunnel or
/// free flight: common practice).
double critical_amplification_of(const ModelOptions& options);

/// SA-BCM's keys: the trips and turbulence_percent.
std::vector<ModelKey> intermittency_keys();
/// Tu in percent: turbulence_percent as given, else 0.1 (a quiet wind tunnel: common practice).
double turbulence_percent_of(const ModelOptions& options);

}  // namespace veer
