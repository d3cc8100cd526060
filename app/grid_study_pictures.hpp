#pragma once
/// A picture of each figure of a grid study against the grid spacing h: the three grids, the
/// extrapolated value at h = 0 with its band (GCI), and the far-boundary run when there is one.
#include <filesystem>
#include <nlohmann/json.hpp>

#include "app/report_pictures.hpp"

namespace veer {

/// Draws the pictures of `study` (grid_study.json read back) into `dir / "pictures"`; file names
/// are relative to `dir`.
PictureSet draw_grid_study_pictures(const std::filesystem::path& dir, const nlohmann::json& study);

}  // namespace veer
