#pragma once
/// The files of a sweep folder built from its points: DIR/polar.csv (one row per point, in
/// increasing alpha) and DIR/summary.json (the figures of polar_figures.hpp).
#include <filesystem>
#include <vector>

#include "app/polar_figures.hpp"
#include "app/sweep_record.hpp"

namespace veer {

/// The columns of polar.csv, in order.
const std::vector<const char*>& polar_columns();

/// Writes DIR/polar.csv and DIR/summary.json (both through a temporary file). `missing` lists
/// the angles of the sweep that have no result yet (they are named in the summary);
/// `stall_search` how the sweep's stall search ended (summary.json; null when empty).
void write_polar_files(const std::filesystem::path& dir, std::vector<PointRecord> points,
                       const std::vector<double>& missing, const std::string& stall_search = {});

}  // namespace veer
