#pragma once
/// DIR/sweep.json: what a sweep folder was made for (the case file, the --set items, the angles
/// in run order and their folders), written when a sweep starts, so that its points can be
/// gathered into a polar later (veer sweep --gather, veer report).
#include <filesystem>
#include <optional>
#include <string>
#include <vector>

#include "app/sweep_record.hpp"

namespace veer {

struct SweepPlan {
    std::filesystem::path case_file;  ///< absolute
    std::vector<std::string> overrides;
    std::vector<double> angles;  ///< run order
    long steady_steps = 0;
    double unsteady_time = 0.0;
    int ranks = 1;
};

/// The plan file of a sweep folder.
std::filesystem::path plan_path(const std::filesystem::path& sweep_dir);

void write_sweep_plan(const std::filesystem::path& sweep_dir, const SweepPlan& plan);

/// Reads DIR/sweep.json; nullopt when the folder has none (not a sweep folder). Throws
/// InputError naming the file when it is damaged.
std::optional<SweepPlan> read_sweep_plan(const std::filesystem::path& sweep_dir);

/// The records found in the point folders of a plan (without checking their case text) and the
/// angles that have none.
struct GatheredPoints {
    std::vector<PointRecord> records;
    std::vector<double> missing;
};
GatheredPoints gather_point_records(const std::filesystem::path& sweep_dir, const SweepPlan& plan);

}  // namespace veer
