/// NACA 0012, Re = 1000, alpha = 4: with the point-vortex far-field correction (Thomas & Salas
/// 1986, AIAA J. 24(7), 1074-1080) Cl barely depends on the far-field distance. The issue's
/// bound: 20 against 80 chords, Cl within 0.5%.
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

double lift_with_far_field(double far_field, int normal) {
    // Same surface cells and first cell; `normal` keeps the layer growth similar (~1.2).
    const StructuredGrid grid = test::naca0012_cgrid(128, normal, 24, far_field, 4e-3);
    SolverSettings s;
    s.mode = TimeMode::steady;
    const FlowConditions fc{1000.0, 4.0};
    FlowSolver solver(grid, fc, s);
    const StepReport r = test::march_to_steady(solver, 1e-8, 4000);
    EXPECT_TRUE(r.finite);
    EXPECT_LT(std::max(r.residual_u, r.residual_v), 1e-8) << "far field " << far_field;
    return integrate_surface_forces(grid, compute_metrics(grid), solver.fields(), fc).cl.total;
}

TEST(Naca0012FarField, LiftBarelyDependsOnFarFieldDistance) {
    const double near = lift_with_far_field(20.0, 40), far = lift_with_far_field(80.0, 48);
    const double change = std::abs(near - far) / std::abs(far);
    std::cout << "Cl with far field 20 chords " << near << ", 80 chords " << far
              << ", relative change " << change << "\n";
    EXPECT_LT(change, 0.005);
}

}  // namespace
}  // namespace veer
