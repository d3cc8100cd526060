// The report page of a sweep and of a run lists its pictures, and every picture it lists exists
// as a PNG; the plotting pieces underneath (ticks, resampling, streamlines) on exact cases.
#include <fmt/format.h>
#include <gtest/gtest.h>

#include <cmath>

#include "app/commands.hpp"
#include "app/report_html.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_plan.hpp"
#include "app/sweep_record.hpp"
#include "app_test_support.hpp"
#include "io/json_writer.hpp"
#include "io/plot_image_grid.hpp"
#include "io/plot_streamlines.hpp"
#include "io/plot_ticks.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

/// A made-up run folder: a short history and a thin-section Cp/Cf table.
void write_run_files(const fs::path& dir, double alpha) {
    std::string history = "step,time,residual_u,residual_v,residual_continuity,cl,cd,cm\n";
    for (int k = 1; k <= 50; ++k)
        history += fmt::format("{},0,{},{},{},{},0.05,-0.01\n", k, std::exp(-0.2 * k),
                               2 * std::exp(-0.2 * k), 0.5 * std::exp(-0.2 * k),
                               0.1 * alpha * (1 - std::exp(-0.1 * k)));
    test::write_text(dir / "history.csv", history);
    std::string surface = "x_c,y_c,side,cp,cf,y_plus\n";
    for (int k = 0; k <= 20; ++k) {
        const double x = k / 20.0;
        surface += fmt::format("{},0,lower,{},{},1\n", x, 0.3 * (1 - x), 0.01);
        surface += fmt::format("{},0,upper,{},{},1\n", x, -0.8 * (1 - x), 0.02 - 0.03 * x);
    }
    test::write_text(dir / "surface.csv", surface);
    write_json_file(dir / "summary.json",
                    {{"section", "NACA 0012"}, {"alpha", alpha}, {"cl", 0.1}});
}

/// Every <img src="..."> of the page, relative to its folder.
std::vector<std::string> pictures_of(const std::string& html) {
    std::vector<std::string> files;
    for (std::size_t at = html.find("<img src=\""); at != std::string::npos;
         at = html.find("<img src=\"", at + 1)) {
        const std::size_t begin = at + 10;
        files.push_back(html.substr(begin, html.find('"', begin) - begin));
    }
    return files;
}

TEST(ReportPage, SweepPageListsItsPictures) {
    test::AppScratch tmp;
    const fs::path dir = tmp / "sw";
    SweepPlan plan;
    plan.case_file = tmp / "c.toml";
    plan.angles = {0, 4, 8};
    fs::create_directories(dir);
    write_sweep_plan(dir, plan);
    for (double a : plan.angles) {
        PointRecord r;
        r.alpha = a;
        r.folder = point_folder_name(a);
        r.cl = 0.1 * a;
        r.cd = 0.05 + 0.001 * a;
        r.cm = -0.01;
        r.cl_momentum = 0.1 * a + 0.002;
        r.upper_bubble = a >= 8;
        fs::create_directories(dir / r.folder);
        write_json_file(record_path(dir / r.folder), record_to_json(r));
        write_run_files(dir / r.folder, a);
    }
    ASSERT_EQ(run_report_command({dir}), 0);
    const std::string html = test::read_text(dir / "report.html");
    const std::vector<std::string> pics = pictures_of(html);
    // 3 polars + Cp and Cf of all points + 4 run pictures of the highest point (the Cl max
    // point); its flow picture is skipped (no fields.pvd) and the page says so.
    EXPECT_EQ(pics.size(), 9u) << html;
    for (const std::string& p : pics) EXPECT_TRUE(test::is_png(dir / p)) << p;
    EXPECT_NE(html.find("pictures/polar_cl_alpha.png"), std::string::npos);
    EXPECT_NE(html.find("Not drawn"), std::string::npos);
    EXPECT_EQ(html.find("http"), std::string::npos);  // no network resources
    EXPECT_TRUE(fs::exists(dir / "polar.csv"));       // the report gathers the points first
}

TEST(ReportPage, RunPageListsItsPictures) {
    test::AppScratch tmp;
    write_run_files(tmp.path(), 4.0);
    ASSERT_EQ(run_report_command({tmp.path()}), 0);
    const std::vector<std::string> pics = pictures_of(test::read_text(tmp / "report.html"));
    EXPECT_EQ(pics.size(), 4u);  // residuals, forces, Cp, Cf (no fields.pvd: no flow picture)
    for (const std::string& p : pics) EXPECT_TRUE(test::is_png(tmp / p)) << p;
}

TEST(PlotTicks, NiceSteps) {
    // (0.93 + 0.13) / 5 = 0.212 per tick: the next nice step is 0.25, the range whole steps.
    const AxisTicks t = nice_ticks(-0.13, 0.93, 5);
    EXPECT_DOUBLE_EQ(t.step, 0.25);
    EXPECT_DOUBLE_EQ(t.lo, -0.25);
    EXPECT_DOUBLE_EQ(t.hi, 1.0);
    EXPECT_EQ(t.values.size(), 6u);
    EXPECT_EQ(tick_label(0.4, 0.2), "0.4");
    EXPECT_EQ(tick_label(-4, 2), "-4");
    const AxisTicks d = decade_ticks(3e-7, 0.5);
    EXPECT_DOUBLE_EQ(d.lo, 1e-7);
    EXPECT_DOUBLE_EQ(d.hi, 1.0);
}

/// A uniform stream u = (1, 0.5) on a Cartesian block of 20 x 10 cells over [0, 2] x [0, 1].
FlowFrame uniform_frame() {
    FlowFrame f;
    f.ni = 20;
    f.nj = 10;
    for (int j = 0; j <= f.nj; ++j)
        for (int i = 0; i <= f.ni; ++i) {
            f.node_x.push_back(0.1 * i);
            f.node_y.push_back(0.1 * j);
        }
    f.u.assign(200, 1.0);
    f.v.assign(200, 0.5);
    f.cp.assign(200, 0.0);
    return f;
}

TEST(PlotImageGrid, ResamplesLinearFieldsExactly) {
    FlowFrame f = uniform_frame();
    // Linear interpolation within triangles reproduces a constant exactly; the j = 0 nodes of
    // this block are not a C-grid wall (no cut partner), but the mirror test finds them apart,
    // so the bottom row has no-slip nodes: sample away from it.
    const ImageGrid g = resample_frame(f, {0.0, 2.0, 0.0, 1.0}, 100);
    EXPECT_EQ(g.ny, 50);
    int fluid = 0;
    for (unsigned char c : g.fluid) fluid += c;
    EXPECT_EQ(fluid, 100 * 50);  // the block covers the whole window
    EXPECT_NEAR(g.u[g.at(50, 10)], 1.0, 1e-12);
    EXPECT_NEAR(g.v[g.at(50, 10)], 0.5, 1e-12);
}

TEST(PlotStreamlines, FollowTheStream) {
    const ImageGrid g = resample_frame(uniform_frame(), {0.0, 2.0, 0.0, 1.0}, 200);
    const std::vector<Streamline> lines = trace_streamlines(g);
    ASSERT_FALSE(lines.empty());
    // Every line is straight with slope v/u = 0.5 (y down in pixels): midpoint steps along a
    // constant direction are exact to round-off. (The no-slip bottom row scales u and v alike,
    // so it slows the stream there without turning it.) 1e-6 allows the bilinear round-off.
    int checked = 0;
    for (const Streamline& s : lines) {
        const double dx = s.x.back() - s.x.front(), dy = s.y.back() - s.y.front();
        if (std::hypot(dx, dy) < 20) continue;
        EXPECT_NEAR(dy / dx, -0.5, 1e-6);
        ++checked;
    }
    EXPECT_GE(checked, 6);  // the window holds 8 lines at this spacing
}

}  // namespace
}  // namespace veer
