#pragma once
/// One point of a sweep: a steady run in DIR/alpha_+04.00/, started from the previous point's
/// fields; when it does not settle (the step cap is reached without convergence) it continues
/// time-accurately from the steady fields in DIR/alpha_+04.00/unsteady/ and is reported with
/// averages over whole cycles of the lift.
#include <filesystem>
#include <optional>
#include <string>
#include <vector>

#include "app/bounded_cycle.hpp"
#include "app/residual_plateau.hpp"
#include "app/sweep_record.hpp"
#include "io/case_file.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// What every point of a sweep shares.
struct SweepCase {
    CaseSource source;                   ///< the case file, read once (read_case_source)
    std::vector<std::string> overrides;  ///< the user's --set items
    long steady_steps = 0;               ///< > 0: the step cap of the steady attempt
    double unsteady_time = 0.0;          ///< > 0: the end time of a time-accurate point
    bool progress = true;
    /// When a steady attempt counts as stalled and goes time-accurate before its step cap
    /// (force_tolerance is taken from the case); window 0: only at the step cap.
    PlateauCriteria plateau = {};
    /// > 0: a converged point whose upper surface has separated is disturbed and run
    /// time-accurately for this long (chords / free-stream speed) to see whether the flow keeps
    /// it (app/sweep_stability.hpp); 0: no check.
    double stability_time = 0.0;
    /// A steady attempt that reaches its cap or stalls is reported as the mean of a bounded
    /// cycle when its forces circle inside this band (app/bounded_cycle.hpp); window 0: never,
    /// it goes time-accurate.
    BoundedCycleCriteria cycle = {0};
};

/// The overrides of the steady attempt at `alpha` (the user's, then the sweep's).
std::vector<std::string> point_overrides(const SweepCase& sweep, double alpha);

/// The case of the steady attempt at `alpha`; its text identifies a finished point.
CaseSpec point_case(const SweepCase& sweep, double alpha);

/// How a point ended.
struct PointOutcome {
    std::optional<PointRecord> record;  ///< none when interrupted
    std::optional<FlowFields> fields;   ///< the final fields, to start the next point from
    bool interrupted = false;
};

/// Runs the point at `alpha`, whose case is `spec` (point_case), on `grid` in
/// `sweep_dir / point_folder_name(alpha)`, from `start` (the free stream when null); writes the
/// normal run outputs and the point record. The point keeps its case and results in memory: no
/// file is read back.
PointOutcome run_sweep_point(const SweepCase& sweep, double alpha, const CaseSpec& spec,
                             const StructuredGrid& grid, const std::filesystem::path& sweep_dir,
                             const FlowFields* start, const std::string& label);

/// The final fields of a finished point, read back from its checkpoint (to continue a sweep
/// after an interruption); nullopt when they cannot be read on `grid`.
std::optional<FlowFields> finished_point_fields(const std::filesystem::path& point_dir,
                                                const PointRecord& record,
                                                const StructuredGrid& grid);

}  // namespace veer
