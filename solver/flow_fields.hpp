#pragma once
/// The flow as post-processing and output see it: cell-centred values, no ghost cells.
#include <vector>

#include "solver/named_array.hpp"

namespace veer {

/// Non-dimensional: chord 1, free-stream speed 1, density 1; nu = 1 / Re.
struct FlowFields {
    int ni = 0;
    int nj = 0;
    std::vector<double> u;               ///< x-velocity, ni * nj, i fastest
    std::vector<double> v;               ///< y-velocity
    std::vector<double> pressure;        ///< static pressure relative to free stream (p - p_inf)
    std::vector<double> eddy_viscosity;  ///< turbulent kinematic viscosity; zeros when laminar
    /// The turbulence model's transported variables (flow_model.hpp), then any further fields it
    /// adds to the output, ni * nj each, by name; empty when laminar.
    std::vector<NamedArray> model_fields;
};

/// Free-stream conditions of a run.
struct FlowConditions {
    double reynolds = 1000.0;  ///< based on chord and free-stream speed
    double alpha_deg = 0.0;    ///< angle of attack, degrees
};

}  // namespace veer
