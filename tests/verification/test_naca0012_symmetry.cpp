/// NACA 0012, steady laminar flow at Re = 1000 on a coarse C-grid: symmetry checks of the whole
/// chain (wake cut, far field with the point vortex, pseudo-time marching) and the independence
/// of the steady state from the pseudo-time step.
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>

#include "airfoil_grid.hpp"
#include "mesh/grid_metrics.hpp"
#include "postprocess/surface_forces.hpp"
#include "solver/flow_solver.hpp"
#include "steady_driver.hpp"

namespace veer {
namespace {

struct SteadyResult {
    SurfaceForces forces;
    double circulation = 0.0;
    long steps = 0;
};

const StructuredGrid& coarse_grid() {
    static const StructuredGrid grid = test::naca0012_cgrid(128, 32, 24, 20.0, 4e-3);
    return grid;
}

SteadyResult run_steady(double alpha, double pseudo_cfl, double tol) {
    const StructuredGrid& grid = coarse_grid();
    SolverSettings s;
    s.mode = TimeMode::steady;
    s.pseudo_cfl = pseudo_cfl;
    const FlowConditions fc{1000.0, alpha};
    FlowSolver solver(grid, fc, s);
    const StepReport r = test::march_to_steady(solver, tol, 4000);
    EXPECT_TRUE(r.finite);
    EXPECT_LT(std::max(r.residual_u, r.residual_v), tol) << "alpha " << alpha;
    SteadyResult out;
    out.forces = integrate_surface_forces(grid, compute_metrics(grid), solver.fields(), fc);
    out.circulation = solver.far_field_circulation();
    out.steps = r.step;
    return out;
}

TEST(Naca0012Steady, ZeroIncidenceGivesNoLiftAndNoMoment) {
    const SteadyResult r = run_steady(0.0, 5.0, 1e-9);
    std::cout << "alpha 0: cl " << r.forces.cl.total << " cm " << r.forces.cm.total << " cd "
              << r.forces.cd.total << " (" << r.steps << " steps)\n";
    // The grid is symmetric up to the generator's round-off; 1e-4 is the bound.
    EXPECT_LT(std::abs(r.forces.cl.total), 1e-4);
    EXPECT_LT(std::abs(r.forces.cm.total), 1e-4);
    EXPECT_GT(r.forces.cd.total, 0.0);
}

TEST(Naca0012Steady, OppositeIncidenceFlipsLiftAndMoment) {
    const SteadyResult up = run_steady(4.0, 5.0, 1e-9), down = run_steady(-4.0, 5.0, 1e-9);
    std::cout << "alpha +4: cl " << up.forces.cl.total << " cm " << up.forces.cm.total
              << "; alpha -4: cl " << down.forces.cl.total << " cm " << down.forces.cm.total
              << "; far-field circulation " << up.circulation << "\n";
    EXPECT_GT(up.forces.cl.total, 0.05);
    // Mirror images: equal magnitudes to well within the residual level (1e-9 per step).
    EXPECT_NEAR(up.forces.cl.total, -down.forces.cl.total, 1e-6);
    EXPECT_NEAR(up.forces.cm.total, -down.forces.cm.total, 1e-6);
    EXPECT_NEAR(up.forces.cd.total, down.forces.cd.total, 1e-6);
    // The solver's own lift estimate (far-field vortex) and the surface route agree to the
    // difference of their wall-pressure treatments (first-order cell value against the
    // post-processor's extrapolation): a few percent on this coarse grid.
    EXPECT_NEAR(2.0 * up.circulation, up.forces.cl.total, 0.05 * up.forces.cl.total);
}

TEST(Naca0012Steady, SteadyStateDoesNotDependOnThePseudoTimeStep) {
    const SteadyResult a = run_steady(4.0, 3.0, 1e-13), b = run_steady(4.0, 8.0, 1e-13);
    std::cout << "pseudo CFL 3: cl " << a.forces.cl.total << " (" << a.steps
              << " steps); pseudo CFL 8: cl " << b.forces.cl.total << " (" << b.steps
              << " steps)\n";
    // Both runs are converged to round-off (residual 1e-13): what is left is round-off.
    EXPECT_NEAR(a.forces.cl.total, b.forces.cl.total, 1e-10);
    EXPECT_NEAR(a.forces.cd.total, b.forces.cd.total, 1e-10);
}

}  // namespace
}  // namespace veer
