// Figures of a polar on synthetic points whose slope, zero-lift angle, maximum and onset are
// known exactly.
#include <gtest/gtest.h>

#include <cmath>

#include "app/polar_figures.hpp"

namespace veer {
namespace {

PointRecord point(double alpha, double cl, double cd = 0.05) {
    PointRecord r;
    r.alpha = alpha;
    r.cl = cl;
    r.cd = cd;
    return r;
}

/// A cambered section: cl = 0.1 (alpha + 2) up to 8 degrees, then bending over to a maximum
/// at 12 and falling after it.
std::vector<PointRecord> synthetic_polar() {
    std::vector<PointRecord> p;
    for (double a = -4; a <= 8; a += 2) p.push_back(point(a, 0.1 * (a + 2), 0.02 + 1e-4 * a * a));
    p.push_back(point(10, 1.05));
    p.push_back(point(12, 1.12));
    p.push_back(point(14, 0.95));
    return p;
}

TEST(PolarFigures, SlopeAndZeroLiftAngleOfTheLinearRange) {
    const PolarFigures f = polar_figures(synthetic_polar());
    ASSERT_TRUE(f.linear);
    // Exactly linear data: the least-squares line is exact to round-off.
    EXPECT_NEAR(f.linear->slope_per_deg, 0.1, 1e-12);
    ASSERT_TRUE(f.alpha_zero_lift);
    EXPECT_NEAR(*f.alpha_zero_lift, -2.0, 1e-10);
    // 10 degrees lies 0.15 below the line: beyond 2 % of 1.05, so the range stops at 8.
    EXPECT_EQ(f.linear->alpha_min, -4.0);
    EXPECT_EQ(f.linear->alpha_max, 8.0);
    EXPECT_EQ(f.linear->points, 7);
}

TEST(PolarFigures, SmallScatterStaysInTheRange) {
    // Scatter of 1 % of cl on top of the line is within the 2 % rule: every point is kept and
    // the slope moves by less than the scatter allows.
    std::vector<PointRecord> p;
    for (int k = 0; k <= 5; ++k) {
        const double a = 2.0 * k;
        p.push_back(point(a, 0.11 * a * (1 + ((k % 2) ? 0.01 : -0.01))));
    }
    const auto range = linear_lift_range({0, 2, 4, 6, 8, 10},
                                         {p[0].cl, p[1].cl, p[2].cl, p[3].cl, p[4].cl, p[5].cl});
    ASSERT_TRUE(range);
    EXPECT_EQ(range->points, 6);
    EXPECT_NEAR(range->slope_per_deg, 0.11, 0.11 * 0.02);
}

TEST(PolarFigures, OrderDoesNotMatter) {
    std::vector<PointRecord> p = synthetic_polar();
    std::reverse(p.begin(), p.end());  // a down-sweep
    const PolarFigures f = polar_figures(p);
    ASSERT_TRUE(f.linear);
    EXPECT_NEAR(f.linear->slope_per_deg, 0.1, 1e-12);
}

TEST(PolarFigures, MaximumMinimumAndStall) {
    const PolarFigures f = polar_figures(synthetic_polar());
    EXPECT_DOUBLE_EQ(*f.cl_max, 1.12);
    EXPECT_DOUBLE_EQ(*f.alpha_cl_max, 12.0);
    EXPECT_TRUE(f.stall_in_range);
    EXPECT_DOUBLE_EQ(*f.cd_min, 0.02);
    EXPECT_DOUBLE_EQ(*f.alpha_cd_min, 0.0);
}

TEST(PolarFigures, SeparationOnsetRule) {
    std::vector<PointRecord> p = synthetic_polar();
    // A trailing-edge separation aft of 0.95 chord does not count; one ahead of it does.
    p[3].trailing_edge_separation_upper = 0.97;  // 2 degrees
    p[5].trailing_edge_separation_upper = 0.90;  // 6 degrees
    EXPECT_DOUBLE_EQ(*polar_figures(p).alpha_separation_onset, 6.0);
    // A bubble on the upper surface counts too, at a lower angle.
    p[4].upper_bubble = true;  // 4 degrees
    EXPECT_DOUBLE_EQ(*polar_figures(p).alpha_separation_onset, 4.0);
    // None at all: null.
    EXPECT_FALSE(polar_figures(synthetic_polar()).alpha_separation_onset);
}

TEST(PolarFigures, LiftDisagreementAndFailedPoints) {
    std::vector<PointRecord> p = synthetic_polar();
    p[0].cl_momentum = p[0].cl + 0.003;
    p[2].cl_momentum = p[2].cl - 0.01;
    PointRecord failed = point(16, 5.0);
    failed.regime = "failed";
    p.push_back(failed);
    const PolarFigures f = polar_figures(p);
    EXPECT_NEAR(*f.max_lift_disagreement, 0.01, 1e-12);
    EXPECT_DOUBLE_EQ(*f.cl_max, 1.12);  // the failed point is left out
}

TEST(PolarFigures, UnsteadyPointsStayOutOfTheSlope) {
    std::vector<PointRecord> p = {point(0, 0.0), point(2, 0.2), point(4, 0.4)};
    p[2].regime = "unsteady";
    p[2].cl = 0.1;  // would break the line if it took part
    const PolarFigures f = polar_figures(p);
    ASSERT_TRUE(f.linear);
    EXPECT_EQ(f.linear->points, 2);
    EXPECT_NEAR(f.linear->slope_per_deg, 0.1, 1e-12);
}

TEST(PolarFigures, TooFewPoints) {
    const PolarFigures f = polar_figures({point(3, 0.3)});
    EXPECT_FALSE(f.linear);
    EXPECT_FALSE(f.alpha_zero_lift);
    EXPECT_DOUBLE_EQ(*f.cl_max, 0.3);
}

}  // namespace
}  // namespace veer
