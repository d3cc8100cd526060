#pragma once
/// The figures of a polar (DIR/summary.json of a sweep), from its points.
///
/// - Lift slope (per degree) and zero-lift angle: a least-squares line cl = a alpha + b over
///   the linear range. The range starts at the point of lowest |alpha| and grows one neighbour
///   at a time (the neighbour of smaller |alpha| tried first, then the other) while every point
///   of the range stays within 2 % of the range's largest |cl| of the fitted line. Only points
///   in the steady regime take part; null with fewer than two.
/// - cl_max and its angle: the largest cl over all points with a result.
/// - Separation onset: in increasing alpha, the first point whose upper-surface flow leaves
///   the wall for good ahead of 0.95 chord, or which shows a closed bubble on the upper surface
///   starting ahead of 0.95 chord; null if none.
/// - cd_min: the smallest cd; max_lift_disagreement: the largest |cl - cl_momentum|.
#include <optional>
#include <vector>

#include "app/stall_search.hpp"
#include "app/sweep_record.hpp"

namespace veer {

struct LinearRange {
    double slope_per_deg = 0.0;
    double intercept = 0.0;  ///< cl at alpha = 0
    double alpha_min = 0.0, alpha_max = 0.0;
    int points = 0;
};

struct PolarFigures {
    std::optional<LinearRange> linear;
    std::optional<double> alpha_zero_lift;
    std::optional<double> cl_max, alpha_cl_max;
    bool stall_in_range = false;  ///< cl falls again at a higher angle than alpha_cl_max
    /// Cl max with the uncertainty its angle spacing leaves (app/stall_search.hpp).
    std::optional<StallBracket> stall;
    std::optional<double> alpha_separation_onset;
    std::optional<double> cd_min, alpha_cd_min;
    std::optional<double> max_lift_disagreement;
};

/// The linear range of (alpha, cl) points (any order); nullopt with fewer than two points.
std::optional<LinearRange> linear_lift_range(std::vector<double> alpha, std::vector<double> cl);

/// Whether a point shows upper-surface separation by the onset rule above.
bool shows_upper_separation(const PointRecord& r);

/// All figures of a set of points (any order; failed points are left out).
PolarFigures polar_figures(const std::vector<PointRecord>& points);

}  // namespace veer
