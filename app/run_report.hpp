#pragma once
/// What a finished run leaves in its folder beside the fields and checkpoint: summary.json,
/// surface.csv, wake.csv, surface.vtp, and the closing table on stdout.
#include <nlohmann/json.hpp>
#include <optional>
#include <vector>

#include "app/control_volume_history.hpp"
#include "app/simulation.hpp"
#include "postprocess/run_analysis.hpp"

namespace veer {

/// What a time-accurate run is read by: the shedding statistics of its force history (the
/// last whole cycles of the lift, postprocess/time_average.hpp) and the control-volume route's
/// time means over the same cycles (when sampled through the whole window).
struct UnsteadyFigures {
    std::optional<SheddingStatistics> shedding;
    std::optional<std::vector<RouteMean>> routes;
};

/// The last whole cycles a run's time averages use.
inline constexpr int summary_cycles = 5;

/// The unsteady figures of a run from its force history and, if given, its sampled route.
UnsteadyFigures unsteady_figures(const Simulation& sim, const ControlVolumeHistory* routes);

/// The post-processing (postprocess/run_analysis.hpp) of the solver's current fields at the
/// case's [post] places (needs a C-grid or the circle's O-grid).
RunAnalysis analyse_run(const Simulation& sim);

/// The summary.json object of a run (`unsteady` for time-accurate runs).
nlohmann::json summary_json(const Simulation& sim, const RunResult& result, const RunAnalysis& a,
                            const UnsteadyFigures* unsteady = nullptr);

/// Whether write_run_report prints the closing table (a quiet sweep keeps to one line a point).
enum class ClosingTable { print, omit };

/// Writes the run's report files into its folder and, unless told not to, prints the closing
/// table; returns the analysis they were made from (none on grids without a section).
/// `routes`: the control-volume route sampled during a time-accurate run, if it was.
std::optional<RunAnalysis> write_run_report(const Simulation& sim, const RunResult& result,
                                            ClosingTable table = ClosingTable::print,
                                            const ControlVolumeHistory* routes = nullptr);

}  // namespace veer
