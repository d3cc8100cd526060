#include "app/grid_study_runs.hpp"

#include <fmt/format.h>

#include <nlohmann/json.hpp>

#include "app/mesh_pipeline.hpp"
#include "io/case_file.hpp"
#include "io/json_writer.hpp"
#include "io/output_dir.hpp"
#include "mesh/errors.hpp"
#include "mesh/grid_metrics.hpp"
#include "postprocess/grid_convergence.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

/// `veer run`'s exit statuses (app/run_command.cpp).
constexpr int run_interrupted = 130;
constexpr int run_diverged = 4;

bool has_converged_summary(const fs::path& dir) {
    std::error_code ec;
    if (!fs::exists(dir / "summary.json", ec)) return false;
    return read_json_file(dir / "summary.json").value("converged", false);
}

}  // namespace

std::optional<double> StudyRun::number(const std::string& key) const {
    const auto it = numbers.find(key);
    if (it == numbers.end()) return std::nullopt;
    return it->second;
}

const char* origin_words(RunOrigin origin) {
    switch (origin) {
        case RunOrigin::computed:
            return "computed";
        case RunOrigin::reused:
            return "finished run reused";
        case RunOrigin::restarted:
            return "continued from its checkpoint";
    }
    return "";
}

StudyRun run_study_grid(const CaseOptions& input, const StudyGrid& grid, const fs::path& dir,
                        bool force, bool quiet) {
    CaseOptions level = input;
    level.overrides.insert(level.overrides.end(), grid.overrides.begin(), grid.overrides.end());
    const CaseSpec spec = read_case_file(level.case_file, level.overrides);
    StudyRun run;
    run.grid = grid;
    run.dir = dir;
    const MeshBuild mesh = build_mesh(spec);
    const GridMetrics metrics = compute_metrics(mesh.grid);
    run.cells = static_cast<long>(metrics.volume.size());
    run.spacing = representative_spacing(metrics.volume);

    std::error_code ec;
    const std::optional<std::string> stamp = stamped_case_text(dir);
    const bool same_case = stamp && *stamp == spec.text;
    fmt::print("grid study: {} grid, {} x {} (wake {}), {} cells\n", grid.name, grid.around,
               grid.normal, grid.wake, run.cells);
    int status = 0;
    if (same_case && has_converged_summary(dir)) {
        run.origin = RunOrigin::reused;
    } else if (same_case && fs::exists(dir / "checkpoint.h5", ec)) {
        run.origin = RunOrigin::restarted;
        RunOptions r;
        r.restart = dir / "checkpoint.h5";
        r.quiet = quiet;
        status = run_run_command(r);
    } else {
        RunOptions r;
        r.input = level;
        r.out_dir = dir;
        r.force = force;
        r.quiet = quiet;
        status = run_run_command(r);
    }
    if (status == run_interrupted)
        throw InputError(
            fmt::format("grid study interrupted in {}; run the same command again "
                        "to continue from its checkpoint",
                        dir.string()));
    if (status == run_diverged || !fs::exists(dir / "summary.json", ec))
        throw InputError(fmt::format(
            "grid study: the {} grid's run in {} diverged or left no summary.json; see its "
            "history.csv, and try a smaller refinement ratio or a finer case grid",
            grid.name, dir.string()));
    const nlohmann::json summary = read_json_file(dir / "summary.json");
    for (const auto& [key, value] : summary.items())
        if (value.is_number()) run.numbers[key] = value.get<double>();
    run.converged_run = summary.value("converged", false);
    fmt::print("grid study: {} grid {}\n", grid.name, origin_words(run.origin));
    return run;
}

}  // namespace veer
