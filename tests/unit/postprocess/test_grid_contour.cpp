// Contour choice on the grid, its closure, and the rate-of-change term of the momentum balance.
#include <gtest/gtest.h>

#include <cmath>

#include "analytic_flows.hpp"
#include "mesh/grid_metrics.hpp"
#include "postprocess/control_volume.hpp"
#include "postprocess/grid_contour.hpp"
#include "test_cgrid.hpp"

namespace veer {
namespace {

StructuredGrid ellipse_grid() {
    test::TestCGridShape shape;
    shape.wake = 32;
    shape.nj = 32;
    return test::make_test_cgrid(test::ellipse_surface(64, 0.1), shape);
}

TEST(GridContour, PicksTheLinesNearestToTheRequestedDistances) {
    const StructuredGrid grid = ellipse_grid();
    const std::vector<GridContour> contours =
        contours_at_distances(grid, default_contour_distances());
    ASSERT_EQ(contours.size(), 4u);
    for (const GridContour& c : contours) {
        // Neighbouring j lines differ by one stretched step (< 0.6 chords out to 4 chords on this
        // grid), so the nearest line is within half a step of the request: check it is nearer
        // than both of its neighbours.
        const GridContour below = contour_on_lines(grid, c.line_j - 1, c.cut_i);
        const GridContour above = contour_on_lines(grid, c.line_j + 1, c.cut_i);
        EXPECT_LE(std::abs(c.distance - c.requested), std::abs(below.distance - c.requested));
        EXPECT_LE(std::abs(c.distance - c.requested), std::abs(above.distance - c.requested));
        EXPECT_LT(c.distance, above.distance);
        EXPECT_GT(c.wake_crossing, 0.0);
    }
    EXPECT_LT(contours.front().line_j, contours.back().line_j);
    EXPECT_GT(contours.front().cut_i, contours.back().cut_i);  // crossing further downstream
}

TEST(GridContour, RejectsDistancesAndLinesOutsideTheGrid) {
    const StructuredGrid grid = ellipse_grid();
    EXPECT_THROW(contour_at_distance(grid, 0.0), InputError);
    EXPECT_THROW(contour_at_distance(grid, -1.0), InputError);
    EXPECT_THROW(contour_on_lines(grid, 0, 4), InputError);
    EXPECT_THROW(contour_on_lines(grid, 32, 4), InputError);
    EXPECT_THROW(contour_on_lines(grid, 8, 33), InputError);
    // A distance beyond the grid is clamped to the outermost interior line.
    EXPECT_EQ(contour_at_distance(grid, 1e3).line_j, 31);
}

TEST(GridContour, FacesCloseTheContour) {
    const StructuredGrid grid = ellipse_grid();
    const GridMetrics m = compute_metrics(grid);
    const GridContour c = contour_on_lines(grid, 10, 12);
    Vec2 sum, path;
    for (const ContourFace& f : contour_faces(m, grid, c)) {
        sum = sum + f.area_out;
        path = path + f.step();
    }
    // A closed polygon: area vectors and steps sum to zero (round-off of O(1) coordinates).
    EXPECT_NEAR(norm(sum), 0.0, 1e-13);
    EXPECT_NEAR(norm(path), 0.0, 1e-13);
}

/// Shoelace area of the section outline (wall nodes of j = 0).
double section_area(const StructuredGrid& grid) {
    const CGridLayout& c = *grid.c_layout();
    double twice = 0.0;
    for (int i = c.wake; i < c.wake + c.around; ++i)
        twice += cross(grid.node(i, 0), grid.node(i + 1, 0));
    return -0.5 * twice;  // the wall runs clockwise
}

TEST(ControlVolume, UniformlyAcceleratingStreamPushesWithTheDisplacedMass) {
    // du/dt = a everywhere needs dp/dx = -a (Euler), p = -a x. On the section the pressure
    // gradient force is a times its area (the Froude-Krylov force): the balance must find it as
    // pressure minus the rate of change of the fluid momentum inside the contour.
    const StructuredGrid grid = ellipse_grid();
    const GridMetrics m = compute_metrics(grid);
    const double a = 0.2, dt = 0.05, u_now = 1.0;
    FlowFields now = test::sample_potential_flow(m, [&](Vec2) { return Vec2{u_now, 0.0}; });
    FlowFields before = test::sample_potential_flow(m, [&](Vec2) {
        return Vec2{u_now - a * dt, 0.0};
    });
    for (std::size_t c = 0; c < now.pressure.size(); ++c) now.pressure[c] = -a * m.centroid[c].x;
    ControlVolumeOptions options;
    options.previous = &before;
    options.dt = dt;
    const FlowConditions conditions{1000.0, 0.0};
    for (double d : {0.5, 2.0}) {
        const GridContour contour = contour_at_distance(grid, d);
        const ContourForces f = contour_forces(grid, m, now, conditions, contour, options);
        // Linear pressure and uniform velocity are reproduced exactly by the face
        // reconstruction, so only round-off remains.
        EXPECT_NEAR(f.force.x, a * section_area(grid), 1e-12) << "distance " << d;
        EXPECT_NEAR(f.force.y, 0.0, 1e-12);
        EXPECT_LT(f.cd.unsteady, 0.0);
        EXPECT_NEAR(f.cd.momentum_flux, 0.0, 1e-12);
    }
}

}  // namespace
}  // namespace veer
