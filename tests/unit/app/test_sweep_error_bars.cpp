// `veer sweep --error-bars` on a tiny laminar sweep: each angle also runs on the two coarser
// members of the grid family, and polar.csv, summary.json and the report carry each point's
// grid error of Cl and Cd (app/sweep_error_bars.hpp).
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>

#include "app/commands.hpp"
#include "app/report_csv.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_coarser_grids.hpp"
#include "app/sweep_record.hpp"
#include "app_test_support.hpp"
#include "io/json_writer.hpp"

namespace veer {
namespace {

class SweepErrorBars : public ::testing::Test {
protected:
    static void SetUpTestSuite() {
        // The suite's own folder (AppScratch names itself after a running test, and none runs
        // while the suite is set up).
        root = std::filesystem::temp_directory_path() /
               ("veer_app_SweepErrorBars_" + std::to_string(::getpid()));
        std::filesystem::remove_all(root);
        test::write_text(root / "c.toml", test::quick_case_text());
        SweepOptions o;
        o.input.case_file = root / "c.toml";
        o.input.overrides = {"run.steps=3000"};  // each of the six runs converges steadily
        o.alpha = "2,4";
        o.out_dir = root / "sw";
        o.quiet = true;
        o.stability_time = 0.0;
        o.unsteady_time = 1.0;  // a cost guard only
        o.error_bars = true;
        status = run_sweep_command(o);
        dir = o.out_dir;
    }
    static void TearDownTestSuite() {
        std::error_code ec;
        std::filesystem::remove_all(root, ec);
    }
    static inline std::filesystem::path root;
    static inline int status = -1;
    static inline std::filesystem::path dir;
};

TEST_F(SweepErrorBars, CoarserGridsHalveTheCells) {
    ASSERT_EQ(status, 0);
    const nlohmann::json plan = read_json_file(dir / "sweep.json");
    const auto cells = plan.at("error_bars").at("cells").get<std::vector<long>>();
    ASSERT_EQ(cells.size(), 3u);
    // Ratio sqrt 2 on each dimension: half the cells per level, up to the rounding of the
    // counts (64 around becomes 46 and 32, 24 normal 17 and 12).
    EXPECT_NEAR(static_cast<double>(cells[0]) / static_cast<double>(cells[1]), 2.0, 0.15);
    EXPECT_NEAR(static_cast<double>(cells[1]) / static_cast<double>(cells[2]), 2.0, 0.15);
}

TEST_F(SweepErrorBars, PolarAndSummaryCarryEachPointsGridError) {
    ASSERT_EQ(status, 0);
    const CsvTable polar = CsvTable::read(dir / "polar.csv");
    ASSERT_EQ(polar.rows(), 2u);
    const nlohmann::json s = read_json_file(dir / "summary.json");
    ASSERT_TRUE(s.at("grid_errors").is_array());
    ASSERT_EQ(s["grid_errors"].size(), 2u);
    const auto cl = polar.numbers("cl"), band = polar.numbers("cl_grid_band");
    const auto cd_band = polar.numbers("cd_grid_band"), order = polar.numbers("cl_grid_order");
    const auto verdict = polar.text("cl_grid_verdict");
    for (std::size_t k = 0; k < 2; ++k) {
        const double alpha = polar.numbers("alpha")[k];
        EXPECT_GT(band[k], 0.0) << alpha;
        EXPECT_GT(cd_band[k], 0.0) << alpha;
        EXPECT_FALSE(verdict[k].empty());
        // The summary's coarser values are the coarser grids' own records at that angle.
        const nlohmann::json& e = s["grid_errors"][k];
        EXPECT_DOUBLE_EQ(e.at("alpha").get<double>(), alpha);
        for (int level = 1; level <= 2; ++level) {
            const auto r =
                read_point_record(coarser_grid_folder(dir, level) / point_folder_name(alpha));
            ASSERT_TRUE(r) << "no point at " << alpha << " on coarser grid " << level;
            EXPECT_DOUBLE_EQ(e["cl"]["coarser"][level - 1].get<double>(), r->cl);
            EXPECT_DOUBLE_EQ(e["cd"]["coarser"][level - 1].get<double>(), r->cd);
            EXPECT_NE(r->cl, cl[k]) << "a coarser grid gave the fine grid's Cl";
        }
        // polar.csv keeps 8 significant digits.
        EXPECT_NEAR(e["cl"]["band"].get<double>(), band[k], 1e-7 * band[k]);
        EXPECT_NEAR(e["cl"]["order"].get<double>(), order[k], 1e-7 * std::abs(order[k]));
        std::cout << "alpha " << alpha << ": Cl " << cl[k] << " +- " << band[k] << " (order "
                  << order[k] << ", " << verdict[k] << "), Cd band " << cd_band[k] << "\n";
    }
}

TEST_F(SweepErrorBars, ReportShowsTheBands) {
    ASSERT_EQ(status, 0);
    ASSERT_EQ(run_report_command(ReportOptions{dir}), 0);
    const std::string page = test::read_text(dir / "report.html");
    EXPECT_NE(page.find(" ± "), std::string::npos) << "no band in the polar table";
}

}  // namespace
}  // namespace veer
