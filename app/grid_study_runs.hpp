#pragma once
/// The runs of a grid study, one sub-folder per grid: a finished run (a converged summary.json
/// under the same case text) is read back, not recomputed; a run with a checkpoint under the same
/// case text continues from it; otherwise the grid is run afresh through `veer run`'s own path
/// (so the folder rules, --force included, are the same).
#include <filesystem>
#include <map>
#include <optional>
#include <string>

#include "app/commands.hpp"
#include "app/grid_study_plan.hpp"

namespace veer {

/// How a grid's result was obtained.
enum class RunOrigin { computed, reused, restarted };

const char* origin_words(RunOrigin origin);

/// One grid's run and what the study reads from it.
struct StudyRun {
    StudyGrid grid;
    std::filesystem::path dir;
    RunOrigin origin = RunOrigin::computed;
    long cells = 0;
    double spacing = 0.0;  ///< h = sqrt(sum of cell areas / cells), Celik et al. 2008 step 1
    /// What the study reads from the run's summary.json: its numeric entries by key, and whether
    /// it converged. (Not the JSON document itself: its destructor may allocate, which would make
    /// this struct's implicit noexcept move and destructor able to throw.)
    std::map<std::string, double> numbers;
    bool converged_run = false;
    bool converged() const { return converged_run; }
    std::optional<double> number(const std::string& key) const;
};

/// Runs (or reuses) `grid` of the case `input` in `dir`. Throws InputError when the run diverged
/// or left no summary (naming the folder), or was interrupted.
StudyRun run_study_grid(const CaseOptions& input, const StudyGrid& grid,
                        const std::filesystem::path& dir, bool force, bool quiet);

}  // namespace veer
