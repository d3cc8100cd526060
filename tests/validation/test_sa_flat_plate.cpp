/// Spalart-Allmaras validation: the zero-pressure-gradient flat plate at Re = 5e6 per unit length
/// (the NASA Turbulence Modeling Resource case "2D Zero Pressure Gradient Flat Plate", SA
/// results; values in tests/reference/tmr_flat_plate_sa.csv), with a three-grid convergence
/// study by the grid convergence index (Celik et al. 2008, J. Fluids Eng. 130, 078001).
///
/// Set-up and its differences from the resource's: ../verification/sa_plate_run.hpp (the same
/// run serves the short default-suite check, test_sa_flat_plate_short.cpp). The resource's case
/// is at M = 0.2 and warns that an incompressible code will be close to, not exactly on, its
/// result: 2% holds that difference and our upstream boundary (free stream in place of a symmetry
/// plane); the extrapolated value and the GCI show how much of it is grid error.
///
/// Grids are modest for CI (finest 170 x 113 cells, first cell 3.5e-6, y+ ~ 0.3): the resource's
/// own 137 x 97-node grid is already within 0.3% of its finest (tmr_flat_plate_sa_grid_family.csv).
///
/// Printed, not gated: Cf(Re_x) beside the turbulent flat-plate 1/5-power law
/// Cf = 0.0592 Re_x^(-1/5) (Prandtl; Schlichting, Boundary-Layer Theory) (memory).
#include <gtest/gtest.h>

#include <array>
#include <cmath>
#include <iostream>

#include "../verification/sa_plate_run.hpp"
#include "postprocess/grid_convergence.hpp"
#include "tests/reference_table.hpp"

namespace veer {
namespace {

/// Turbulent flat-plate skin friction, the 1/5-power law (memory): printed beside the results.
double power_law_cf(double re_x) { return 0.0592 * std::pow(re_x, -0.2); }

TEST(SaFlatPlate, SkinFrictionAgainstTmrWithGridConvergence) {
    const test::ReferenceTable tmr = test::ReferenceTable::read("tmr_flat_plate_sa.csv", 6);
    const double station = tmr.value("station_x"), tmr_cf = tmr.value("cf_code_1");
    // Three grids of one construction, cell counts divided by about sqrt(2) each way (ratio
    // >= 1.3 as Celik et al. 2008 ask) and the first cell grown by the same factor. (A 60 x 40
    // grid of the same family settles into a limit cycle instead of converging; see the SA notes
    // in solver/README.)
    const std::array<test::PlateGridSpec, 3> grids = {
        test::sa_plate_spec(34, 136, 113, 5e-6 / 1.41), test::sa_plate_spec(24, 96, 80, 5e-6),
        test::sa_plate_spec(17, 68, 57, 5e-6 * 1.41)};
    std::array<double, 3> h{}, cf{};
    test::SaPlateResult finest;
    for (std::size_t k = 0; k < grids.size(); ++k) {
        const test::PlateGridSpec& g = grids[k];
        const test::SaPlateResult r = test::run_sa_plate(g, 3000);
        ASSERT_TRUE(r.converged) << "grid " << k << " not converged in " << r.steps << " steps";
        const int cells = (g.upstream + g.on_plate) * g.normal;  // the grid the run used
        // h = (area / N)^(1/2): every grid covers the same area (2.33 x 1).
        h[k] = std::sqrt((g.upstream_length + g.plate_length) * g.height / cells);
        cf[k] = r.cf_at(station);
        std::cout << "flat plate " << g.upstream + g.on_plate << "x" << g.normal << ": " << r.steps
                  << " steps, h " << h[k] << ", Cf(" << station << ") = " << cf[k] << " (TMR "
                  << tmr_cf << ", " << 100.0 * (cf[k] / tmr_cf - 1.0) << "%)\n";
        if (k == 0) finest = r;
    }
    EXPECT_NEAR(cf[0] / tmr_cf, 1.0, 0.02);

    // Printed only: the power law is recalled from memory (see the file comment).
    ASSERT_FALSE(finest.x.empty());
    for (std::size_t k = 0; k < finest.x.size(); k += 8) {
        const double re_x = test::sa_plate_reynolds * finest.x[k], law = power_law_cf(re_x);
        std::cout << "  Re_x " << re_x << " Cf " << finest.cf[k] << ", power law (memory) " << law
                  << " (" << 100.0 * (finest.cf[k] / law - 1.0) << "%)\n";
    }

    const GridConvergence g = grid_convergence(h, cf);
    std::cout << "  GCI: refinement ratios " << h[1] / h[0] << ", " << h[2] / h[1]
              << "; p = " << g.order << ", extrapolated " << g.extrapolated << " ("
              << 100.0 * (g.extrapolated / tmr_cf - 1.0)
              << "% from TMR), GCI_fine = " << 100.0 * g.gci_fine << "%"
              << " (" << verdict_name(g.verdict) << ")"
              << "\n";
    // The fine grid's numerical uncertainty must be well inside the 2% validation band, and the
    // extrapolated value within the band too.
    EXPECT_LT(g.gci_fine, 0.01);
    EXPECT_NEAR(g.extrapolated / tmr_cf, 1.0, 0.02);
}

}  // namespace
}  // namespace veer
