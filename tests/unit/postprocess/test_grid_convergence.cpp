/// The grid convergence index (postprocess/grid_convergence.hpp), Celik et al. 2008 (J. Fluids Eng.
/// 130, 078001) with Roache 2011's factors of safety.
///
/// The worked case is the flat-plate SA Cf of the NASA Turbulence Modeling Resource in
/// tests/reference/tmr_flat_plate_sa_grid_family.csv [D]: grids of 13056, 52224 and 208896 cells
/// (refinement ratio exactly 2), Cf = 0.0027112, 0.0027067, 0.0027056. From these seven-digit
/// values the procedure gives, by hand: p = ln(45 / 11) / ln 2 = 2.0324 (q = 0 for a constant
/// ratio), e_a = 1.1e-6 / 0.0027056 = 0.0407%, phi_ext = phi1 - 1.1e-6 / (2^p - 1), GCI_fine =
/// 1.25 e_a / (2^p - 1) = 0.0164%. gci.md's worked figures (p = 1.98, e_ext = 0.014%, GCI 0.017%)
/// agree with these to the digits the rounded Cf values carry (a shift of 1e-8 in one Cf moves p
/// by 0.02); e_a agrees exactly.
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>
#include <stdexcept>
#include <vector>

#include "postprocess/grid_convergence.hpp"
#include "tests/reference_table.hpp"

namespace veer {
namespace {

TEST(GridConvergence, FlatPlateValuesByHand) {
    // Finest first, as the file lists them (3 rows).
    const test::ReferenceTable family =
        test::ReferenceTable::read("tmr_flat_plate_sa_grid_family.csv", 3);
    std::array<double, 3> h{}, cf{};
    for (std::size_t k = 0; k < 3; ++k) {
        h[k] = std::sqrt(1.0 / family.number(k, "cells"));
        cf[k] = family.number(k, "cf");
    }
    std::cout << "compared " << family.rows() << " grids of the TMR flat-plate family\n";
    // The closed forms below are written for these values.
    ASSERT_EQ(cf, (std::array<double, 3>{0.0027056, 0.0027067, 0.0027112}));
    const GridConvergence g = grid_convergence(h, cf);
    const double p = std::log(45.0 / 11.0) / std::log(2.0);
    const double rp1 = std::pow(2.0, p) - 1.0;
    // Hand values from the closed forms above; 1e-9 relative is round-off of the fixed point.
    EXPECT_EQ(g.verdict, ConvergenceVerdict::monotone);
    EXPECT_NEAR(g.ratio_fine, 2.0, 1e-12);
    EXPECT_NEAR(g.order, p, 1e-9);
    EXPECT_EQ(g.safety_factor, 1.25);
    EXPECT_NEAR(g.relative_error, 1.1e-6 / 0.0027056, 1e-9);
    EXPECT_TRUE(g.extrapolated_valid);
    EXPECT_NEAR(g.extrapolated, 0.0027056 - 1.1e-6 / rp1, 1e-12);
    EXPECT_NEAR(g.gci_fine, 1.25 * (1.1e-6 / 0.0027056) / rp1, 1e-9);
    EXPECT_NEAR(g.band, 1.25 * 1.1e-6 / rp1, 1e-15);
    // gci.md's e_a to its three digits.
    EXPECT_NEAR(100.0 * g.relative_error, 0.041, 0.0005);
}

TEST(GridConvergence, UnequalRatiosNeedTheFixedPoint) {
    // r21 = 1.5, r32 = 2 with exact order-2 data phi = 1 + h^2: the first guess (q = 0) is
    // ln(6.75/1.25)/ln 1.5 = 4.16, far from 2.
    const GridConvergence v = grid_convergence({1.0, 1.5, 3.0}, {2.0, 3.25, 10.0});
    EXPECT_NEAR(v.order, 2.0, 1e-9);
    EXPECT_NEAR(v.extrapolated, 1.0, 1e-9);
    EXPECT_EQ(v.verdict, ConvergenceVerdict::monotone);
    // Order 1 data with unequal ratios: phi = 5 + h.
    const GridConvergence w = grid_convergence({0.5, 0.8, 1.3}, {5.5, 5.8, 6.3});
    EXPECT_NEAR(w.order, 1.0, 1e-9);
    EXPECT_NEAR(w.extrapolated, 5.0, 1e-9);
}

TEST(GridConvergence, OrderAboveTheRangeGetsTheConservativeBand) {
    // phi = 1 + h^4 on r = 1.5: p = 4, outside [1, 3].
    const std::array<double, 3> h{1.0, 1.5, 2.25};
    const std::array<double, 3> phi{2.0, 1.0 + std::pow(1.5, 4), 1.0 + std::pow(2.25, 4)};
    const GridConvergence g = grid_convergence(h, phi);
    EXPECT_NEAR(g.order, 4.0, 1e-9);
    EXPECT_EQ(g.verdict, ConvergenceVerdict::order_out_of_range);
    EXPECT_EQ(g.safety_factor, 3.0);
    EXPECT_EQ(g.order_used, 2.0);
    const double roache = 3.0 * (phi[1] - phi[0]) / (1.5 * 1.5 - 1.0);
    EXPECT_NEAR(g.band, std::max(roache, 0.5 * (phi[2] - phi[0])), 1e-12);
    EXPECT_NE(verdict_text(g).find("outside 1-3"), std::string::npos) << verdict_text(g);
}

TEST(GridConvergence, OscillatoryValuesAreNotExtrapolated) {
    const GridConvergence g = grid_convergence({1.0, 1.4, 1.96}, {1.00, 1.02, 0.97});
    EXPECT_EQ(g.verdict, ConvergenceVerdict::oscillatory);
    EXPECT_FALSE(g.extrapolated_valid);
    EXPECT_EQ(g.extrapolated, 1.00);
    EXPECT_EQ(g.safety_factor, 3.0);
    // Roache's 3 |e21| / (r21^2 - 1) = 0.0625 exceeds half the spread (0.025) here ...
    EXPECT_NEAR(g.band, 3.0 * 0.02 / (1.4 * 1.4 - 1.0), 1e-12);
    // ... and half the spread (0.0505) exceeds 3 * 0.001 / 0.96 = 0.0031 here.
    const GridConvergence h = grid_convergence({1.0, 1.4, 1.96}, {1.0, 1.001, 0.9});
    EXPECT_EQ(h.verdict, ConvergenceVerdict::oscillatory);
    EXPECT_NEAR(h.band, 0.0505, 1e-12);
    EXPECT_NE(verdict_text(g).find("oscillatory"), std::string::npos);
}

TEST(GridConvergence, UnchangedAndZeroValues) {
    const GridConvergence same = grid_convergence({1.0, 1.5, 2.25}, {0.3, 0.3, 0.3});
    EXPECT_EQ(same.verdict, ConvergenceVerdict::unchanged);
    EXPECT_EQ(same.band, 0.0);
    // Cl at zero incidence: the relative index is unbounded, the absolute band is not.
    const GridConvergence zero = grid_convergence({1.0, 1.5, 2.25}, {0.0, 1e-4, 3e-4});
    EXPECT_TRUE(std::isinf(zero.gci_fine));
    EXPECT_GT(zero.band, 0.0);
    EXPECT_TRUE(std::isfinite(zero.band));
}

TEST(GridConvergence, ChangesBelowTheIterativeErrorCountAsUnchanged) {
    // NACA 0012 at zero incidence on the error-bar grids of the headline benchmark (measured):
    // Cl -1.7e-10, 2.8e-12 and -3.5e-9, which read as "oscillatory" with a relative index of
    // 1017 % (and still did with a floor of 1e-9).
    const GridConvergence zero =
        grid_convergence({1.0, 1.414, 2.0}, {-1.7316382e-10, 2.8080540e-12, -3.5195299e-09});
    EXPECT_EQ(zero.verdict, ConvergenceVerdict::unchanged);
    EXPECT_EQ(zero.band, 0.0);
    EXPECT_EQ(zero.gci_fine, 0.0);
    // A change just above the level is still a change (Cl near 1: level 1e-7).
    const GridConvergence small =
        grid_convergence({1.0, 1.414, 2.0}, {1.0, 1.0 + 4e-7, 1.0 + 1e-6});
    EXPECT_EQ(small.verdict, ConvergenceVerdict::monotone);
    EXPECT_GT(small.band, 0.0);
}

TEST(GridConvergence, BadInputIsRefusedNamingTheValues) {
    EXPECT_THROW(grid_convergence({1.5, 1.0, 2.0}, {1.0, 1.0, 1.0}), std::invalid_argument);
    EXPECT_THROW(grid_convergence({1.0, 1.5, 2.0}, {1.0, NAN, 1.0}), std::invalid_argument);
    try {
        grid_convergence({1.0, 0.0, 2.0}, {1.0, 1.0, 1.0});
        FAIL() << "a zero spacing was accepted";
    } catch (const std::invalid_argument& e) {
        EXPECT_NE(std::string(e.what()).find("grid 2"), std::string::npos) << e.what();
    }
}

TEST(GridConvergence, RepresentativeSpacingFromCellAreas) {
    const std::vector<double> areas{0.01, 0.03, 0.02, 0.04};  // mean 0.025
    EXPECT_NEAR(representative_spacing(areas), std::sqrt(0.025), 1e-15);
    EXPECT_THROW(representative_spacing(std::vector<double>{}), std::invalid_argument);
}

TEST(GridConvergence, ChangesThatGrowWithRefinementAreDiverging) {
    // NACA 0012, SA, Re 6e6, alpha 10 on 1088 x 320, 768 x 228 and 544 x 160 (measured here):
    // Cl 1.07388, 1.07422, 1.07444. The fine pair differs by 3.4e-4, the coarse pair by 2.2e-4;
    // the absolute value in Celik et al.'s formula turned that into "converging, order 1.32".
    const GridConvergence g =
        grid_convergence({0.27656, 0.38869, 0.54782}, {1.07388, 1.07422, 1.07444});
    EXPECT_EQ(g.verdict, ConvergenceVerdict::diverging);
    EXPECT_FALSE(g.extrapolated_valid);
    EXPECT_EQ(g.extrapolated, 1.07388);
    EXPECT_EQ(g.safety_factor, 3.0);
    EXPECT_EQ(g.order_used, 2.0);
    const double roache = 3.0 * (1.07422 - 1.07388) / (std::pow(0.38869 / 0.27656, 2) - 1.0);
    EXPECT_NEAR(g.band, std::max(roache, 0.5 * (1.07444 - 1.07388)), 1e-12);
    EXPECT_NE(verdict_text(g).find("diverging"), std::string::npos) << verdict_text(g);
    EXPECT_STREQ(verdict_name(g.verdict), "diverging");
    // Just converging on a constant ratio (changes shrinking by 1 %) is not diverging; and on
    // unequal ratios the edge is ln r32 / ln r21, not 1: equal changes over r21 = 1.5, r32 = 1.2
    // converge (the finer step is the longer one in ln h) ...
    EXPECT_EQ(grid_convergence({1.0, 1.4, 1.96}, {1.0, 1.0100, 1.0201}).verdict,
              ConvergenceVerdict::order_out_of_range);
    const GridConvergence unequal = grid_convergence({1.0, 1.5, 1.8}, {1.0, 1.01, 1.02});
    EXPECT_NE(unequal.verdict, ConvergenceVerdict::diverging);
    EXPECT_GT(unequal.order, 0.0);
    // ... while with the ratios the other way round the same values diverge.
    EXPECT_EQ(grid_convergence({1.0, 1.2, 1.8}, {1.0, 1.01, 1.02}).verdict,
              ConvergenceVerdict::diverging);
}

}  // namespace
}  // namespace veer
