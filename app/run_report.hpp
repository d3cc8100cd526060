#pragma once
/// What a finished run leaves in its folder beside the fields and checkpoint: summary.json,
/// surface.csv, wake.csv, surface.vtp, and the closing table on stdout.
#include <nlohmann/json.hpp>
#include <vector>

#include "app/simulation.hpp"
#include "postprocess/circulation.hpp"
#include "postprocess/control_volume.hpp"
#include "postprocess/kutta_check.hpp"
#include "postprocess/separation.hpp"
#include "postprocess/surface_distribution.hpp"
#include "postprocess/surface_forces.hpp"
#include "postprocess/wake_profiles.hpp"

namespace veer {

/// The post-processing of a run's final fields.
struct RunAnalysis {
    SurfaceForces forces;
    SurfaceDistribution surface;
    SeparationReport separation;
    KuttaCheck kutta;
    std::vector<ContourForces> momentum;          ///< one per [post] contours distance
    std::vector<ContourCirculation> circulation;  ///< the same contours
    std::vector<WakeProfile> wake;                ///< one per [post] wake_stations
};

/// Runs the post-processing on the solver's current fields (needs a C-grid).
RunAnalysis analyse_run(const Simulation& sim);

/// The summary.json object of a run.
nlohmann::json summary_json(const Simulation& sim, const RunResult& result, const RunAnalysis& a);

/// Whether write_run_report prints the closing table (a quiet sweep keeps to one line a point).
enum class ClosingTable { print, omit };

/// Writes the run's report files into its folder and, unless told not to, prints the closing
/// table.
void write_run_report(const Simulation& sim, const RunResult& result,
                      ClosingTable table = ClosingTable::print);

}  // namespace veer
