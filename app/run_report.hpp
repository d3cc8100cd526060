#pragma once
/// What a finished run leaves in its folder beside the fields and checkpoint: summary.json,
/// surface.csv, wake.csv, surface.vtp, and the closing table on stdout.
#include <nlohmann/json.hpp>
#include <vector>

#include "app/control_volume_history.hpp"
#include "app/simulation.hpp"
#include "postprocess/circulation.hpp"
#include "postprocess/control_volume.hpp"
#include "postprocess/kutta_check.hpp"
#include "postprocess/separation.hpp"
#include "postprocess/surface_distribution.hpp"
#include "postprocess/surface_forces.hpp"
#include "postprocess/wake_profiles.hpp"

namespace veer {

/// What the circle is read by beside the figures of a section (diameters, degrees).
struct CircleFigures {
    /// First separation on each half, degrees from the rear point (mesh/circle.hpp).
    std::optional<double> separation_angle_upper;
    std::optional<double> separation_angle_lower;
    /// Reversed flow behind the rear point (postprocess/recirculation.hpp), diameters; steady
    /// runs only (an instant of a shedding wake has no such length).
    std::optional<double> recirculation_length;
    double base_cp = 0.0;  ///< Cp at the rear point, the mean of both halves' extrapolations
};

/// The post-processing of a run's final fields.
struct RunAnalysis {
    SurfaceForces forces;
    SurfaceDistribution surface;
    SeparationReport separation;
    KuttaCheck kutta;
    std::vector<ContourForces> momentum;          ///< one per [post] contours distance
    std::vector<ContourCirculation> circulation;  ///< the same contours
    std::vector<WakeProfile> wake;                ///< one per [post] wake_stations
    std::optional<CircleFigures> circle;          ///< set for [geometry] circle = true
};

/// What a time-accurate run is read by: the shedding statistics of its force history (the
/// last whole cycles of the lift, postprocess/time_average.hpp) and the control-volume route's
/// time means over the same cycles (when sampled through the whole window).
struct UnsteadyFigures {
    std::optional<SheddingStatistics> shedding;
    std::optional<std::vector<RouteMean>> routes;
};

/// The last whole cycles a run's time averages use.
inline constexpr int summary_cycles = 5;

/// The unsteady figures of a run from its history.csv and, if given, its sampled route.
UnsteadyFigures unsteady_figures(const Simulation& sim, const ControlVolumeHistory* routes);

/// Runs the post-processing on the solver's current fields (needs a C-grid).
RunAnalysis analyse_run(const Simulation& sim);

/// The summary.json object of a run (`unsteady` for time-accurate runs).
nlohmann::json summary_json(const Simulation& sim, const RunResult& result, const RunAnalysis& a,
                            const UnsteadyFigures* unsteady = nullptr);

/// Whether write_run_report prints the closing table (a quiet sweep keeps to one line a point).
enum class ClosingTable { print, omit };

/// Writes the run's report files into its folder and, unless told not to, prints the closing
/// table. `routes`: the control-volume route sampled during a time-accurate run, if it was.
void write_run_report(const Simulation& sim, const RunResult& result,
                      ClosingTable table = ClosingTable::print,
                      const ControlVolumeHistory* routes = nullptr);

}  // namespace veer
