#pragma once
/// Whether a steady solution that the pseudo-time iteration found is one the flow keeps, and
/// when a time-accurate run of a sweep point may stop before its end time. A steady solver can
/// converge to an unstable steady state (past the onset of shedding, the pseudo-time iteration
/// damps the shedding mode that physical time would let grow), so a sweep checks a converged
/// point whose upper surface has separated: it disturbs the steady fields with a small
/// cross-stream velocity bump behind the trailing edge and runs time-accurately. If by the check
/// time the lift oscillation has clearly decayed, the flow keeps the steady solution and the run
/// stops; if it has clearly grown, the run goes on to its end time as the point's time-accurate
/// run; in between, the check is judged again later (stability_margin below).
#include <deque>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "postprocess/time_average.hpp"
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

/// What the short time-accurate run shows. The lift oscillation of a window is sqrt(2) times
/// the root mean square of Cl about its least-squares straight line over the window (the
/// amplitude of a sine; the line takes out the mean and a slow drift, so a time-accurate state
/// that settles a little apart from the pseudo-time one does not count as a disturbance).
struct StabilityVerdict {
    bool unstable = false;  ///< the oscillation grew: the flow sheds
    bool decided = true;    ///< false: neither grew nor decayed clearly (judge again later)
    double early = 0.0;     ///< oscillation over the second quarter of the check
    double late = 0.0;      ///< the same over its last quarter
    double ratio = 0.0;     ///< late / early
    double offset = 0.0;    ///< mean Cl over the last quarter minus the steady Cl
};

/// The rule and its margin: the flow keeps the steady solution when the oscillation has fallen
/// to at most 1 / (1 + margin) of itself from the second quarter of the check to the last and
/// is below `still_moving` (or below round-off); it sheds when the oscillation has grown by more
/// than 1 + margin; otherwise the check is undecided. margin = 0.1 over the default 6 time
/// units is a growth or decay rate of 0.032 per time unit (ln 1.1 over the 3 time units between
/// the quarters); the laminar NACA 0012 at Re 1000 and 8 degrees, the case that sat on the old
/// threshold, decays at 0.094 (app/SWEEPS.md).
inline constexpr double stability_margin = 0.1;

/// The verdict from the lift history of the check run, started at the disturbed steady state of
/// lift `cl_steady`.
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
    /// lift `cl_steady` once this much time has passed (judge_disturbance); undecided, judge the
    /// whole record again at twice and four times that; still undecided, the run goes on as an
    /// unsteady one. 0: no check. The run
    /// counts as settled when, at least `settle_after` after its start, Cl and Cd have each
    /// varied by less than `settle_range` over the last `settle_window`; only without a check (a
    /// run the check found unstable goes to its end time: a growing mode may still be small).
    TimeAccurateWatch(double check_time, double cl_steady, double settle_after = 5.0,
                      double settle_window = 2.0, double settle_range = 1e-4);

    /// Records a step (time in chords / free-stream speed); true when the run may stop here.
    bool add(double time, double cl, double cd);

    Outcome outcome() const { return m_outcome; }
    bool judged() const { return m_judged; }
    /// Time units of the record the verdict was drawn from (the check time, or 2 or 4 times it).
    double judged_span() const { return m_judge_at; }
    const StabilityVerdict& verdict() const { return m_verdict; }

private:
    bool settled() const;

    double m_check_time, m_cl_steady, m_settle_after, m_settle_window, m_settle_range;
    double m_judge_at = 0.0;  ///< elapsed time of the next judgement
    double m_start = 0.0;
    bool m_started = false, m_judged = false;
    StabilityVerdict m_verdict;
    ForceRecord m_until_check;              // the record the verdict is drawn from
    std::deque<double> m_time, m_cl, m_cd;  // the last settle_window
    Outcome m_outcome = Outcome::running;
};

}  // namespace veer
