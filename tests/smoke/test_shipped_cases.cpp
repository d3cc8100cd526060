// Every shipped case (cases/*.toml, found by listing the folder, so a new case is picked up):
// `veer check`, `veer mesh` and a `veer run` of a few steps, each as the command line runs it,
// and what each leaves behind. Then the y+ a converged run reaches against the y+ its case asks
// for, read from the run's surface.csv.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <filesystem>
#include <iostream>
#include <string>
#include <vector>

#include "../unit/app/app_test_support.hpp"
#include "app/commands.hpp"
#include "app/report_csv.hpp"
#include "io/case_file.hpp"
#include "io/json_writer.hpp"
#include "shipped_cases.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

using test::shipped_cases;

TEST(ShippedCases, EachChecksMeshesAndRunsAFewSteps) {
    const std::vector<fs::path> cases = shipped_cases();
    // The README's table lists five; more is fine (they are picked up), none is a broken tree.
    ASSERT_GE(cases.size(), 5u) << "cases/ holds " << cases.size() << " case files";
    test::AppScratch tmp;
    for (const fs::path& c : cases) {
        const std::string name = c.stem().string();
        SCOPED_TRACE(name);
        EXPECT_EQ(run_check_command({c, {}}), 0);
        MeshOptions mesh;
        mesh.input.case_file = c;
        mesh.out_dir = tmp / (name + "_mesh");
        ASSERT_EQ(run_mesh_command(mesh), 0);
        EXPECT_TRUE(fs::exists(mesh.out_dir / "mesh.vts"));
        const nlohmann::json quality = read_json_file(mesh.out_dir / "mesh.json");
        EXPECT_TRUE(quality.contains("warnings")) << quality.dump();
        // Three steps: exit status 1, the step cap reached without convergence (README), with
        // the run's files written and finite forces in them.
        RunOptions run;
        run.input.case_file = c;
        run.input.overrides = {"run.steps=3"};
        run.out_dir = tmp / (name + "_run");
        run.quiet = true;
        EXPECT_EQ(run_run_command(run), 1);
        const nlohmann::json summary = read_json_file(run.out_dir / "summary.json");
        EXPECT_EQ(summary["iterations"].get<long>(), 3);
        EXPECT_TRUE(std::isfinite(summary["cl"].get<double>()));
        EXPECT_TRUE(std::isfinite(summary["cd"].get<double>()));
        const CsvTable surface = CsvTable::read(run.out_dir / "surface.csv");
        EXPECT_GT(surface.rows(), 100u);
        std::cout << name << ": check, mesh and 3 steps (Cl " << summary["cl"].get<double>()
                  << ")\n";
    }
    std::cout << "ran " << cases.size() << " shipped cases\n";
}

TEST(ShippedCases, TurbineSectionReachesTheRequestedYPlus) {
    // The small wind-turbine blade section asks for its first cell at y+ = 1 (mesh.y_plus, set
    // from a flat-plate correlation at the chord Reynolds number, mesh/wall_spacing.hpp). Run to
    // convergence on a coarser grid than the case's (128 cells around, 32 along the wake, 64
    // out; the first-cell height does not depend on them), then read the y+ the run reached from
    // its surface.csv. That file's y+ is at the first cell's centroid, half the cell's height
    // from the wall (to O(h / R): h = 1e-5 against a nose radius of 0.016), so the y+ of the
    // first cell's height is twice it.
    test::AppScratch tmp;
    RunOptions run;
    run.input.case_file = fs::path(VEER_SOURCE_DIR) / "cases" / "wind-turbine-section-sa.toml";
    run.input.overrides = {"mesh.around=128", "mesh.wake=32", "mesh.normal=64"};
    run.out_dir = tmp / "run";
    run.quiet = true;
    ASSERT_EQ(run_run_command(run), 0) << "the run must converge";
    const CsvTable surface = CsvTable::read(run.out_dir / "surface.csv");
    const std::vector<double> x = surface.numbers("x_c"), y_plus = surface.numbers("y_plus");
    ASSERT_EQ(y_plus.size(), 128u) << "one row per wall face";
    const CaseSpec spec = read_case_file(run.input.case_file, run.input.overrides);
    ASSERT_TRUE(spec.y_plus.has_value()) << "the case no longer sets mesh.y_plus";
    const double requested = *spec.y_plus;  // 1 in the shipped file
    double mid_sum = 0.0, largest = 0.0;
    int mid_count = 0;
    for (std::size_t k = 0; k < y_plus.size(); ++k) {
        const double cell = 2.0 * y_plus[k];
        largest = std::max(largest, cell);
        if (x[k] >= 0.1 && x[k] <= 0.9) {
            mid_sum += cell;
            ++mid_count;
        }
    }
    ASSERT_GT(mid_count, 50);
    const double mid_mean = mid_sum / mid_count;
    std::cout << "first-cell y+ reached: mean " << mid_mean << " over " << mid_count
              << " faces between x/c 0.1 and 0.9, largest " << largest << "; requested "
              << requested << "\n";
    // The correlation is a flat-plate estimate: on the section the shear rises towards the
    // suction peak and falls aft, so y+ varies along the wall (common practice). Over the middle
    // of the chord its mean must meet the request within 25% (measured 1.04), and nowhere may it
    // exceed three times the request (measured 2.5, at the suction peak): a first cell set to
    // the centroid's y+, or with the wrong Reynolds number, is a factor 2 or more away.
    EXPECT_NEAR(mid_mean / requested, 1.0, 0.25);
    EXPECT_LT(largest, 3.0 * requested);
}

}  // namespace
}  // namespace veer
