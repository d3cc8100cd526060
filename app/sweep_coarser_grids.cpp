// The coarser grids of a sweep with error bars (app/sweep_coarser_grids.hpp).
#include "app/sweep_coarser_grids.hpp"

#include <fmt/format.h>

#include <algorithm>

#include "app/grid_family.hpp"
#include "app/sweep_block.hpp"
#include "io/case_file.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace fs = std::filesystem;

fs::path coarser_grid_folder(const fs::path& sweep_dir, int level) {
    return sweep_dir / ("grid_coarser_" + std::to_string(level));
}

CoarserGrids coarser_grids(const SweepCase& sweep, const CaseSpec& base, long fine_cells,
                           double ratio) {
    CoarserGrids c{{sweep, sweep}, {}, {ratio, {fine_cells, 0, 0}}};
    for (int level = 1; level <= 2; ++level) {
        SweepCase& member = c.cases[static_cast<std::size_t>(level - 1)];
        for (const std::string& item : coarser_grid_overrides(base, ratio, level))
            member.overrides.push_back(item);
        MeshBuild& mesh = c.meshes[static_cast<std::size_t>(level - 1)];
        mesh = build_mesh(parse_case_source(member.source, member.overrides));
        c.grids.cells[static_cast<std::size_t>(level)] =
            static_cast<long>(mesh.grid.ni()) * mesh.grid.nj();
    }
    return c;
}

bool run_coarser_grids(const SweepOptions& o, const CoarserGrids& coarser,
                       std::vector<double> angles, const SweepRanks& ranks) {
    // In sweep order, so that each point starts from its neighbour's fields.
    std::sort(angles.begin(), angles.end());
    if (o.down) std::reverse(angles.begin(), angles.end());
    for (int level = 1; level <= 2; ++level) {
        const std::size_t m = static_cast<std::size_t>(level - 1);
        SweepOptions member = o;
        member.out_dir = coarser_grid_folder(o.out_dir, level);
        if (ranks.is_root()) {
            fs::create_directories(member.out_dir);
            fmt::print(
                "error bars: the {} points again on coarser grid {} of 2 ({} cells against "
                "{}, ratio {:.3g}) in {}\n",
                angles.size(), level, coarser.grids.cells[m + 1], coarser.grids.cells[0],
                coarser.grids.ratio, member.out_dir.string());
            std::fflush(stdout);
        }
        ranks.barrier();
        const BlockResult b =
            run_block(member, coarser.cases[m], angles, block_indices(angles.size(), ranks),
                      coarser.meshes[m].grid);
        if (ranks.any(b.interrupted)) return true;
    }
    return false;
}

}  // namespace veer
