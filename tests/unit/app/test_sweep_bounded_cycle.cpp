// End to end: a steady sweep point that stops converging but whose forces stay inside the
// bounded-cycle band is reported as the mean over the judged window with the half band as its
// uncertainty, marked as such, and does not go time-accurate (app/sweep_point.cpp).
#include <gtest/gtest.h>

#include <algorithm>
#include <filesystem>

#include "app/mesh_pipeline.hpp"
#include "app/report_csv.hpp"
#include "app/sweep_point.hpp"
#include "app_test_support.hpp"
#include "io/case_file.hpp"
#include "stalling_sweep.hpp"

namespace veer {
namespace {

TEST(SweepBoundedCycle, StalledPointInsideTheBandReportsTheWindowMean) {
    // The tiny case stalled at step 20 by criteria no iteration meets (stalling_sweep.hpp),
    // judged over its last 10 iterations with a band wide enough for any start-up (a test of
    // the bookkeeping, not of the band's size: test_bounded_cycle.cpp covers that).
    test::AppScratch tmp;
    SweepCase sweep = test::stalling_tiny_sweep(tmp);
    sweep.cycle = {10, 100.0, 100.0, 0, 1.0};
    const CaseSpec spec = point_case(sweep, 4.0);
    const StructuredGrid grid = build_mesh(spec).grid;
    const PointOutcome out = run_sweep_point(sweep, 4.0, spec, grid, tmp / "sw", nullptr, "");
    ASSERT_TRUE(out.record);
    const PointRecord& r = *out.record;
    EXPECT_EQ(r.status, "bounded cycle");
    EXPECT_EQ(r.regime, "steady");
    EXPECT_EQ(r.final_run, ".");
    EXPECT_EQ(r.cl_basis.rfind("settled in a bounded cycle", 0), 0u) << r.cl_basis;
    EXPECT_NE(r.note.find("stalled"), std::string::npos) << r.note;
    EXPECT_FALSE(std::filesystem::exists(tmp / "sw" / r.folder / "unsteady"));
    const CsvTable h = CsvTable::read(tmp / "sw" / r.folder / "history.csv");
    ASSERT_EQ(h.rows(), 20u);
    const std::vector<double> cl = h.numbers("cl");
    double mean = 0.0;
    for (std::size_t k = 10; k < 20; ++k) mean += cl[k] / 10.0;
    const auto [lo, hi] = std::minmax_element(cl.begin() + 10, cl.end());
    EXPECT_NEAR(r.cl, mean, 1e-6);  // history.csv keeps 8 decimals
    EXPECT_NEAR(r.cl_amplitude, 0.5 * (*hi - *lo), 1e-6);
    EXPECT_GT(r.cl_amplitude, 0.0);  // the start-up moves Cl: the band is not empty
}

}  // namespace
}  // namespace veer
