// Control-volume and circulation routes on exact potential flows: both must return
// L' = rho U Gamma (Kutta-Joukowski) and no drag, converging at second order on nested C-grids.
#include <gtest/gtest.h>

#include <array>
#include <cmath>
#include <functional>

#include "analytic_flows.hpp"
#include "joukowski_cgrid_flow.hpp"
#include "mesh/grid_metrics.hpp"
#include "postprocess/circulation.hpp"
#include "postprocess/control_volume.hpp"
#include "postprocess/lift_routes.hpp"
#include "postprocess/surface_forces.hpp"
#include "test_cgrid.hpp"

namespace veer {
namespace {

/// An exact flow about a section: outline generator (around cells), velocity, angle, exact cl.
struct ExactCase {
    std::function<std::vector<Vec2>(int)> surface;
    test::VelocityField flow;
    double alpha_deg = 0.0;
    double exact_cl = 0.0;
};

/// Errors of the routes against the exact values on one grid.
struct RouteErrors {
    double cl_momentum = 0.0, cd_momentum = 0.0, cl_circulation = 0.0, viscous = 0.0;
};

/// Grid level l: around = 32 * 2^l, wake = 16 * 2^l, nj = 16 * 2^l; the contour given on level 0
/// lines is scaled with the level, so it is the same curve on every grid.
RouteErrors route_errors(const ExactCase& c, int level, int line_j, int cut_i) {
    test::TestCGridShape shape;
    shape.wake = 16 << level;
    shape.nj = 16 << level;
    const StructuredGrid grid = test::make_test_cgrid(c.surface(32 << level), shape);
    const GridMetrics m = compute_metrics(grid);
    const FlowFields fields = test::sample_potential_flow(m, c.flow);
    const FlowConditions conditions{100.0, c.alpha_deg};  // viscous part must vanish too
    const GridContour contour = contour_on_lines(grid, line_j << level, cut_i << level);
    const ContourForces f = contour_forces(grid, m, fields, conditions, contour);
    const ContourCirculation g = contour_circulation(grid, m, fields, contour);
    return {std::abs(f.cl.total - c.exact_cl), std::abs(f.cd.total), std::abs(g.cl - c.exact_cl),
            std::hypot(f.cl.viscous, f.cd.viscous)};
}

/// Observed order from the errors of two grids a factor 2 apart.
double order(double coarse, double fine) { return std::log2(coarse / fine); }

/// All three routes, and the viscous part (zero for potential flow), converge at second order.
/// Levels 1-3 are the refinement family (level 0 is still pre-asymptotic near the cusp). Measured
/// orders on the pairs (1,2) and (2,3) are 1.93-2.03 for every quantity and contour (e.g. the
/// Joukowski momentum-route cl errors 1.50e-3, 3.77e-4, 9.45e-5): the family is in the
/// asymptotic range, so 1.9 leaves room only for a small higher-order remainder.
void expect_second_order(const ExactCase& c, int line_j, int cut_i) {
    std::array<RouteErrors, 4> e;
    for (std::size_t l = 1; l < 4; ++l) e[l] = route_errors(c, static_cast<int>(l), line_j, cut_i);
    for (std::size_t l = 2; l < 4; ++l) {
        EXPECT_GT(order(e[l - 1].cl_momentum, e[l].cl_momentum), 1.9) << "level " << l;
        EXPECT_GT(order(e[l - 1].cd_momentum, e[l].cd_momentum), 1.9) << "level " << l;
        EXPECT_GT(order(e[l - 1].cl_circulation, e[l].cl_circulation), 1.9) << "level " << l;
        EXPECT_GT(order(e[l - 1].viscous, e[l].viscous), 1.9) << "level " << l;
    }
    // And the finest grid (256 + 2 x 128 by 128 cells) is within 0.1% of the exact lift.
    EXPECT_LT(e[3].cl_momentum, 1e-3 * c.exact_cl);
    EXPECT_LT(e[3].cl_circulation, 1e-3 * c.exact_cl);
}

TEST(ControlVolume, UniformFlowPlusVortexGivesKuttaJoukowskiLift) {
    const double gamma = 0.3, alpha = 5.0;
    const ExactCase c{[](int around) { return test::ellipse_surface(around, 0.1); },
                      test::uniform_plus_vortex(alpha, gamma, {0.25, 0.0}), alpha, 2.0 * gamma};
    expect_second_order(c, 8, 8);   // about 1.1 chords out, crossing the wake 1.3 behind
    expect_second_order(c, 4, 12);  // about 0.3 chords out, crossing the wake 0.3 behind
}

TEST(ControlVolume, JoukowskiFlowGivesKuttaJoukowskiLift) {
    const test::Joukowski section = test::Joukowski{1.0, 0.1, 0.1, 5.0}.prepare();
    // Worked value [D] (Kutta 1902, Joukowski 1906; Katz & Plotkin; joukowski_sections.csv):
    // cl = 1.21807 for mu_x = mu_y = 0.1, alpha = 5 deg, b = 1, chord 4.03360; our re-derivation
    // agrees to the 5 digits given.
    const test::JoukowskiReference ref = test::joukowski_reference(0.1, 5.0);
    EXPECT_NEAR(section.lift_coefficient(), ref.cl, 5e-6);
    EXPECT_NEAR(section.chord(), ref.chord, 5e-6);
    const ExactCase c{[&](int around) { return section.surface(around); },
                      [&](Vec2 p) { return section.velocity(p); }, 5.0, section.lift_coefficient()};
    expect_second_order(c, 8, 8);
    expect_second_order(c, 4, 12);
}

TEST(LiftRoutes, AllThreeRoutesAgreeOnTheJoukowskiFlow) {
    const test::Joukowski section = test::Joukowski{1.0, 0.1, 0.0, 5.0}.prepare();
    const test::SampledFlow sampled = test::joukowski_on_cgrid(section, 256, 32, 128);
    const StructuredGrid& grid = sampled.grid;
    const GridMetrics& m = sampled.metrics;
    const FlowFields& f = sampled.fields;
    // Potential flow slips along the wall, so its two-cell "wall shear" is meaningless: a
    // Reynolds number of 1e12 makes friction (and the contour's viscous part) vanish.
    const FlowConditions conditions{1e12, 5.0};
    const SurfaceForces surface = integrate_surface_forces(grid, m, f, conditions);
    const auto contours = contours_at_distances(grid, default_contour_distances());
    const auto rows = compare_routes(surface, contour_forces(grid, m, f, conditions, contours),
                                     contour_circulation(grid, m, f, contours));
    ASSERT_EQ(rows.size(), 4u);
    for (const RouteComparison& r : rows) {
        EXPECT_DOUBLE_EQ(r.cl_momentum_difference, r.cl_momentum - surface.cl.total);
        EXPECT_DOUBLE_EQ(r.cl_circulation_difference, r.cl_circulation - surface.cl.total);
        // Each route is within about 1e-3 of the exact cl on this grid (the convergence tests
        // above and in test_surface_forces.cpp), so they agree within 0.5% of cl with room
        // (measured differences 1.0e-4 to 1.7e-4 in cl, 2.5e-4 to 3.2e-4 in cd).
        EXPECT_LT(std::abs(r.cl_momentum_difference), 5e-3 * section.lift_coefficient());
        EXPECT_LT(std::abs(r.cl_circulation_difference), 5e-3 * section.lift_coefficient());
        EXPECT_LT(std::abs(r.cd_momentum_difference), 5e-3);
    }
}

}  // namespace
}  // namespace veer
