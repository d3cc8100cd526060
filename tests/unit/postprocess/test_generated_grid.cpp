// The post-processing on grids of the project's own C-grid generator (NACA 0012): the wall,
// contours and wake stations are found from its layout, and the routes agree on an exact flow.
#include <gtest/gtest.h>

#include <cmath>

#include "analytic_flows.hpp"
#include "mesh/cgrid.hpp"
#include "mesh/grid_metrics.hpp"
#include "mesh/naca.hpp"
#include "mesh/section_builder.hpp"
#include "mesh/surface_sampling.hpp"
#include "postprocess/circulation.hpp"
#include "postprocess/control_volume.hpp"
#include "postprocess/surface_distribution.hpp"
#include "postprocess/wake_profiles.hpp"

namespace veer {
namespace {

StructuredGrid naca_grid(int around, int normal, int wake) {
    const Section section = make_section(naca_outline("0012", TrailingEdge::closed), "0012");
    CGridSpec spec;
    spec.around = around;
    spec.normal = normal;
    spec.wake = wake;
    spec.far_field = 20.0;
    spec.first_cell = 2e-3;
    return generate_cgrid(sample_surface(section, around), spec);
}

TEST(GeneratedGrid, ContoursAndCirculationReturnTheVortexLift) {
    const double gamma = 0.25, alpha = 4.0;
    const auto flow = test::uniform_plus_vortex(alpha, gamma, {0.25, 0.0});
    double error[2];
    for (int level = 0; level < 2; ++level) {
        const StructuredGrid grid = naca_grid(64 << level, 24 << level, 16 << level);
        const GridMetrics m = compute_metrics(grid);
        const FlowFields f = test::sample_potential_flow(m, flow);
        const FlowConditions conditions{1000.0, alpha};
        const auto contours = contours_at_distances(grid, default_contour_distances());
        const auto momentum = contour_forces(grid, m, f, conditions, contours);
        const auto circulation = contour_circulation(grid, m, f, contours);
        error[level] = 0.0;
        for (std::size_t k = 0; k < contours.size(); ++k) {
            // Every contour lies within a grid step of its request (the generator's j lines are
            // at constant marched distance, steps growing geometrically).
            EXPECT_NEAR(contours[k].distance, contours[k].requested, 0.5 * contours[k].requested);
            error[level] = std::max({error[level], std::abs(momentum[k].cl.total - 2.0 * gamma),
                                     std::abs(circulation[k].cl - 2.0 * gamma),
                                     std::abs(momentum[k].cd.total)});
        }
    }
    // The error grows with the contour's size, where the cells are largest: measured worst
    // 1.10e-2 (2.2% of cl) on the coarse grid (64 around, 24 normal), 2.21e-3 (0.44%) on the
    // doubled one. Second order gives a ratio near 4 (measured 5.0, the contours shift a little
    // between the grids); demand 3, and 1% of cl on the finer grid.
    EXPECT_LT(error[1], 0.01 * 2.0 * gamma) << error[1];
    EXPECT_LT(error[1], error[0] / 3.0) << error[0] << " " << error[1];
}

TEST(GeneratedGrid, SurfaceAndWakeStationsAreFound) {
    const StructuredGrid grid = naca_grid(128, 48, 32);
    const GridMetrics m = compute_metrics(grid);
    const FlowFields f =
        test::sample_potential_flow(m, test::uniform_plus_vortex(4.0, 0.25, {0.25, 0.0}));
    const SurfaceDistribution d = surface_distribution(grid, m, f, {1000.0, 4.0});
    EXPECT_EQ(d.upper.size(), 64u);
    EXPECT_EQ(d.lower.size(), 64u);
    EXPECT_NEAR(d.upper.front().x, 0.0, 0.01);  // both sides start at the leading edge
    EXPECT_NEAR(d.upper.back().x, 1.0, 0.01);   // and end at the trailing edge
    const auto profiles = wake_profiles(grid, m, f, {1000.0, 4.0});
    ASSERT_EQ(profiles.size(), 3u);
    for (const WakeProfile& p : profiles) {
        EXPECT_GT(p.samples.size(), 20u);
        EXPECT_GT(p.downward_momentum_flux, 0.0);  // the lifting vortex turns the stream down
    }
}

}  // namespace
}  // namespace veer
