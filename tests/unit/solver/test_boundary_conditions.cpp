/// Each boundary condition of the table in solver/boundary_table.hpp, one test each: the roles
/// resolved from the segment kinds and the ghost values that carry each condition.
#include <gtest/gtest.h>

#include "mesh/grid_metrics.hpp"
#include "solver/boundary_faces.hpp"
#include "solver/boundary_ghosts.hpp"
#include "solver/boundary_table.hpp"
#include "solver/connectivity.hpp"

namespace veer {
namespace {

/// A 4 x 3 unit block; left far field, right outflow, bottom wall, top wall "lid".
StructuredGrid small_block() {
    StructuredGrid g(4, 3);
    for (int j = 0; j <= 3; ++j)
        for (int i = 0; i <= 4; ++i) g.node(i, j) = {0.25 * i, j / 3.0};
    g.segments() = {{Side::i_min, 0, 3, SegmentKind::far_field, "inlet"},
                    {Side::i_max, 0, 3, SegmentKind::outflow, "outlet"},
                    {Side::j_min, 0, 4, SegmentKind::wall, "floor"},
                    {Side::j_max, 0, 4, SegmentKind::wall, "lid"}};
    return g;
}

const BoundaryFace& face_at(const std::vector<BoundaryFace>& faces, int i, int j, int gi, int gj) {
    for (const BoundaryFace& f : faces)
        if (f.i == i && f.j == j && f.gi == gi && f.gj == gj) return f;
    throw std::runtime_error("no such face");
}

TEST(BoundaryTable, RowsAreTheDocumentedConditions) {
    const auto wall = conditions_for(FaceRole::wall);
    EXPECT_EQ(wall.velocity, Condition::dirichlet);
    EXPECT_EQ(wall.pressure, Condition::neumann);
    EXPECT_EQ(wall.pressure_increment, Condition::neumann);
    const auto in = conditions_for(FaceRole::inflow);
    EXPECT_EQ(in.velocity, Condition::dirichlet);
    EXPECT_EQ(in.pressure, Condition::neumann);
    const auto out = conditions_for(FaceRole::outflow);
    EXPECT_EQ(out.velocity, Condition::neumann);
    EXPECT_EQ(out.pressure, Condition::dirichlet);
    EXPECT_EQ(out.pressure_increment, Condition::dirichlet);
    const auto pre = conditions_for(FaceRole::prescribed_velocity);
    EXPECT_EQ(pre.velocity, Condition::dirichlet);
    EXPECT_EQ(pre.pressure_increment, Condition::neumann);
}

TEST(BoundaryTable, FarFieldSplitsByFlowDirectionAndConnectivityHasNoRole) {
    EXPECT_EQ(resolve_role(SegmentKind::far_field, true, false), FaceRole::inflow);
    EXPECT_EQ(resolve_role(SegmentKind::far_field, false, false), FaceRole::outflow);
    EXPECT_EQ(resolve_role(SegmentKind::outflow, true, false), FaceRole::outflow);
    EXPECT_EQ(resolve_role(SegmentKind::wall, false, true), FaceRole::prescribed_velocity);
    EXPECT_FALSE(resolve_role(SegmentKind::wake_cut, false, false).has_value());
    EXPECT_FALSE(resolve_role(SegmentKind::periodic, false, false).has_value());
}

TEST(BoundaryFaces, RolesAndOutwardAreasOfEverySide) {
    const StructuredGrid g = small_block();
    const GridMetrics m = compute_metrics(g);
    const auto faces = collect_boundary_faces(g, m, {1.0, 0.0}, {});
    EXPECT_EQ(faces.size(), 14u);  // 3 + 3 + 4 + 4
    const BoundaryFace& left = face_at(faces, 0, 1, -1, 1);
    EXPECT_EQ(left.role, FaceRole::inflow);  // free stream (1, 0) enters through x = 0
    EXPECT_LT(left.area_out.x, 0.0);
    EXPECT_EQ(face_at(faces, 3, 1, 4, 1).role, FaceRole::outflow);
    EXPECT_EQ(face_at(faces, 2, 0, 2, -1).role, FaceRole::wall);
    EXPECT_GT(face_at(faces, 2, 2, 2, 3).area_out.y, 0.0);
}

TEST(BoundaryFaces, UnknownOverrideSegmentIsAnInputErrorNamingIt) {
    const StructuredGrid g = small_block();
    const GridMetrics m = compute_metrics(g);
    try {
        collect_boundary_faces(g, m, {1.0, 0.0}, {moving_wall("roof", {1.0, 0.0})});
        FAIL() << "no error";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("'roof'"), std::string::npos);
        EXPECT_NE(std::string(e.what()).find("lid"), std::string::npos);  // what is allowed
    }
}

TEST(BoundaryFaces, SpinningWallIsTangentialWithTheGivenSpeed) {
    // Counter-clockwise about (0.5, 0) at speed 0.3 t: tangential (no flow through a circle
    // about that centre), of the given speed at any radius, moving -x at the top.
    const VelocityOverride spin =
        spinning_wall("wall", {0.5, 0.0}, [](double t) { return 0.3 * t; });
    EXPECT_EQ(spin.segment, "wall");
    for (const Vec2 x : {Vec2{1.0, 0.0}, Vec2{0.5, 0.5}, Vec2{0.2, -0.4}, Vec2{0.9, 0.3}}) {
        const Vec2 u = spin.velocity(x, 2.0), r = x - Vec2{0.5, 0.0};
        EXPECT_NEAR(dot(u, r), 0.0, 1e-15);
        EXPECT_NEAR(std::hypot(u.x, u.y), 0.6, 1e-15);
        EXPECT_GT(cross(r, u), 0.0);  // counter-clockwise
    }
    EXPECT_NEAR(spin.velocity({0.5, 0.5}, 1.0).x, -0.3, 1e-15);
    EXPECT_EQ(spin.velocity({0.5, 0.0}, 1.0).x, 0.0);  // at the centre: no direction, at rest
}

/// Ghosts for one condition: the face average (ghost + interior) / 2 is the boundary value for
/// Dirichlet, the interior value for Neumann (exact arithmetic, so exact comparisons).
class GhostFill : public ::testing::Test {
protected:
    void SetUp() override {
        grid = small_block();
        metrics = compute_metrics(grid);
        connectivity = make_connectivity(grid, metrics);
        faces = collect_boundary_faces(grid, metrics, {1.0, 0.0}, {moving_wall("lid", {0.5, 0.0})});
        for (BoundaryFace& f : faces) {
            f.velocity = f.role == FaceRole::prescribed_velocity ? Vec2{0.5, 0.0}
                         : f.role == FaceRole::inflow            ? Vec2{1.0, 0.0}
                                                                 : Vec2{0.0, 0.0};
            f.pressure = 0.25;
        }
        for (int j = 0; j < 3; ++j)
            for (int i = 0; i < 4; ++i) {
                u(i, j) = 0.1 * i + 0.01 * j;
                v(i, j) = -0.2 * j;
                p(i, j) = 1.0 + i;
            }
    }
    StructuredGrid grid;
    GridMetrics metrics;
    Connectivity connectivity;
    std::vector<BoundaryFace> faces;
    CellField u{4, 3}, v{4, 3}, p{4, 3};
};

TEST_F(GhostFill, NoSlipWallMakesTheFaceVelocityZero) {
    fill_velocity_ghosts(faces, connectivity, u.view(), v.view());
    EXPECT_DOUBLE_EQ(0.5 * (u(2, -1) + u(2, 0)), 0.0);
    EXPECT_DOUBLE_EQ(0.5 * (v(2, -1) + v(2, 0)), 0.0);
    EXPECT_DOUBLE_EQ(u(2, -2), u(2, -1));  // second layer repeats the first
}

TEST_F(GhostFill, MovingWallOverrideGivesTheWallVelocity) {
    fill_velocity_ghosts(faces, connectivity, u.view(), v.view());
    EXPECT_DOUBLE_EQ(0.5 * (u(1, 3) + u(1, 2)), 0.5);
    EXPECT_DOUBLE_EQ(0.5 * (v(1, 3) + v(1, 2)), 0.0);
}

TEST_F(GhostFill, InflowGivesTheFreeStreamAndOutflowCopiesVelocity) {
    fill_velocity_ghosts(faces, connectivity, u.view(), v.view());
    EXPECT_DOUBLE_EQ(0.5 * (u(-1, 1) + u(0, 1)), 1.0);
    EXPECT_DOUBLE_EQ(u(4, 1), u(3, 1));
    EXPECT_DOUBLE_EQ(v(4, 2), v(3, 2));
}

TEST_F(GhostFill, PressureIsFixedAtOutflowAndZeroGradientElsewhere) {
    fill_pressure_ghosts(faces, connectivity, p.view());
    EXPECT_DOUBLE_EQ(0.5 * (p(4, 1) + p(3, 1)), 0.25);
    EXPECT_DOUBLE_EQ(p(-1, 1), p(0, 1));
    EXPECT_DOUBLE_EQ(p(2, -1), p(2, 0));
    EXPECT_DOUBLE_EQ(p(2, 3), p(2, 2));
}

TEST_F(GhostFill, PressureIncrementIsZeroAtOutflowAndZeroGradientElsewhere) {
    fill_increment_ghosts(faces, connectivity, p.view());
    EXPECT_DOUBLE_EQ(0.5 * (p(4, 0) + p(3, 0)), 0.0);
    EXPECT_DOUBLE_EQ(p(-1, 0), p(0, 0));
    EXPECT_DOUBLE_EQ(p(1, -1), p(1, 0));
}

TEST(PrescribedVelocity, OverrideFunctionIsEvaluatedAtTheFaceCentreAndTime) {
    VelocityOverride o{"inlet", [](Vec2 x, double t) { return Vec2{x.y + t, 0.0}; }};
    const StructuredGrid g = small_block();
    const GridMetrics m = compute_metrics(g);
    const auto faces = collect_boundary_faces(g, m, {1.0, 0.0}, {o});
    const BoundaryFace& f = face_at(faces, 0, 1, -1, 1);
    EXPECT_EQ(f.role, FaceRole::prescribed_velocity);
    EXPECT_NEAR(o.velocity(f.center, 2.0).x, 0.5 + 2.0, 1e-15);  // face centre y = 1/2
}

}  // namespace
}  // namespace veer
