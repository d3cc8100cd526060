// A sweep started again finds its finished points and does not run them: here every point is
// made finished by hand (with coefficients no solver would give), so a sweep that re-ran any of
// them would change the polar.
#include <gtest/gtest.h>

#include "app/commands.hpp"
#include "app/report_csv.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_point.hpp"
#include "app/sweep_record.hpp"
#include "app_test_support.hpp"
#include "io/case_file.hpp"
#include "io/json_writer.hpp"
#include "io/output_dir.hpp"

namespace veer {
namespace {

PointRecord made_up_point(const SweepCase& sweep, double alpha) {
    PointRecord r;
    r.alpha = alpha;
    r.folder = point_folder_name(alpha);
    r.cl = 10.0 + alpha;  // far from any real lift
    r.cd = 1.0;
    r.cm = -1.0;
    r.status = "converged";
    r.case_text = point_case(sweep, alpha).text;
    return r;
}

/// A point folder as a finished sweep leaves it, in a sweep folder stamped with the case.
void make_finished(const std::filesystem::path& sweep_dir, const PointRecord& r,
                   const std::filesystem::path& case_file) {
    (void)prepare_output_dir(sweep_dir, read_case_file(case_file).text, false);
    const auto dir = sweep_dir / r.folder;
    std::filesystem::create_directories(dir);
    write_json_file(dir / "summary.json", {{"cl", r.cl}});
    write_json_file(record_path(dir), record_to_json(r));
}

/// A quiet sweep of the scratch folder's c.toml into its folder sw.
SweepOptions quiet_sweep(const test::AppScratch& tmp, const std::string& alpha) {
    SweepOptions o;
    o.input.case_file = tmp / "c.toml";
    o.alpha = alpha;
    o.out_dir = tmp / "sw";
    o.quiet = true;
    return o;
}

TEST(SweepResume, FinishedPointIsFoundOnlyForTheSameCase) {
    test::AppScratch tmp;
    test::write_text(tmp / "c.toml", test::tiny_case_text());
    SweepCase sweep{read_case_source(tmp / "c.toml"), {}, 0, 0.0, false};
    const PointRecord r = made_up_point(sweep, 4.0);
    make_finished(tmp / "sw", r, tmp / "c.toml");
    const auto dir = tmp / "sw" / r.folder;
    EXPECT_TRUE(finished_point(dir, point_case(sweep, 4.0).text));
    // Another angle, another --set, or a lost summary.json: not finished.
    EXPECT_FALSE(finished_point(dir, point_case(sweep, 6.0).text));
    SweepCase other = sweep;
    other.overrides = {"flow.reynolds=500"};
    EXPECT_FALSE(finished_point(dir, point_case(other, 4.0).text));
    std::filesystem::remove(dir / "summary.json");
    EXPECT_FALSE(finished_point(dir, point_case(sweep, 4.0).text));
}

TEST(SweepResume, SweepOfFinishedPointsRunsNothing) {
    test::AppScratch tmp;
    test::write_text(tmp / "c.toml", test::tiny_case_text());
    SweepCase sweep{read_case_source(tmp / "c.toml"), {}, 0, 0.0, false};
    SweepOptions o = quiet_sweep(tmp, "0:8:4");
    for (double a : {0.0, 4.0, 8.0})
        make_finished(o.out_dir, made_up_point(sweep, a), o.input.case_file);
    ASSERT_EQ(run_sweep_command(o), 0);
    const CsvTable polar = CsvTable::read(o.out_dir / "polar.csv");
    ASSERT_EQ(polar.rows(), 3u);
    EXPECT_EQ(polar.numbers("cl"), (std::vector<double>{10.0, 14.0, 18.0}));
    const nlohmann::json s = read_json_file(o.out_dir / "summary.json");
    EXPECT_NEAR(s["lift_slope_per_deg"].get<double>(), 1.0, 1e-12);  // exact line
    EXPECT_TRUE(std::filesystem::exists(o.out_dir / "sweep.json"));
}

TEST(SweepResume, GatherWritesThePolarOfWhatIsThere) {
    test::AppScratch tmp;
    test::write_text(tmp / "c.toml", test::tiny_case_text());
    SweepCase sweep{read_case_source(tmp / "c.toml"), {}, 0, 0.0, false};
    SweepOptions o = quiet_sweep(tmp, "0,2,4");
    o.gather = true;
    make_finished(o.out_dir, made_up_point(sweep, 2.0), o.input.case_file);
    EXPECT_EQ(run_sweep_command(o), 1);  // two points are missing: not a whole polar
    const nlohmann::json s = read_json_file(o.out_dir / "summary.json");
    EXPECT_EQ(s["points"].get<int>(), 1);
    EXPECT_EQ(s["missing_points"], nlohmann::json::array({0.0, 4.0}));
}

// The stall search on finished points: every angle it can plan (0 to 12 in quarter degrees)
// is finished by hand on a lift curve peaking at 8.2 deg, so the sweep runs nothing and the
// polar shows which points the search added. From the requested 0, 4, 8 (Cl still rising at
// 8): 12 (one step beyond), then the halving around Cl max at 8: 6 and 10, 7 and 9, 7.5 and 8.5.
TEST(SweepResume, StallSearchAddsBracketingPointsToThePolar) {
    test::AppScratch tmp;
    test::write_text(tmp / "c.toml", test::tiny_case_text());
    SweepCase sweep{read_case_source(tmp / "c.toml"), {}, 0, 0.0, false};
    SweepOptions o = quiet_sweep(tmp, "0:8:4");
    o.stall_search = "on";  // the tiny case is at Re 1000, where "auto" leaves it off
    for (int k = 0; k <= 48; ++k) {
        const double a = 0.25 * k;
        PointRecord r = made_up_point(sweep, a);
        r.cl = 20.0 - (a - 8.2) * (a - 8.2);
        make_finished(o.out_dir, r, o.input.case_file);
    }
    ASSERT_EQ(run_sweep_command(o), 0);
    const CsvTable polar = CsvTable::read(o.out_dir / "polar.csv");
    EXPECT_EQ(polar.numbers("alpha"), (std::vector<double>{0, 4, 6, 7, 7.5, 8, 8.5, 9, 10, 12}));
    const std::vector<std::string> why = polar.text("added_for");
    ASSERT_EQ(why.size(), 10u);
    EXPECT_EQ(why[1], "") << "4 deg was asked for";
    EXPECT_EQ(why[9], "stall search beyond the requested angles");
    EXPECT_EQ(why[4], "stall refinement around Cl max");
    const nlohmann::json s = read_json_file(o.out_dir / "summary.json");
    EXPECT_TRUE(s["stall_bracketed"].get<bool>());
    EXPECT_DOUBLE_EQ(s["alpha_cl_max"].get<double>(), 8.0);
    EXPECT_DOUBLE_EQ(s["alpha_cl_max_uncertainty"].get<double>(), 0.5);
    EXPECT_GT(s["cl_max_uncertainty"].get<double>(), 0.0);
    EXPECT_EQ(s["stall_search"], "bracketed");
    // Gathered again from the plan (as veer report does), the added points are still there.
    o.gather = true;
    ASSERT_EQ(run_sweep_command(o), 0);
    EXPECT_EQ(CsvTable::read(o.out_dir / "polar.csv").rows(), 10u);
}

TEST(SweepResume, StallSearchOffKeepsTheRequestedAngles) {
    test::AppScratch tmp;
    test::write_text(tmp / "c.toml", test::tiny_case_text());
    SweepCase sweep{read_case_source(tmp / "c.toml"), {}, 0, 0.0, false};
    SweepOptions o = quiet_sweep(tmp, "0:8:4");
    o.stall_search = "off";
    for (double a : {0.0, 4.0, 8.0, 12.0})
        make_finished(o.out_dir, made_up_point(sweep, a), o.input.case_file);
    ASSERT_EQ(run_sweep_command(o), 0);
    EXPECT_EQ(CsvTable::read(o.out_dir / "polar.csv").rows(), 3u);
    EXPECT_EQ(read_json_file(o.out_dir / "summary.json")["stall_search"],
              "off (--stall-search off)");
}

}  // namespace
}  // namespace veer
