#pragma once
/// The figures of a grid study: for Cl, Cd, Cm, each separation, reattachment and transition
/// position the run reports, the three values and their grid convergence (the procedure of Celik
/// et al. 2008 in postprocess/grid_convergence.hpp), and the change when the far field is twice
/// as far (a separate uncertainty component). Written as grid_study.json and as a table.
#include <nlohmann/json.hpp>
#include <optional>
#include <string>
#include <vector>

#include "app/grid_study_runs.hpp"
#include "postprocess/grid_convergence.hpp"

namespace veer {

/// One figure across the grids.
struct StudyFigure {
    std::string key;                             ///< summary.json key, e.g. "cl"
    std::string label;                           ///< what a reader is shown
    std::vector<std::optional<double>> values;   ///< fine, medium, coarse (absent: not found there)
    std::optional<GridConvergence> convergence;  ///< when all three grids give a value
    std::optional<double> far_boundary_value;    ///< on the fine grid with the far field doubled
    /// far_boundary_value - fine value, when both exist.
    std::optional<double> far_boundary_change() const;
};

/// The whole study.
struct GridStudyResult {
    GridStudyPlan plan;
    std::vector<StudyRun> runs;  ///< fine, medium, coarse
    std::optional<StudyRun> far_boundary;
    std::vector<StudyFigure> figures;
};

/// The figures of the runs (those absent on every grid are left out).
std::vector<StudyFigure> study_figures(const std::vector<StudyRun>& runs,
                                       const std::optional<StudyRun>& far_boundary);

/// grid_study.json.
nlohmann::json grid_study_json(const GridStudyResult& r);

/// The table on screen.
void print_grid_study_table(const GridStudyResult& r);

}  // namespace veer
