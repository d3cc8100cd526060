// First-cell height from a wanted y+ (turbulent flat-plate correlation).
#include <gtest/gtest.h>

#include <cmath>

#include "mesh/errors.hpp"
#include "mesh/wall_spacing.hpp"

namespace veer {
namespace {

TEST(WallSpacing, SkinFrictionFollowsTheCorrelation) {
    // Schlichting's formula (memory), Cf = (2 log10 Re - 0.65)^-2.3, evaluated by hand:
    // Re = 1e6: (12 - 0.65)^-2.3 = 11.35^-2.3 = 3.746e-3.
    EXPECT_NEAR(flat_plate_skin_friction(1e6), 3.746e-3, 1e-6);
    EXPECT_GT(flat_plate_skin_friction(1e5), flat_plate_skin_friction(1e7));
}

TEST(WallSpacing, FirstCellGivesTheWantedYPlus) {
    for (double re : {1e5, 1e6, 6e6}) {
        const double y = first_cell_for_y_plus(1.0, re);
        const double u_tau = std::sqrt(0.5 * flat_plate_skin_friction(re));
        // y+ = y u_tau Re (U = 1, chord = 1): identity up to round-off.
        EXPECT_NEAR(y * u_tau * re, 1.0, 1e-12);
        EXPECT_NEAR(first_cell_for_y_plus(30.0, re), 30.0 * y, 1e-15);  // linear in y+
    }
    // Re = 1e6, y+ = 1: 1 / (1e6 sqrt(3.746e-3 / 2)) = 2.311e-5 chords (hand value, above).
    EXPECT_NEAR(first_cell_for_y_plus(1.0, 1e6), 2.311e-5, 1e-8);
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
