#pragma once
/// DIR/sweep.json: what a sweep folder was made for (the case file, the --set items, the angles
/// in run order and their folders), written when a sweep starts, so that its points can be
/// gathered into a polar later (veer sweep --gather, veer report).
#include <array>
#include <filesystem>
#include <optional>
#include <string>
#include <vector>

#include "app/sweep_record.hpp"

namespace veer {

/// An angle the sweep added to bracket stall (app/stall_search.hpp) and why.
struct AddedAngle {
    double alpha = 0.0;
    std::string why;
};

/// The grids of a sweep with error bars (app/sweep_coarser_grids.hpp), finest first.
struct ErrorBarGrids {
    double ratio = 0.0;              ///< the family's refinement ratio
    std::array<long, 3> cells = {};  ///< cells of the case's grid and of its two coarser members
};

struct SweepPlan {
    std::filesystem::path case_file;  ///< absolute
    std::vector<std::string> overrides;
    std::vector<double> angles;  ///< run order
    long steady_steps = 0;
    double unsteady_time = 0.0;
    int ranks = 1;
    std::vector<AddedAngle> added;            ///< the stall search's angles, in run order
    std::string stall_search;                 ///< how the stall search ended; empty while it runs
    std::optional<ErrorBarGrids> error_bars;  ///< --error-bars: the three grids
};

/// The plan file of a sweep folder.
std::filesystem::path plan_path(const std::filesystem::path& sweep_dir);

void write_sweep_plan(const std::filesystem::path& sweep_dir, const SweepPlan& plan);

/// Reads DIR/sweep.json; nullopt when the folder has none (not a sweep folder). Throws
/// InputError naming the file when it is damaged.
std::optional<SweepPlan> read_sweep_plan(const std::filesystem::path& sweep_dir);

/// The requested angles, then the added ones.
std::vector<double> all_angles(const SweepPlan& plan);

/// The records found in the point folders of a plan (added angles with their `added_for`) (without
/// checking their case text) and the angles that have none.
struct GatheredPoints {
    std::vector<PointRecord> records;
    std::vector<double> missing;
};
GatheredPoints gather_point_records(const std::filesystem::path& sweep_dir, const SweepPlan& plan);

}  // namespace veer
