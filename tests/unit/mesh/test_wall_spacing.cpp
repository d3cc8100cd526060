// First-cell height from a wanted y+ (turbulent flat-plate correlation). The y+ a run reaches
// with it is checked in tests/smoke/test_shipped_cases.cpp.
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>

#include "mesh/errors.hpp"
#include "mesh/wall_spacing.hpp"
#include "tests/reference_table.hpp"

namespace veer {
namespace {

TEST(WallSpacing, SkinFrictionCorrelationAgainstThePublishedFlatPlate) {
    // The mesher's correlation is Schlichting's formula as recalled (memory), Cf = (2 log10 Re
    // - 0.65)^-2.3: printed, not gated. The gate is a published turbulent flat-plate value: SA on
    // the NASA Turbulence Modeling Resource's finest grid, Cf = 0.0027056 at Re_x = 5e6 x
    // 0.970084071 [P] (tests/reference/tmr_flat_plate_sa.csv). 10%: the correlation only sets a
    // first-cell height, and y+ goes with sqrt(Cf), so 10% in Cf is 5% in the first cell's y+
    // (common practice: a y+ target near 1 is met to tens of percent); measured 6.5% above.
    const test::ReferenceTable tmr = test::ReferenceTable::read("tmr_flat_plate_sa.csv", 6);
    const double re_x = tmr.value("reynolds_per_unit_length") * tmr.value("station_x");
    const double ours = flat_plate_skin_friction(re_x), published = tmr.value("cf_code_1");
    std::cout << "correlation Cf(" << re_x << ") = " << ours << ", TMR flat plate SA " << published
              << " (" << 100.0 * (ours / published - 1.0)
              << "%); Re 1e6: " << flat_plate_skin_friction(1e6)
              << " (the recalled formula by hand: 3.746e-3)\n";
    EXPECT_NEAR(ours / published, 1.0, 0.10);
    // Turbulent skin friction falls with the Reynolds number (common practice).
    EXPECT_GT(flat_plate_skin_friction(1e5), flat_plate_skin_friction(1e6));
    EXPECT_GT(flat_plate_skin_friction(1e6), flat_plate_skin_friction(1e7));
}

TEST(WallSpacing, FirstCellGivesTheWantedYPlus) {
    for (double re : {1e5, 1e6, 6e6}) {
        const double y = first_cell_for_y_plus(1.0, re);
        const double u_tau = std::sqrt(0.5 * flat_plate_skin_friction(re));
        // y+ = y u_tau Re (U = 1, chord = 1): identity up to round-off.
        EXPECT_NEAR(y * u_tau * re, 1.0, 1e-12);
        EXPECT_NEAR(first_cell_for_y_plus(30.0, re), 30.0 * y, 1e-15);  // linear in y+
    }
}

TEST(WallSpacing, OutOfRangeIsRefusedNamingTheKey) {
    try {
        (void)first_cell_for_y_plus(-1.0, 1e6);
        ADD_FAILURE() << "accepted y_plus = -1";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("y_plus"), std::string::npos);
    }
    try {
        (void)first_cell_for_y_plus(1.0, 10.0);
        ADD_FAILURE() << "accepted reynolds = 10";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("reynolds"), std::string::npos);
    }
}

}  // namespace
}  // namespace veer
