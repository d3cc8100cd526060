#pragma once
/// Whether a steady solution that the pseudo-time iteration found is one the flow keeps, and
/// when a time-accurate run of a sweep point may stop before its end time. A steady solver can
/// converge to an unstable steady state (past the onset of shedding, the pseudo-time iteration
/// damps the shedding mode that physical time would let grow), so a sweep checks a converged
/// point whose upper surface has separated: it disturbs the steady fields with a small
/// cross-stream velocity bump behind the trailing edge and runs time-accurately. If by the check
/// time the lift disturbance has decayed, the flow keeps the steady solution and the run stops;
/// otherwise it goes on to its end time as the point's time-accurate run.
#include <deque>
#include <vector>

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

/// Follows a time-accurate run of a sweep point step by step.
class TimeAccurateWatch {
public:
    enum class Outcome {
        running,  ///< go on
        kept,     ///< the disturbance decayed by the check time: the steady solution stands
        settled,  ///< Cl and Cd stopped moving (a flow that does not shed)
    };

    /// `check_time` > 0: judge the disturbance of a run started from a disturbed steady state of
    /// lift `cl_steady` once this much time has passed (judge_disturbance); 0: no check. The run
    /// counts as settled when, at least `settle_after` after its start, Cl and Cd have each
    /// varied by less than `settle_range` over the last `settle_window`; only without a check (a
    /// run the check found unstable goes to its end time: a growing mode may still be small).
    TimeAccurateWatch(double check_time, double cl_steady, double settle_after = 5.0,
                      double settle_window = 2.0, double settle_range = 1e-4);

    /// Records a step (time in chords / free-stream speed); true when the run may stop here.
    bool add(double time, double cl, double cd);

    Outcome outcome() const { return m_outcome; }
    bool judged() const { return m_judged; }
    const StabilityVerdict& verdict() const { return m_verdict; }

private:
    bool settled() const;

    double m_check_time, m_cl_steady, m_settle_after, m_settle_window, m_settle_range;
    double m_start = 0.0;
    bool m_started = false, m_judged = false;
    StabilityVerdict m_verdict;
    ForceRecord m_until_check;              // the record the verdict is drawn from
    std::deque<double> m_time, m_cl, m_cd;  // the last settle_window
    Outcome m_outcome = Outcome::running;
};

}  // namespace veer
