// The far-boundary force check: the momentum balance on the largest contour a C-grid holds
// (postprocess/outermost_contour.hpp) lies on the last interior grid lines and returns the lift
// of an exact potential flow (Kutta-Joukowski, rho U Gamma).
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>

#include "analytic_flows.hpp"
#include "joukowski_cgrid_flow.hpp"
#include "mesh/grid_metrics.hpp"
#include "postprocess/outermost_contour.hpp"
#include "postprocess/surface_forces.hpp"
#include "test_cgrid.hpp"

namespace veer {
namespace {

TEST(OutermostContour, LiesOnTheLastInteriorLinesAndBalancesTheJoukowskiLift) {
    const test::Joukowski section = test::Joukowski{1.0, 0.1, 0.0, 5.0}.prepare();
    const test::SampledFlow sampled = test::joukowski_on_cgrid(section, 256, 32, 128);
    const StructuredGrid& grid = sampled.grid;
    const GridMetrics& m = sampled.metrics;
    const FlowFields& f = sampled.fields;
    const GridContour c = outermost_contour(grid);
    EXPECT_EQ(c.line_j, grid.nj() - 1);  // the largest j line a contour may use
    EXPECT_EQ(c.cut_i, 1);               // and the wake crossing nearest the outlets
    EXPECT_GT(c.distance, contour_on_lines(grid, grid.nj() - 2, 1).distance);
    // Reynolds 1e12: potential flow has no meaningful wall shear (as in test_control_volume).
    const FlowConditions conditions{1e12, 5.0};
    const SurfaceForces surface = integrate_surface_forces(grid, m, f, conditions);
    const RouteComparison r = outermost_route(grid, m, f, conditions, surface);
    EXPECT_EQ(r.contour.line_j, c.line_j);
    EXPECT_DOUBLE_EQ(r.cl_momentum_difference, r.cl_momentum - surface.cl.total);
    // The routes on this grid are within about 1e-3 of the exact cl (test_control_volume.cpp's
    // convergence tests); 0.5 % of cl leaves room for the coarser cells far out.
    EXPECT_LT(std::abs(r.cl_momentum - section.lift_coefficient()),
              5e-3 * section.lift_coefficient());
    EXPECT_LT(std::abs(r.cd_momentum), 5e-3);
    std::cout << "outermost contour at " << c.distance << " chords: cl " << r.cl_momentum
              << " (exact " << section.lift_coefficient() << "), cd " << r.cd_momentum << "\n";
}

}  // namespace
}  // namespace veer
