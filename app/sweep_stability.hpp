#pragma once
/// Whether a steady solution that the pseudo-time iteration found is one the flow keeps. A
/// steady solver can converge to an unstable steady state (past the onset of shedding, the
/// pseudo-time iteration damps the shedding mode that physical time would let grow), so a sweep
/// checks a converged point whose upper surface has separated: it disturbs the steady fields
/// with a small cross-stream velocity bump behind the trailing edge and runs time-accurately
/// for a short while. If the disturbance of the lift grows, or is still large at the end, the
/// point is continued time-accurately like one that did not settle.
#include "app/sweep_unsteady_stats.hpp"
#include "mesh/grid_metrics.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// The disturbance: v += amplitude * exp(-|x - centre|^2 / radius^2), centre half a chord
/// behind the trailing edge (x/c 1.5, on the chord line), radius a quarter chord (free-stream
/// speed units; the projection of the first step removes its divergent part).
struct WakeDisturbance {
    double amplitude = 0.05;
    double centre_x = 1.5, centre_y = 0.0;
    double radius = 0.25;
};

/// `fields` with the disturbance added to v (cell centroids from `metrics`).
FlowFields disturbed(const FlowFields& fields, const GridMetrics& metrics,
                     const WakeDisturbance& d = {});

/// What the short time-accurate run shows.
struct StabilityVerdict {
    bool unstable = false;
    double early = 0.0;  ///< max |Cl - Cl steady| over the second quarter of the run
    double late = 0.0;   ///< the same over its last quarter
};

/// The verdict from the lift history of the check run, started at the disturbed steady state of
/// lift `cl_steady`: unstable when the lift disturbance has grown from the second quarter to
/// the last (`late > early`) or is still above `still_moving` at the end.
StabilityVerdict judge_disturbance(const ForceRecord& history, double cl_steady,
                                   double still_moving = 1e-3);

}  // namespace veer
