/// The steady wake of the circular cylinder at Re 40 on the shipped case's O-grid and two
/// coarser ones (ratio sqrt 2 in each direction and in the first cell, far field 60 diameters):
/// drag, the recirculation length and the separation angle (from the rear point) against the
/// bands of tests/reference/cylinder_re40_bands.csv, from the listings of Tritton 1959,
/// Coutanceau & Bouard 1977, Dennis & Chang 1970 and Fornberg 1980
/// (tests/reference/cylinder_re40_steady.csv): Cd 1.50-1.59, L/D 2.13-2.35, 53.5-53.8 deg.
/// Cd and L/D are read on the finest grid; the separation angle, whose band is 0.3 deg wide, is
/// extrapolated to zero cell size (Richardson) at the order observed on the three grids (the
/// zero of the wall friction between wall faces converges at less than the scheme's second order;
/// the finest grid alone sits about 0.1 deg above the band).
///
/// Cost (2 cores, quiet machine): three steady runs, a few minutes together.
#include <gtest/gtest.h>

#include <cmath>

#include "tests/validation/cylinder_runs.hpp"

namespace veer {
namespace {

test::CylinderRun steady_re40(int level) {
    std::vector<std::string> o = test::grid_level(level);
    o.insert(o.end(), {"flow.reynolds=40", "run.mode=\"steady\"", "run.start_spin=0"});
    return test::run_cylinder(o, "re40_" + std::to_string(level));
}

double separation_angle(const test::CylinderRun& run) {
    EXPECT_TRUE(run.analysis.circle.has_value());
    if (!run.analysis.circle) return 0.0;
    const CircleFigures& c = *run.analysis.circle;
    EXPECT_TRUE(c.separation_angle_upper.has_value() && c.separation_angle_lower.has_value());
    if (!c.separation_angle_upper || !c.separation_angle_lower) return 0.0;
    return 0.5 * (*c.separation_angle_upper + *c.separation_angle_lower);
}

TEST(CylinderRe40, SteadyWakeInsideThePublishedBands) {
    const test::CylinderRun coarse = steady_re40(2);
    const test::CylinderRun medium = steady_re40(1);
    const test::CylinderRun fine = steady_re40(0);
    EXPECT_EQ(medium.result.status, RunStatus::converged);
    EXPECT_EQ(fine.result.status, RunStatus::converged);
    ASSERT_TRUE(fine.analysis.circle.has_value());
    ASSERT_TRUE(fine.analysis.circle->recirculation_length.has_value());
    const auto bands = test::read_bands("cylinder_re40_bands.csv", 3);
    const double cd = fine.analysis.forces.cd.total;
    const double length = *fine.analysis.circle->recirculation_length;
    test::expect_in_band(bands, "cd", cd);
    test::expect_in_band(bands, "l_d", length);
    const double theta_fine = separation_angle(fine);
    const double theta_medium = separation_angle(medium);
    const double theta_coarse = separation_angle(coarse);
    // Monotone convergence, else the observed order means nothing.
    ASSERT_GT((theta_coarse - theta_medium) * (theta_medium - theta_fine), 0.0)
        << theta_coarse << " " << theta_medium << " " << theta_fine;
    const double r = std::sqrt(2.0);
    const double order =
        std::log((theta_coarse - theta_medium) / (theta_medium - theta_fine)) / std::log(r);
    EXPECT_GT(order, 0.5);  // a sane observed order (common practice): between 0.5 and 3
    EXPECT_LT(order, 3.0);
    const double theta_zero = theta_fine + (theta_fine - theta_medium) / (std::pow(r, order) - 1.0);
    test::expect_in_band(bands, "theta_s_deg", theta_zero);
    // The symmetric steady wake: both halves separate at the same angle.
    EXPECT_NEAR(*fine.analysis.circle->separation_angle_upper,
                *fine.analysis.circle->separation_angle_lower, 0.05);
    std::printf(
        "Re 40: Cd %.4f, L/D %.3f, separation %.2f deg (medium %.2f, coarse %.2f; observed order "
        "%.2f; zero cell size %.2f)\n",
        cd, length, theta_fine, theta_medium, theta_coarse, order, theta_zero);
}

}  // namespace
}  // namespace veer
