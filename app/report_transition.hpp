#pragma once
/// Transition on the report's pictures, from what the run or sweep wrote (summary.json of a run,
/// the points' records): the Cf picture of a run split into its laminar part (dashed) and its
/// turbulent part (solid) at each surface's transition, with the transition positions marked and
/// each laminar bubble drawn along Cf = 0; and the transition positions of a sweep against the
/// angle of attack.
#include <filesystem>
#include <vector>

#include "app/polar_figures.hpp"
#include "app/sweep_record.hpp"
#include "io/plot_chart.hpp"

namespace veer {

/// Rewrites a run's Cf chart whose series[0] is the upper and series[1] the lower surface, from
/// the run's summary.json; leaves it as it is when the file or its transition keys are missing
/// (a laminar run, or one from before the keys existed).
void mark_transition_on_cf(Chart& chart, const std::filesystem::path& summary);

/// Transition x/c of each surface and the upper surface's laminar bubble against alpha, with the
/// polar's separation-onset and Cl max angles marked, each series in a colour of its own. Throws
/// InputError when no point has a transition position (nothing to draw).
Chart transition_positions_chart(const std::vector<PointRecord>& points, const PolarFigures& f);

/// That chart, written to `file`.
void draw_transition_positions(const std::vector<PointRecord>& points, const PolarFigures& f,
                               const std::filesystem::path& file);

}  // namespace veer
