#include "app/sweep_error_bars.hpp"

#include <cmath>

#include "app/sweep_angles.hpp"
#include "mesh/errors.hpp"
#include "postprocess/grid_convergence.hpp"

namespace veer {
namespace fs = std::filesystem;
namespace {

/// The records of a coarser folder, by folder name.
std::optional<PointRecord> coarser_record(const fs::path& sweep_dir, int level, double alpha) {
    std::optional<PointRecord> r =
        read_point_record(coarser_grid_folder(sweep_dir, level) / point_folder_name(alpha));
    if (r && (r->regime == "failed" || !std::isfinite(r->cl) || !std::isfinite(r->cd)))
        return std::nullopt;
    return r;
}

FigureGridError figure_error(const std::array<double, 3>& spacing,
                             const std::array<double, 3>& values) {
    const GridConvergence g = grid_convergence(spacing, values);
    return {{values[1], values[2]}, g.order, g.band, g.gci_fine, verdict_name(g.verdict)};
}

}  // namespace

void attach_grid_errors(const fs::path& sweep_dir, const ErrorBarGrids& grids,
                        std::vector<PointRecord>& records) {
    // Representative spacing h = sqrt(area / N) (Celik et al. 2008, step 1): the
    // far field is the same on the three grids, so the area cancels in the
    // ratios.
    std::array<double, 3> h{};
    for (std::size_t k = 0; k < 3; ++k) h[k] = 1.0 / std::sqrt(static_cast<double>(grids.cells[k]));
    for (PointRecord& r : records) {
        if (r.regime == "failed") continue;
        const auto medium = coarser_record(sweep_dir, 1, r.alpha);
        const auto coarse = coarser_record(sweep_dir, 2, r.alpha);
        if (!medium || !coarse) continue;
        r.cl_grid = figure_error(h, {r.cl, medium->cl, coarse->cl});
        r.cd_grid = figure_error(h, {r.cd, medium->cd, coarse->cd});
    }
}

}  // namespace veer
