/// The grid convergence index helper of the SA validation, on the flat-plate SA Cf of the NASA
/// Turbulence Modeling Resource in tests/reference/tmr_flat_plate_sa_grid_family.csv [D]: grids of
/// 13056, 52224 and 208896 cells (refinement ratio exactly 2), Cf = 0.0027112, 0.0027067,
/// 0.0027056.
///
/// From these seven-digit values the procedure gives, by hand: p = ln(45 / 11) / ln 2 = 2.0324
/// (q = 0 for a constant ratio), e_a = 1.1e-6 / 0.0027056 = 0.0407%, phi_ext = phi1 - 1.1e-6 /
/// (2^p - 1), GCI_fine = 1.25 e_a / (2^p - 1) = 0.0164%. gci.md's worked figures (p = 1.98,
/// e_ext = 0.014%, GCI 0.017%) agree with these to the digits the rounded Cf values carry
/// (a shift of 1e-8 in one Cf moves p by 0.02); e_a agrees exactly.
#include "test_sa_gci.hpp"

#include <gtest/gtest.h>

#include <cmath>
#include <iostream>

#include "tests/reference_table.hpp"

namespace veer {
namespace {

TEST(SaGridConvergenceIndex, FlatPlateValuesByHand) {
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
    const test::GciResult g = test::grid_convergence_index(h, cf);
    const double p = std::log(45.0 / 11.0) / std::log(2.0);
    const double rp1 = std::pow(2.0, p) - 1.0;
    // Hand values from the closed forms above; 1e-9 relative is round-off of the fixed point.
    EXPECT_NEAR(g.order, p, 1e-9);
    EXPECT_NEAR(g.relative_error, 1.1e-6 / 0.0027056, 1e-9);
    EXPECT_NEAR(g.extrapolated, 0.0027056 - 1.1e-6 / rp1, 1e-12);
    EXPECT_NEAR(g.gci_fine, 1.25 * (1.1e-6 / 0.0027056) / rp1, 1e-9);
    // gci.md's e_a to its three digits.
    EXPECT_NEAR(100.0 * g.relative_error, 0.041, 0.0005);
    EXPECT_FALSE(g.oscillatory);
    // A varying ratio needs the fixed point: r21 = 1.5, r32 = 2 with exact p = 2 data.
    const test::GciResult v =
        test::grid_convergence_index({1.0, 1.5, 3.0}, {1.0 + 1.0, 1.0 + 2.25, 1.0 + 9.0});
    EXPECT_NEAR(v.order, 2.0, 1e-9);
    EXPECT_NEAR(v.extrapolated, 1.0, 1e-9);
}

}  // namespace
}  // namespace veer
