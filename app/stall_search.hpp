#pragma once
/// Bracketing stall in a sweep (app/SWEEPS.md, "Stall bracketed"): which angles a sweep adds
/// after its requested ones so that the largest Cl has a point of lower Cl on each side, at an
/// angle spacing of at most `resolution` on both sides. A pure planner: it sees the polar's
/// (alpha, Cl) samples and the angles already attempted, and names the next angles to run.
///
/// - Not bracketed (the largest Cl at the highest angle, or at the lowest): one more angle,
///   one step beyond the highest (lowest) angle attempted, the step being the spacing of the
///   two highest (lowest) requested angles; at most `extra_steps` steps beyond the requested
///   range (the cap), never past +-90 degrees.
/// - Bracketed: the middle of each gap next to the maximum wider than `resolution` (so the
///   spacing halves each round), rounded to 0.01 degree (the folders' resolution); where that
///   angle failed before, the middle between it and the maximum, and so on.
/// Unsteady points take part by their mean Cl; failed points are left out of the samples but
/// stay among the attempted angles, so a failed angle is never planned twice.
#include <optional>
#include <string>
#include <vector>

namespace veer {

struct PolarSample {
    double alpha = 0.0;  ///< degrees
    double cl = 0.0;     ///< surface lift (time mean for unsteady points)
};

struct StallSearchRule {
    std::vector<double> requested;  ///< the angles the user asked for, any order
    int extra_steps = 5;            ///< cap of the extension on each side, in steps
    double resolution = 0.5;        ///< degrees: the largest gap left next to Cl max
};

enum class StallSearchState {
    searching,     ///< `angles` to run next
    bracketed,     ///< a lower Cl on each side within `resolution`: done
    capped,        ///< the cap stopped the extension with Cl still rising (or falling) at its end
    no_new_angle,  ///< the next angle was attempted already and failed: done, not bracketed
    too_few,       ///< fewer than two samples: nothing to bracket
};

struct StallSearchStep {
    StallSearchState state = StallSearchState::too_few;
    std::vector<double> angles;  ///< degrees, to run next (searching only)
    std::string why;             ///< for the polar's `added_for` column and the screen; no comma
};

/// The next step of the search. `attempted` holds every angle run so far (failed ones too).
StallSearchStep next_stall_search_step(const std::vector<PolarSample>& samples,
                                       const std::vector<double>& attempted,
                                       const StallSearchRule& rule);

/// Cl max of a polar with the uncertainty its angle spacing leaves.
struct StallBracket {
    double alpha_cl_max = 0.0, cl_max = 0.0;
    bool bracketed = false;  ///< a lower Cl at a smaller and at a larger angle
    /// Degrees: the wider of the two gaps next to the maximum (for a single-peaked lift curve
    /// the true maximum lies within it). Bracketed polars only.
    std::optional<double> alpha_uncertainty;
    /// How far above the sampled maximum the parabola through it and its two neighbours peaks
    /// (the sampled maximum can only underestimate). Bracketed polars only.
    std::optional<double> cl_uncertainty;
};

/// The bracket of a polar's samples (any order); nullopt without samples.
std::optional<StallBracket> stall_bracket(std::vector<PolarSample> samples);

/// The plain words of a state for the screen and summary.json, e.g. "bracketed".
std::string stall_search_words(StallSearchState state);

}  // namespace veer
