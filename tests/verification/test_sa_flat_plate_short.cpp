/// A short Spalart-Allmaras check for the default suite that reacts to the model's constants: the
/// NASA Turbulence Modeling Resource flat plate (sa_plate_run.hpp) on the middle grid of the
/// validation family (120 x 80 cells; tests/validation/test_sa_flat_plate.cpp), two figures:
///
/// 1. Published: Cf at x = 0.970084071 against the resource's 0.0027056 [P] (flat plate SA,
///    finest grid; tests/reference/tmr_flat_plate_sa.csv), within the 2% of the validation test.
///    That band holds the incompressible / M = 0.2 difference and our upstream boundary, and is
///    too wide to see a wrong constant: c_b1 = 0.12 instead of 0.1355 moves Cf there by -2.0%,
///    closer to the published value (measured 0.00268075 against 0.00273609).
/// 2. Self-consistency, not a published value: Cf at six stations against veer's own run of the
///    same plate on the finest grid of the family (170 x 113 cells, first cell 3.5e-6, 323 steps
///    to residuals 1e-6 of their reference; run with this file's code on branch
///    i18-tests-own-data, the values below copied from its output). The 120 x 80 grid lies
///    0.13-0.14% above it at every station, so 0.8% (six times that) is the band; c_b1 = 0.12
///    moves the stations by -1.8% (x = 1.5) to -3.1% (x = 0.05) from it.
/// If a change of the numerics moves the fine-grid values, re-run the 170 x 113 grid (the
/// validation test prints its Cf(0.97)) and update the table with the commit that did it.
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>

#include "sa_plate_run.hpp"
#include "tests/reference_table.hpp"

namespace veer {
namespace {

struct FineGridCf {
    double x, cf;
};

/// veer's 170 x 113 run of this plate (see the file comment): stations and Cf.
constexpr FineGridCf fine_grid_cf[] = {{0.05, 0.00423637},        {0.1, 0.00384106},
                                       {0.2, 0.00345817},         {0.5, 0.0030113},
                                       {0.970084071, 0.00273242}, {1.5, 0.00256694}};

TEST(SaFlatPlateShort, SkinFrictionAgainstTmrAndTheFineGrid) {
    const test::ReferenceTable tmr = test::ReferenceTable::read("tmr_flat_plate_sa.csv", 6);
    const double station = tmr.value("station_x"), tmr_cf = tmr.value("cf_code_1");
    EXPECT_EQ(tmr.value("reynolds_per_unit_length"), test::sa_plate_reynolds);
    const test::SaPlateResult r = test::run_sa_plate(test::sa_plate_spec(24, 96, 80, 5e-6), 3000);
    ASSERT_TRUE(r.converged) << "not converged in " << r.steps << " steps";
    ASSERT_EQ(r.x.size(), 96u) << "one wall face per plate cell";
    const double cf = r.cf_at(station);
    std::cout << "SA flat plate 120x80: " << r.steps << " steps, Cf(" << station << ") = " << cf
              << " (TMR " << tmr_cf << ", " << 100.0 * (cf / tmr_cf - 1.0) << "%)\n";
    EXPECT_NEAR(cf / tmr_cf, 1.0, 0.02);

    int compared = 0;
    for (const FineGridCf& f : fine_grid_cf) {
        const double ours = r.cf_at(f.x);
        std::cout << "  x " << f.x << ": Cf " << ours << ", 170x113 " << f.cf << " ("
                  << 100.0 * (ours / f.cf - 1.0) << "%)\n";
        EXPECT_NEAR(ours / f.cf, 1.0, 0.008) << "x " << f.x;
        ++compared;
    }
    std::cout << "  compared 1 published value and " << compared << " fine-grid stations\n";
}

}  // namespace
}  // namespace veer
