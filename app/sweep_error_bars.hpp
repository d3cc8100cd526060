#pragma once
/// Per-point error bars of a sweep (`veer sweep --error-bars`, app/SWEEPS.md
/// "Error bars"): each angle also runs on the two coarser members of the case's
/// grid family (app/grid_family.hpp), in DIR/grid_coarser_1/ and
/// DIR/grid_coarser_2/, and the Cl and Cd of the three grids get the grid
/// convergence index of postprocess/grid_convergence.hpp (Celik et al. 2008).
#include <array>
#include <filesystem>
#include <nlohmann/json.hpp>
#include <optional>
#include <vector>

#include "app/sweep_coarser_grids.hpp"
#include "app/sweep_record.hpp"

namespace veer {

/// Gives each record with results on all three grids its `cl_grid` and
/// `cd_grid`, from the records in the coarser folders at the same angle (failed
/// ones left out).
void attach_grid_errors(const std::filesystem::path& sweep_dir, const ErrorBarGrids& grids,
                        std::vector<PointRecord>& records);

}  // namespace veer
