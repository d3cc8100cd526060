#pragma once
/// Kutta check: the pressure on the two surfaces at the trailing edge. A converged flow that
/// leaves a sharp trailing edge smoothly has equal upper and lower pressure there.
#include "postprocess/surface_distribution.hpp"

namespace veer {

struct KuttaCheck {
    double cp_upper = 0.0;            ///< upper-surface Cp extrapolated to the trailing edge
    double cp_lower = 0.0;            ///< lower-surface Cp extrapolated to the trailing edge
    double difference = 0.0;          ///< cp_upper - cp_lower
    double cp_upper_last_face = 0.0;  ///< Cp of the last upper face (no extrapolation)
    double cp_lower_last_face = 0.0;
};

/// Cp at the trailing edge on both surfaces, extrapolated linearly in arc length through the last
/// two faces of each surface.
KuttaCheck kutta_check(const SurfaceDistribution& distribution);

}  // namespace veer
