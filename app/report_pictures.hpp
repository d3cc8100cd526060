#pragma once
/// The pictures of a report, drawn by veer itself (io/plot_*.hpp) from the files of a run folder
/// (history.csv, surface.csv, the last frame of fields.pvd) or from the points of a sweep.
#include <filesystem>
#include <string>
#include <vector>

#include "app/polar_figures.hpp"
#include "app/sweep_record.hpp"

namespace veer {

/// A picture on the report page: its file relative to the report's folder and its caption.
struct ReportPicture {
    std::string file;
    std::string caption;
};

/// What a report could not draw, and why (a missing or unreadable input file).
struct PictureSet {
    std::vector<ReportPicture> pictures;
    std::vector<std::string> skipped;
};

/// Convergence history, Cp, Cf and the flow picture of the run in `run_dir`, written into
/// `report_dir / "pictures"` with names starting with `prefix`; files are named relative to
/// `report_dir`.
PictureSet draw_run_pictures(const std::filesystem::path& run_dir,
                             const std::filesystem::path& report_dir, const std::string& prefix,
                             const std::string& title);

/// Cl-alpha, Cl-Cd and Cm-alpha polars with the separation-onset and stall angles marked, and
/// Cp and Cf of every point together, for a sweep folder.
PictureSet draw_sweep_pictures(const std::filesystem::path& sweep_dir,
                               const std::vector<PointRecord>& points, const PolarFigures& f);

}  // namespace veer
