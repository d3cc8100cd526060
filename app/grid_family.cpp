#include "app/grid_family.hpp"

#include <fmt/format.h>

#include <cmath>

#include "mesh/errors.hpp"

namespace veer {
namespace {

/// `count` / factor rounded (to an even number when `even`), refused below `least`.
int coarser_count(int count, double factor, int least, bool even, const char* key, double ratio) {
    const double wanted = count / factor;
    const int n = even ? 2 * static_cast<int>(std::lround(wanted / 2.0))
                       : static_cast<int>(std::lround(wanted));
    if (n < least)
        throw InputError(fmt::format(
            "grid family with ratio {:g}: mesh.{} = {} becomes {} on the coarsest member, below "
            "the least allowed {}; refine the case's grid or choose a smaller ratio (at least "
            "{:g})",
            ratio, key, count, n, least, least_family_ratio));
    return n;
}

}  // namespace

std::vector<std::string> coarser_grid_overrides(const CaseSpec& fine, double ratio, int level) {
    if (!(ratio >= least_family_ratio) || !std::isfinite(ratio))
        throw InputError(
            fmt::format("grid family ratio {:g}: allowed at least {:g} (Celik et al. "
                        "2008) and finite",
                        ratio, least_family_ratio));
    if (level <= 0) return {};
    const double factor = std::pow(ratio, level);
    const CGridSpec& m = fine.mesh;
    std::vector<std::string> set = {
        fmt::format("mesh.around={}", coarser_count(m.around, factor, 16, true, "around", ratio)),
        fmt::format("mesh.normal={}", coarser_count(m.normal, factor, 4, false, "normal", ratio))};
    if (!fine.geometry.circle)  // an O-grid has no wake cut
        set.push_back(
            fmt::format("mesh.wake={}", coarser_count(m.wake, factor, 2, false, "wake", ratio)));
    if (fine.y_plus)
        set.push_back(fmt::format("mesh.y_plus={:.10g}", *fine.y_plus * factor));
    else
        set.push_back(fmt::format("mesh.first_cell={:.10g}", m.first_cell * factor));
    return set;
}

}  // namespace veer
