// Surface route: exact lift of the Joukowski section, exact wall-shear reconstruction, moment
// sign and transfer.
#include <gtest/gtest.h>

#include <cmath>

#include "analytic_flows.hpp"
#include "mesh/grid_metrics.hpp"
#include "postprocess/surface_forces.hpp"
#include "test_cgrid.hpp"

namespace veer {
namespace {

struct JoukowskiCase {
    StructuredGrid grid;
    GridMetrics metrics;
    FlowFields fields;
};

JoukowskiCase joukowski_case(const test::Joukowski& section, int level) {
    test::TestCGridShape shape;
    shape.wake = 8 << level;
    shape.nj = 32 << level;
    shape.normal_stretch = 5.0;  // first cell about 2e-3 chords on the finest grid
    JoukowskiCase c;
    c.grid = test::make_test_cgrid(section.surface(64 << level), shape);
    c.metrics = compute_metrics(c.grid);
    c.fields = test::sample_potential_flow(c.metrics, [&](Vec2 p) { return section.velocity(p); });
    return c;
}

TEST(SurfaceForces, JoukowskiLiftMatchesKuttaJoukowskiAndConverges) {
    const test::Joukowski section = test::Joukowski{1.0, 0.1, 0.0, 5.0}.prepare();
    // Worked value [D] (Kutta 1902, Joukowski 1906; Katz & Plotkin; joukowski_sections.csv):
    // cl = 0.59740 for mu_x = 0.1, mu_y = 0, alpha = 5 deg, b = 1, chord 4.03333. Our
    // re-derivation must agree to the 5 digits given.
    const double exact = section.lift_coefficient();
    const test::JoukowskiReference ref = test::joukowski_reference(0.0, 5.0);
    EXPECT_NEAR(exact, ref.cl, 5e-6);
    EXPECT_NEAR(section.chord(), ref.chord, 5e-6);
    const FlowConditions conditions{1e6, 5.0};
    double error[3], drag[3];
    for (int level = 0; level < 3; ++level) {
        const JoukowskiCase c = joukowski_case(section, level);
        const SurfaceForces f = integrate_surface_forces(c.grid, c.metrics, c.fields, conditions);
        error[level] = std::abs(f.cl.pressure - exact);
        drag[level] = std::abs(f.cd.pressure);  // d'Alembert: exactly zero in the continuum
    }
    // Midpoint faces with the wall pressure extrapolated linearly through two cells: both errors
    // are O(h^2), with opposite signs along and across the wall, so the combined error reaches
    // its asymptotic order slowly (measured: 1.75e-4, 6.6e-5, 2.1e-5; orders 1.40, 1.63; the
    // first-cell pressure instead is first order). Demand an order above 1.5 on the finest pair
    // and an error under 0.1% of cl there; the drag must fall towards zero (2.3e-3, 8.1e-4,
    // 2.5e-4 measured).
    EXPECT_GT(std::log2(error[1] / error[2]), 1.5)
        << error[0] << " " << error[1] << " " << error[2];
    EXPECT_LT(error[2], 1e-3 * exact);
    EXPECT_LT(drag[2], drag[1]);
    EXPECT_LT(drag[1], drag[0]);
    EXPECT_LT(drag[2], 1e-3);
}

TEST(SurfaceForces, QuadraticWallProfileGivesItsExactShear) {
    test::TestCGridShape shape;
    const StructuredGrid grid = test::make_test_cgrid(test::ellipse_surface(32, 0.1), shape);
    const GridMetrics m = compute_metrics(grid);
    FlowFields f = test::sample_potential_flow(m, [](Vec2) { return Vec2{0.0, 0.0}; });
    const FlowConditions conditions{500.0, 0.0};
    const double slope = 3.0, curvature = -7.0;
    const WallRange wall = find_wall_faces(grid);
    for (int i = wall.begin; i < wall.end; ++i) {
        const Vec2 a = m.area_j[m.face_j(i, 0)];
        const Vec2 n = (1.0 / norm(a)) * a, t{n.y, -n.x};
        for (int j = 0; j < 2; ++j) {
            const double d = dot(m.centroid[m.cell(i, j)] - m.face_center_j[m.face_j(i, 0)], n);
            const double ut = slope * d + curvature * d * d;
            f.u[m.cell(i, j)] = ut * t.x + 0.3 * n.x;  // a normal part must not count
            f.v[m.cell(i, j)] = ut * t.y + 0.3 * n.y;
        }
    }
    const auto faces = evaluate_wall_faces(grid, m, f, conditions, WallPressure::extrapolated);
    // u_t = A d + B d^2 is what the reconstruction fits: exact up to round-off.
    ASSERT_EQ(faces.size(), static_cast<std::size_t>(wall.count()));
    for (const WallFaceState& face : faces) EXPECT_NEAR(face.shear, slope / 500.0, 1e-12);
    // A uniform shear along +i on a closed clockwise outline sums to a zero net force.
    const SurfaceForces forces = integrate_surface_forces(faces, conditions);
    EXPECT_NEAR(forces.cd.friction, 0.0, 1e-12);
    EXPECT_NEAR(forces.cl.friction, 0.0, 1e-12);
}

TEST(SurfaceForces, SuctionAheadOfQuarterChordLiftsAndPitchesNoseUp) {
    test::TestCGridShape shape;
    const StructuredGrid grid = test::make_test_cgrid(test::ellipse_surface(64, 0.08), shape);
    const GridMetrics m = compute_metrics(grid);
    FlowFields f = test::sample_potential_flow(m, [](Vec2) { return Vec2{1.0, 0.0}; });
    for (std::size_t c = 0; c < f.pressure.size(); ++c) {
        const Vec2 x = m.centroid[c];
        f.pressure[c] = (x.y > 0.0 && x.x < 0.2) ? -1.0 : 0.0;
    }
    const FlowConditions conditions{1000.0, 0.0};
    SurfaceForceOptions options;
    options.wall_pressure = WallPressure::first_cell;
    const SurfaceForces at_quarter = integrate_surface_forces(grid, m, f, conditions, options);
    EXPECT_GT(at_quarter.cl.total, 0.0);
    EXPECT_GT(at_quarter.cm.total, 0.0);  // lift ahead of the reference: nose up
    // Moment transfer to the leading edge: M_le = M_qc + (r_qc - r_le) x F, so with cm nose-up
    // positive cm_le = cm_qc - 2 (0.25 F_y) in the chord frame. Round-off tolerance.
    options.moment_reference = {0.0, 0.0};
    const SurfaceForces at_le = integrate_surface_forces(grid, m, f, conditions, options);
    const double fy = at_quarter.force_pressure.y;
    EXPECT_NEAR(at_le.cm.total, at_quarter.cm.total - 2.0 * 0.25 * fy, 1e-12);
}

TEST(SurfaceForces, UniformPressureGivesNoForce) {
    test::TestCGridShape shape;
    const StructuredGrid grid = test::make_test_cgrid(test::ellipse_surface(32, 0.1), shape);
    const GridMetrics m = compute_metrics(grid);
    FlowFields f = test::sample_potential_flow(m, [](Vec2) { return Vec2{0.0, 0.0}; });
    f.pressure.assign(f.pressure.size(), 0.7);
    const SurfaceForces forces = integrate_surface_forces(grid, m, f, {1000.0, 3.0});
    // A closed polygon's area vectors sum to zero: round-off only.
    EXPECT_NEAR(forces.cl.total, 0.0, 1e-13);
    EXPECT_NEAR(forces.cd.total, 0.0, 1e-13);
    EXPECT_NEAR(forces.cm.total, 0.0, 1e-13);
}

}  // namespace
}  // namespace veer
