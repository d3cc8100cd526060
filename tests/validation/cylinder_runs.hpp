#pragma once
/// Runs of the shipped circular-cylinder case (cases/cylinder-shedding.toml) for the validation
/// tests: the case read as a user's `veer run` reads it, with `--set` style overrides for the
/// grid, the time step or the Reynolds number, and the figures a user reads off summary.json.
#include <gtest/gtest.h>
#include <unistd.h>

#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <map>
#include <optional>
#include <sstream>
#include <string>
#include <vector>

#include "app/control_volume_history.hpp"
#include "app/mesh_pipeline.hpp"
#include "app/run_report.hpp"
#include "app/simulation.hpp"
#include "io/case_file.hpp"
#include "tests/reference_table.hpp"

namespace veer::test {

/// A repository file (tests own their data: nothing outside the clone is read).
inline std::filesystem::path repository_file(const std::string& relative) {
    return std::filesystem::path(VEER_SOURCE_DIR) / relative;
}

/// The [low, high] bands of a `quantity,low,high,mark` file in tests/reference/, read with the
/// shared reader (tests/reference_table.hpp): a missing file, a malformed row or a row count other
/// than `rows` throws, and the test fails. Prints how many bands it read; expect_in_band compares.
inline std::map<std::string, std::pair<double, double>> read_bands(const std::string& file,
                                                                   std::size_t rows) {
    const ReferenceTable t = ReferenceTable::read(file, rows);
    std::map<std::string, std::pair<double, double>> bands;
    for (std::size_t r = 0; r < t.rows(); ++r)
        bands[t.text(r, "quantity")] = {t.number(r, "low"), t.number(r, "high")};
    std::printf("read %zu bands of %s\n", bands.size(), file.c_str());
    return bands;
}

inline void expect_in_band(const std::map<std::string, std::pair<double, double>>& bands,
                           const std::string& quantity, double value) {
    const auto it = bands.find(quantity);
    ASSERT_NE(it, bands.end()) << "no band for " << quantity;
    EXPECT_GE(value, it->second.first) << quantity;
    EXPECT_LE(value, it->second.second) << quantity;
}

/// What one cylinder run gives: its final analysis and, when time-accurate, the shedding
/// statistics and the control-volume route's means over the same cycles.
struct CylinderRun {
    RunResult result;
    RunAnalysis analysis;
    UnsteadyFigures unsteady;
};

/// The shipped case with `overrides` (e.g. "mesh.around=96"), run in a scratch folder.
inline CylinderRun run_cylinder(const std::vector<std::string>& overrides,
                                const std::string& label) {
    const std::filesystem::path dir = std::filesystem::temp_directory_path() /
                                      ("veer_cylinder_" + label + "_" + std::to_string(::getpid()));
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    const CaseSpec spec =
        read_case_file(repository_file("cases/cylinder-shedding.toml"), overrides);
    StructuredGrid grid = build_mesh(spec).grid;
    const bool unsteady = spec.run.mode == TimeMode::time_accurate;
    std::optional<ControlVolumeHistory> routes;
    const Simulation* running = nullptr;
    SimulationOptions o;
    o.progress = false;
    if (unsteady) {
        routes.emplace(grid, spec.post.contours);
        o.stop_early = [&routes, &running](const StepReport& step, double, const SurfaceForces&) {
            if (running) routes->after_step(*running, step.step, step.time);
            return false;
        };
    }
    CylinderRun out;
    {
        Simulation sim(spec, std::move(grid), dir, o);
        running = &sim;
        out.result = sim.run();
        out.analysis = analyse_run(sim);
        if (unsteady) out.unsteady = unsteady_figures(sim, &*routes);
    }
    std::filesystem::remove_all(dir);
    return out;
}

/// Overrides of the shipped grid refined by (1/sqrt 2)^level: around and normal divided, the
/// first cell multiplied, the far field kept (level 0 is the shipped 192 x 144 grid).
inline std::vector<std::string> grid_level(int level) {
    const int around[] = {192, 136, 96};
    const int normal[] = {144, 102, 72};
    const double first_cell = 3.333e-3 * std::pow(std::sqrt(2.0), level);
    return {"mesh.around=" + std::to_string(around[level]),
            "mesh.normal=" + std::to_string(normal[level]),
            "mesh.first_cell=" + std::to_string(first_cell)};
}

}  // namespace veer::test
