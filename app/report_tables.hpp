#pragma once
/// The tables of the report page in a reader's words: the study (section, Re, angles, model,
/// grid, far field), a run's results and a sweep's figures with labels and units
/// (app/reader_labels.hpp), the polar, and the section's placement. No raw JSON key or object
/// reaches the page.
#include <filesystem>
#include <nlohmann/json.hpp>
#include <optional>
#include <vector>

#include "app/report_html.hpp"
#include "app/sweep_record.hpp"

namespace veer {

/// The study of a run or sweep folder from its stamped case text (io/output_dir.hpp); `angles`:
/// a sweep's angles (nullptr for a run). Nullopt when the folder has no stamp.
std::optional<ReportSection> study_section(const std::filesystem::path& dir,
                                           const std::vector<double>* angles);

/// A run's summary.json as labelled rows (the routes with their contour distances).
ReportTable run_results_table(const nlohmann::json& summary);

/// A sweep's summary.json as labelled rows.
ReportTable sweep_figures_table(const nlohmann::json& summary);

/// One row per point, headers with units, Cl saying what it is.
ReportTable polar_points_table(const std::vector<PointRecord>& points);

/// section.json's figures (not its notes) as labelled rows.
ReportTable placement_table(const nlohmann::json& placement);

}  // namespace veer
