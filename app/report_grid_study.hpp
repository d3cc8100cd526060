#pragma once
/// The report page of a grid-study folder (grid_study.json, app/grid_study_figures.hpp): the
/// grids, each figure's convergence and the far-boundary change, and the pictures against h.
#include <filesystem>

#include "app/report_html.hpp"

namespace veer {

/// Whether `dir` holds a grid study.
bool is_grid_study_folder(const std::filesystem::path& dir);

/// The page of the grid study in `dir` (draws its pictures into dir / "pictures").
ReportPage grid_study_page(const std::filesystem::path& dir);

}  // namespace veer
