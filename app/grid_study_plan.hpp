#pragma once
/// The grids of a grid study: three systematically refined versions of a case's own grid (one
/// constant ratio on around, normal, wake and the first-cell height or y+ target; far field
/// fixed; on request also the cap of the surface spacing's growth, so that every member has the
/// same surface spacing distribution), and optionally the finest grid with the far field twice
/// as far.
///
/// Cell counts are rounded to the nearest multiple of 4 (so the pressure multigrid keeps at least
/// three levels, solver/multigrid_coarsening.hpp: every coarsening halves ni, nj, wake and
/// around); the ratios actually used are reported from the cell areas (Celik et al. 2008, step 1)
/// and per dimension.
#include <optional>
#include <string>
#include <vector>

#include "io/case_spec.hpp"

namespace veer {

/// Which of the three grids the case's own grid is.
enum class CaseGridRole { finest, middle };

/// One grid of the study and the case overrides that make it.
struct StudyGrid {
    std::string name;  ///< "fine", "medium", "coarse" or "far-boundary"; also its folder
    int around = 0;
    int normal = 0;
    int wake = 0;
    double far_field = 0.0;
    std::optional<double> first_cell;  ///< set when the case gives a first-cell height
    std::optional<double> y_plus;      ///< set when the case gives (or its model implies) y+
    /// The surface spacing's growth cap scaled with the cell size (when asked; never on the
    /// case's own grid).
    std::optional<double> surface_slope;
    std::vector<std::string> overrides;  ///< "mesh.key=value", after the user's own --set
};

struct GridStudyPlan {
    double ratio = 0.0;  ///< the refinement ratio asked for
    CaseGridRole role = CaseGridRole::finest;
    std::vector<StudyGrid> grids;           ///< fine, medium, coarse
    std::optional<StudyGrid> far_boundary;  ///< the fine grid with twice the far-field distance
};

/// Smallest refinement ratio the study accepts (Celik et al. 2008 recommend more than 1.3).
inline constexpr double smallest_refinement_ratio = 1.3;

/// The plan for `spec` (the case with the user's overrides). Throws InputError for a ratio below
/// smallest_refinement_ratio or above 2, for a circle case, for a grid the case reader would
/// refuse (fewer than 16 cells around, fewer than 4 normal) and for a far field that cannot be
/// doubled within the case reader's 1000 chords. `scale_surface_slope`: multiply the case's
/// `surface_slope` by the coarsening factor on the other grids (mesh/surface_sampling.hpp: with
/// one cap the members' surface spacing distributions differ).
GridStudyPlan plan_grid_study(const CaseSpec& spec, double ratio, CaseGridRole role,
                              bool far_boundary, bool scale_surface_slope = false);

}  // namespace veer
