/// The circular cylinder at Re 100 on the shipped case (cases/cylinder-shedding.toml: O-grid
/// 192 x 144, outer boundary 60 diameters from the wall, CFL 4, t = 70, figures over the last
/// 5 whole shedding cycles) against the two-dimensional simulations listed by Qu et al. 2013
/// (J. Fluids Struct. 39, Table 1) and Williamson's 1988 Strouhal fit: the bands of
/// tests/reference/cylinder_re100_bands.csv (St 0.163-0.166, mean Cd 1.31-1.35, rms Cl
/// 0.22-0.24). Grid convergence on three levels (ratio sqrt 2 in each direction and in the first
/// cell, far field fixed) and time-step convergence on three (CFL 4, 2, 1 on the finest grid):
/// St changes by less than 1 % between the two finest of each. The control-volume route
/// averaged over the same cycles: mean lift within 0.01 of the surface's (zero by symmetry) and
/// mean drag within 2 % on every contour.
///
/// Cost (2 cores, quiet machine): the shipped run about 2 minutes; the coarser grids about
/// 1.5 minutes together; CFL 2 and 1 on the finest grid about 12 minutes together.
#include <gtest/gtest.h>

#include <cmath>

#include "tests/validation/cylinder_runs.hpp"

namespace veer {
namespace {

/// The shipped run, computed once for the tests that read it.
const test::CylinderRun& shipped_run() {
    static const test::CylinderRun run = test::run_cylinder({}, "shipped");
    return run;
}

const SheddingStatistics& shedding_of(const test::CylinderRun& run) {
    EXPECT_TRUE(run.unsteady.shedding.has_value()) << "no whole shedding cycle in the record";
    static const SheddingStatistics none{};
    return run.unsteady.shedding ? *run.unsteady.shedding : none;
}

double relative_change(double a, double b) { return std::abs(a - b) / std::abs(b); }

TEST(CylinderRe100, ShippedCaseInsidePublishedBands) {
    const test::CylinderRun& run = shipped_run();
    EXPECT_EQ(run.result.status, RunStatus::end_time);
    const SheddingStatistics& s = shedding_of(run);
    EXPECT_EQ(s.cycles, summary_cycles);
    EXPECT_TRUE(s.periodic) << s.not_periodic;
    const auto bands = test::read_bands("cylinder_re100_bands.csv", 3);
    test::expect_in_band(bands, "strouhal", s.strouhal.value);
    test::expect_in_band(bands, "cd_mean", s.cd_mean.value);
    test::expect_in_band(bands, "cl_rms", s.cl_rms.value);
    std::printf("Re 100 shipped grid: St %.5f, mean Cd %.5f, rms Cl %.5f over %d cycles\n",
                s.strouhal.value, s.cd_mean.value, s.cl_rms.value, s.cycles);
}

TEST(CylinderRe100, ControlVolumeMeansAgreeWithTheSurface) {
    const test::CylinderRun& run = shipped_run();
    const SheddingStatistics& s = shedding_of(run);
    ASSERT_TRUE(run.unsteady.routes.has_value()) << "the route was not sampled over the window";
    ASSERT_FALSE(run.unsteady.routes->empty());
    for (const RouteMean& m : *run.unsteady.routes) {
        // The bounds: lift within 0.01 (the mean is zero by symmetry), drag within 2 %.
        EXPECT_NEAR(m.cl, s.cl_mean.value, 0.01);
        EXPECT_LE(relative_change(m.cd, s.cd_mean.value), 0.02) << "cd " << m.cd;
        std::printf("contour: mean Cl %.5f (surface %.5f), mean Cd %.5f (surface %.5f)\n", m.cl,
                    s.cl_mean.value, m.cd, s.cd_mean.value);
    }
}

TEST(CylinderRe100, StrouhalConvergesWithTheGrid) {
    const double coarse = shedding_of(test::run_cylinder(test::grid_level(2), "g2")).strouhal.value;
    const double medium = shedding_of(test::run_cylinder(test::grid_level(1), "g1")).strouhal.value;
    const double fine = shedding_of(shipped_run()).strouhal.value;
    std::printf("St on 96, 136, 192 around: %.5f %.5f %.5f\n", coarse, medium, fine);
    EXPECT_LT(relative_change(medium, fine), 0.01);  // the bound, two finest levels
    // Converging, not wandering: the finer pair differs less than the coarser one.
    EXPECT_LT(std::abs(fine - medium), std::abs(medium - coarse));
}

TEST(CylinderRe100, StrouhalConvergesWithTheTimeStep) {
    const double cfl4 = shedding_of(shipped_run()).strouhal.value;
    const double cfl2 = shedding_of(test::run_cylinder({"run.cfl=2"}, "cfl2")).strouhal.value;
    const double cfl1 = shedding_of(test::run_cylinder({"run.cfl=1"}, "cfl1")).strouhal.value;
    std::printf("St at CFL 4, 2, 1: %.5f %.5f %.5f\n", cfl4, cfl2, cfl1);
    EXPECT_LT(relative_change(cfl2, cfl1), 0.01);  // the bound, two finest levels
    EXPECT_LT(relative_change(cfl4, cfl1), 0.01);
}

}  // namespace
}  // namespace veer
