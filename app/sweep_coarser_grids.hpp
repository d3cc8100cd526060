#pragma once
/// The coarser grids of a sweep with error bars (`veer sweep --error-bars`): the case's grid
/// and its two coarser family members (app/grid_family.hpp), each coarser member a sweep of its
/// own over the fine polar's angles in DIR/grid_coarser_1/ and DIR/grid_coarser_2/.
#include <array>
#include <filesystem>
#include <vector>

#include "app/commands.hpp"
#include "app/mesh_pipeline.hpp"
#include "app/sweep_plan.hpp"
#include "app/sweep_point.hpp"
#include "app/sweep_ranks.hpp"

namespace veer {

/// The folder of the sweep's points on the coarser member `level` (1 or 2).
std::filesystem::path coarser_grid_folder(const std::filesystem::path& sweep_dir, int level);

/// The two coarser members of the sweep's case: their cases (the sweep's --set items and the
/// family's) and meshes. Throws InputError when the family cannot be made.
struct CoarserGrids {
    std::array<SweepCase, 2> cases;
    std::array<MeshBuild, 2> meshes;
    ErrorBarGrids grids;
};
CoarserGrids coarser_grids(const SweepCase& sweep, const CaseSpec& base, long fine_cells,
                           double ratio);

/// Runs `angles` (all ranks pass the same) on both coarser members, spread over the ranks.
/// Returns true when interrupted.
bool run_coarser_grids(const SweepOptions& o, const CoarserGrids& coarser,
                       std::vector<double> angles, const SweepRanks& ranks);

}  // namespace veer
