/// Lift two ways on a converged laminar NACA 0012 at Re = 1000, alpha = 4 deg, through the
/// `veer run` chain (../verification/run_pipeline.hpp): the surface route against the largest
/// control-volume contour (4 chords) on three nested grids, 128 x 32 -> 256 x 64 -> 512 x 128.
///
/// The two routes are independent discretisations of the same momentum balance (numerics notes,
/// "Forces two ways"), so their difference is a discretisation error: it must shrink with every
/// refinement and be within 1% of Cl on the 512 x 128 grid (the acceptance).
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>
#include <vector>

#include "../verification/run_pipeline.hpp"

namespace veer {
namespace {

struct RouteGap {
    double cl_surface = 0.0;
    double cl_momentum = 0.0;  ///< the largest contour
    double relative = 0.0;     ///< |cl_momentum - cl_surface| / |cl_surface|
    double kutta = 0.0;        ///< trailing-edge Cp difference
    long steps = 0;
};

RouteGap run_grid(const test::CaseGrid& g) {
    const test::PipelineRun run = test::run_pipeline(test::naca0012_case_text(g, 4.0, 6000));
    EXPECT_EQ(run.result.status, RunStatus::converged)
        << g.around << "x" << g.normal << ": " << run.result.steps << " steps";
    const RunAnalysis& a = run.analysis;
    RouteGap out;
    if (a.momentum.size() != 4) {  // default contours 0.5, 1, 2, 4 chords
        ADD_FAILURE() << g.around << "x" << g.normal << ": " << a.momentum.size() << " contours";
        return out;
    }
    out.cl_surface = a.forces.cl.total;
    out.cl_momentum = a.momentum.back().cl.total;  // default contours 0.5, 1, 2, 4 chords
    out.relative = std::abs(out.cl_momentum - out.cl_surface) / std::abs(out.cl_surface);
    out.kutta = a.kutta.difference;
    out.steps = run.result.steps;
    std::cout << g.around << "x" << g.normal << ": " << out.steps << " steps, surface cl "
              << out.cl_surface << ", control volume cl";
    for (const ContourForces& c : a.momentum)
        std::cout << " " << c.cl.total << " (" << c.contour.requested << ")";
    std::cout << ", gap " << 100.0 * out.relative << "%, Kutta dCp " << out.kutta << "\n";
    return out;
}

TEST(LiftTwoWays, SurfaceAndControlVolumeAgreeAndConvergeWithTheGrid) {
    const RouteGap coarse = run_grid(test::grid_128());
    const RouteGap medium = run_grid(test::grid_256());
    const RouteGap fine = run_grid(test::grid_512());
    // Shrinks monotonically with refinement.
    EXPECT_LT(medium.relative, coarse.relative);
    EXPECT_LT(fine.relative, medium.relative);
    // Both routes are second-order discretisations (postprocess/README, solver/README), so their
    // difference must fall at least at first order with the halved cell size; measured about
    // 1.9 and 1.6 (common practice: an observed order below one would point at an inconsistency
    // of one route, not at grid error).
    const double order_coarse = std::log2(coarse.relative / medium.relative);
    const double order_fine = std::log2(medium.relative / fine.relative);
    std::cout << "observed order of the gap: " << order_coarse << ", " << order_fine << "\n";
    EXPECT_GT(order_coarse, 1.0);
    EXPECT_GT(order_fine, 1.0);
    // The acceptance: within 1% of Cl on 512 x 128.
    EXPECT_LT(fine.relative, 0.01);
    // The trailing-edge pressures meet better on finer grids (common practice, Kutta check).
    EXPECT_LT(std::abs(fine.kutta), std::abs(coarse.kutta));
}

}  // namespace
}  // namespace veer
