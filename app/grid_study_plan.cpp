#include "app/grid_study_plan.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>

#include "mesh/cgrid.hpp"
#include "mesh/errors.hpp"
#include "mesh/wall_spacing.hpp"

namespace veer {
namespace {

/// Cell counts a multiple of this (two multigrid coarsenings at least).
constexpr int count_multiple = 4;
/// The case reader's largest far field, chords (io/case_file.cpp).
constexpr double largest_far_field = 1000.0;

int rounded_count(double n, int least) {
    const int m = static_cast<int>(std::lround(n / count_multiple)) * count_multiple;
    return std::max(m, least);
}

/// The grid `coarsening` times coarser than the case's own (negative: finer).
StudyGrid scaled_grid(const CaseSpec& spec, double ratio, int coarsening, std::string name,
                      bool scale_surface_slope) {
    const double s = std::pow(ratio, coarsening);
    StudyGrid g;
    g.name = std::move(name);
    g.around = rounded_count(spec.mesh.around / s, 16);
    g.normal = rounded_count(spec.mesh.normal / s, 4);
    g.wake = rounded_count(spec.mesh.wake / s, 4);
    g.far_field = spec.mesh.far_field;
    if (spec.y_plus)
        g.y_plus = *spec.y_plus * s;
    else
        g.first_cell = spec.mesh.first_cell * s;
    // The cap on the surface spacing's growth (d spacing / d arc length) scales with the cell
    // size: with one cap for all, it binds on the coarse members and not on the fine ones, and
    // the members' spacing distributions differ (mesh/surface_sampling.hpp).
    if (scale_surface_slope && coarsening != 0) g.surface_slope = spec.mesh.surface_slope * s;
    return g;
}

void write_overrides(StudyGrid& g) {
    g.overrides = {fmt::format("mesh.around={}", g.around), fmt::format("mesh.normal={}", g.normal),
                   fmt::format("mesh.wake={}", g.wake),
                   fmt::format("mesh.far_field={:.17g}", g.far_field)};
    if (g.surface_slope)
        g.overrides.push_back(fmt::format("mesh.surface_slope={:.17g}", *g.surface_slope));
    if (g.y_plus) g.overrides.push_back(fmt::format("mesh.y_plus={:.17g}", *g.y_plus));
    if (g.first_cell) g.overrides.push_back(fmt::format("mesh.first_cell={:.17g}", *g.first_cell));
}

/// The fine grid reaching twice as far: as many more wall-normal cells (and wake cells in
/// proportion) as keep its wall-normal growth ratio, so the grid near the section is unchanged.
StudyGrid doubled_far_field(const CaseSpec& spec, const StudyGrid& fine) {
    if (2.0 * fine.far_field > largest_far_field)
        throw InputError(fmt::format(
            "grid study: the far-boundary check doubles far_field = {:g} chords, beyond the "
            "largest allowed ({:g}); give far_field up to {:g} or leave out the check",
            fine.far_field, largest_far_field, largest_far_field / 2));
    CGridSpec mesh = spec.mesh;
    mesh.around = fine.around;
    mesh.normal = fine.normal;
    mesh.wake = fine.wake;
    mesh.first_cell =
        fine.y_plus ? first_cell_for_y_plus(*fine.y_plus, spec.flow.reynolds) : *fine.first_cell;
    const double growth = normal_growth_ratio(mesh);
    StudyGrid g = fine;
    g.name = "far-boundary";
    g.far_field = 2.0 * fine.far_field;
    const int needed = normal_cells_for_growth(mesh.first_cell, g.far_field, growth * (1 + 1e-12));
    g.normal = rounded_count(
        std::ceil(static_cast<double>(needed) / count_multiple) * count_multiple, fine.normal);
    g.wake = rounded_count(static_cast<double>(fine.wake) * g.normal / fine.normal, fine.wake);
    return g;
}

}  // namespace

GridStudyPlan plan_grid_study(const CaseSpec& spec, double ratio, CaseGridRole role,
                              bool far_boundary, bool scale_surface_slope) {
    if (!(ratio >= smallest_refinement_ratio && ratio <= 2.0))
        throw InputError(fmt::format(
            "grid study: refinement ratio {:g}; give a ratio from {:g} (Celik et al. 2008 "
            "recommend more than 1.3) to 2",
            ratio, smallest_refinement_ratio));
    if (spec.geometry.circle)
        throw InputError(
            "grid study: the circle case is not supported (its O-grid has no wake cut to refine "
            "with the C-grid rules); give a section case");
    GridStudyPlan plan;
    plan.ratio = ratio;
    plan.role = role;
    const int finest = role == CaseGridRole::finest ? 0 : -1;
    plan.grids = {scaled_grid(spec, ratio, finest, "fine", scale_surface_slope),
                  scaled_grid(spec, ratio, finest + 1, "medium", scale_surface_slope),
                  scaled_grid(spec, ratio, finest + 2, "coarse", scale_surface_slope)};
    if (far_boundary) plan.far_boundary = doubled_far_field(spec, plan.grids.front());
    for (StudyGrid& g : plan.grids) write_overrides(g);
    if (plan.far_boundary) write_overrides(*plan.far_boundary);
    const StudyGrid& coarse = plan.grids.back();
    if (coarse.around < 16 || coarse.normal < 4 || coarse.wake < 4 ||
        coarse.around == plan.grids[1].around || coarse.normal == plan.grids[1].normal)
        throw InputError(fmt::format(
            "grid study: the case's grid ({} around, {} normal, wake {}) is too small to coarsen "
            "twice by {:g} (coarse grid {} x {}, wake {}); give a finer case grid or "
            "--case-grid middle",
            spec.mesh.around, spec.mesh.normal, spec.mesh.wake, ratio, coarse.around, coarse.normal,
            coarse.wake));
    return plan;
}

}  // namespace veer
