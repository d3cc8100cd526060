/// Laminar flat plate at zero incidence: the steady solver's wall shear, evaluated by the same
/// post-processing as every run report (postprocess/wall_faces), against the Blasius skin
/// friction Cf = 0.664 / sqrt(Re_x) (Blasius 1908, Z. Math. Phys. 56, 1-37; White, Viscous Fluid
/// Flow; tests/reference/blasius1908_flat_plate.csv), and the plate's drag through the surface
/// force integration (postprocess/surface_forces) against the one-side drag 1.328 / sqrt(Re_L).
///
/// Re = 1e5 on the plate length (the issue asks for >= 1e4). Blasius is the first term of the
/// boundary-layer expansion; the leading-edge correction of the next order raises Cf by about
/// 3.5 / sqrt(Re_x), i.e. Cf = 0.664 Re_x^-1/2 + 2.33 Re_x^-1 (Imai 1957, J. Aeronaut. Sci. 24,
/// 155-156) (memory): 2.2% at Re_x = 2.5e4, 1.3% at 7.5e4. At Re_L = 1e4 that correction alone
/// would be 5-7% over the middle of the plate, hence the larger Reynolds number.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <iostream>
#include <vector>

#include "app/convergence.hpp"
#include "mesh/grid_metrics.hpp"
#include "plate_grid.hpp"
#include "postprocess/surface_forces.hpp"
#include "postprocess/wall_faces.hpp"
#include "solver/flow_solver.hpp"
#include "tests/reference_table.hpp"

namespace veer {
namespace {

constexpr double reynolds = 1e5;  // per plate length, U_inf = 1

/// Blasius 1908 (blasius1908_flat_plate.csv): local Cf coefficient 0.664, one-side drag 1.328.
const test::ReferenceTable& blasius() {
    static const test::ReferenceTable t =
        test::ReferenceTable::read("blasius1908_flat_plate.csv", 3);
    return t;
}

/// Blasius skin friction, Cf = 0.664 / sqrt(Re_x).
double blasius_cf(double re_x) { return blasius().value("local_cf_coefficient") / std::sqrt(re_x); }

struct PlateRun {
    bool converged = false;
    long steps = 0;
    std::vector<WallFaceState> wall;
    SurfaceForces forces;  ///< the report's surface integration over the plate
};

/// Steady pseudo-time marching to the criteria of `veer run` (app/convergence.hpp defaults:
/// residuals down by 1e-6 from the largest of the first 20 steps, and the force settled to 1e-5
/// over 100 steps; the force is the plate's friction drag here, there is no lift).
PlateRun run_plate(const StructuredGrid& grid) {
    SolverSettings s;
    s.mode = TimeMode::steady;
    s.velocity_overrides.push_back(moving_wall("upstream", {1.0, 0.0}));
    const FlowConditions conditions{reynolds, 0.0};
    FlowSolver solver(grid, conditions, s);
    const GridMetrics metrics = compute_metrics(grid);
    ConvergenceMonitor monitor(ConvergenceCriteria{});
    PlateRun out;
    for (long n = 0; n < 6000 && !out.converged; ++n) {
        const StepReport r = solver.advance_pseudo_time();
        if (!r.finite) break;
        double drag = 0.0;
        for (const WallFaceState& f : evaluate_wall_faces(grid, metrics, solver.fields(),
                                                          conditions, WallPressure::extrapolated))
            drag += 2.0 * f.shear * f.length;
        out.converged = monitor.add({step_residuals(r), 0.0, drag});
        out.steps = r.step;
    }
    out.wall =
        evaluate_wall_faces(grid, metrics, solver.fields(), conditions, WallPressure::extrapolated);
    out.forces = integrate_surface_forces(grid, metrics, solver.fields(), conditions);
    return out;
}

/// Cf / Blasius over the middle of the plate, clear of the leading-edge singularity and of the
/// outlet, printed every eighth face; returns the ratios there.
std::vector<double> middle_ratios(const PlateRun& r, const char* label) {
    std::cout << label << ": converged " << r.converged << " in " << r.steps << " steps\n";
    std::vector<double> ratios;
    for (std::size_t k = 0; k < r.wall.size(); ++k) {
        const WallFaceState& f = r.wall[k];
        const double x = f.center.x, re_x = reynolds * x;
        const double cf = 2.0 * f.shear;  // q_inf = 1/2; +i runs downstream along the plate
        const double ratio = cf / blasius_cf(re_x);
        if (k % 16 == 0)
            std::cout << "  x " << x << " Re_x " << re_x << " Cf " << cf << " Blasius "
                      << blasius_cf(re_x) << " (" << 100.0 * (ratio - 1.0) << "%)\n";
        if (x >= 0.25 && x <= 0.75) ratios.push_back(ratio);
    }
    return ratios;
}

TEST(LaminarFlatPlate, SkinFrictionFollowsBlasiusOverTheMiddleOfThePlate) {
    // 24 + 96 cells along, 64 across a domain one plate length high; first cell 1e-4, so the
    // first centroid sits at eta = y sqrt(Re / x) = 0.03 to 0.07 over the checked stretch and the
    // boundary layer (delta_99 = 5 x / sqrt(Re_x), the Blasius thickness rounded: common practice;
    // 0.008 at x = 0.25) holds about 20 cells.
    test::PlateGridSpec spec;
    spec.first_cell = 1e-4;
    const PlateRun r = run_plate(test::flat_plate_grid(spec));
    ASSERT_TRUE(r.converged) << "not converged in " << r.steps << " steps";
    const std::vector<double> ratios = middle_ratios(r, "laminar flat plate 120x64, Re_L 1e5");
    ASSERT_GT(ratios.size(), 10u) << "too few wall faces in the checked stretch";
    double worst = 0.0;
    for (double q : ratios) {
        // The band: 5%, which holds the next-order leading-edge correction (1.3-2.2%,
        // see the file comment) and the grid's discretisation error (below).
        EXPECT_NEAR(q, 1.0, 0.05);
        worst = std::max(worst, std::abs(q - 1.0));
    }
    std::cout << "  compared " << ratios.size() << " wall faces; largest deviation over 0.25 <= x "
              << "<= 0.75: " << 100.0 * worst << "%\n";

    // The plate's drag through the force integration every run report uses: friction only,
    // against the Blasius drag of one side, 1.328 / sqrt(Re_L) (blasius1908_flat_plate.csv [D]).
    const double blasius_drag = blasius().value("one_side_drag_coefficient") / std::sqrt(reynolds);
    std::cout << "  drag: friction " << r.forces.cd.friction << ", pressure "
              << r.forces.cd.pressure << "; Blasius " << blasius_drag << " ("
              << 100.0 * (r.forces.cd.friction / blasius_drag - 1.0) << "%)\n";
    // 5%, the band of the local Cf above: measured 3.15% high on this grid and 3.17% on the
    // 240 x 128 one (so not grid error): the local Cf lies 1-1.5% above Blasius over the middle
    // of the plate and 2-5% above it near the leading edge, where the next-order correction of
    // the boundary-layer expansion grows (file comment). A flipped, halved or doubled wall shear
    // is far outside.
    EXPECT_NEAR(r.forces.cd.friction / blasius_drag, 1.0, 0.05);
    EXPECT_NEAR(r.forces.cd.pressure, 0.0, 1e-3 * blasius_drag);  // a plate at zero incidence

    // The same plate with twice the cells each way and half the first cell: the comparison must
    // not owe its result to the grid. Face k of the coarse grid spans faces 2k, 2k+1 of the fine
    // one; Cf varies by under 1% across a coarse face here, so the change in the face means,
    // bounded by 0.5% (a third of the smallest deviation from Blasius above), is grid error.
    test::PlateGridSpec fine = spec;
    fine.upstream *= 2;
    fine.on_plate *= 2;
    fine.normal *= 2;
    fine.first_cell *= 0.5;
    const PlateRun rf = run_plate(test::flat_plate_grid(fine));
    ASSERT_TRUE(rf.converged) << "fine grid not converged in " << rf.steps << " steps";
    middle_ratios(rf, "laminar flat plate 240x128");
    std::cout << "  drag on 240x128: friction " << rf.forces.cd.friction << " ("
              << 100.0 * (rf.forces.cd.friction / blasius_drag - 1.0) << "% from Blasius)\n";
    double largest_change = 0.0;
    for (std::size_t k = 0; k < r.wall.size(); ++k) {
        const double x = r.wall[k].center.x;
        if (x < 0.25 || x > 0.75) continue;
        const WallFaceState &a = rf.wall[2 * k], &b = rf.wall[2 * k + 1];
        const double fine_mean = (a.shear * a.length + b.shear * b.length) / (a.length + b.length);
        largest_change = std::max(largest_change, std::abs(fine_mean / r.wall[k].shear - 1.0));
    }
    std::cout << "  largest change of the face-mean Cf on refinement: " << 100.0 * largest_change
              << "%\n";
    EXPECT_LT(largest_change, 0.005);
}

}  // namespace
}  // namespace veer
