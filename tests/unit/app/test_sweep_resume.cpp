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
    SweepOptions o;
    o.input.case_file = tmp / "c.toml";
    o.alpha = "0:8:4";
    o.out_dir = tmp / "sw";
    o.quiet = true;
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
    SweepOptions o;
    o.input.case_file = tmp / "c.toml";
    o.alpha = "0,2,4";
    o.out_dir = tmp / "sw";
    o.quiet = true;
    o.gather = true;
    make_finished(o.out_dir, made_up_point(sweep, 2.0), o.input.case_file);
    EXPECT_EQ(run_sweep_command(o), 1);  // two points are missing: not a whole polar
    const nlohmann::json s = read_json_file(o.out_dir / "summary.json");
    EXPECT_EQ(s["points"].get<int>(), 1);
    EXPECT_EQ(s["missing_points"], nlohmann::json::array({0.0, 4.0}));
}

}  // namespace
}  // namespace veer
