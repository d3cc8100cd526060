/// Faces between their two cell centres (mesh/face_order.hpp), and the C-grid generator refusing
/// a grid with a face that is not, naming where and what to change.
#include <gtest/gtest.h>

#include <string>

#include "mesh/cgrid.hpp"
#include "mesh/face_order.hpp"
#include "mesh/grid_metrics.hpp"
#include "mesh/wall_spacing.hpp"
#include "tests/unit/mesh/cgrid_test_support.hpp"

namespace veer {
namespace {

/// Two cells side by side: the unit squares [0, 1] x [0, 1] and [1, 2] x [0, 1], except that the
/// first cell's top-left node may be moved.
StructuredGrid two_cells(Vec2 top_left) {
    StructuredGrid g(2, 1);
    g.node(0, 0) = {0, 0};
    g.node(1, 0) = {1, 0};
    g.node(2, 0) = {2, 0};
    g.node(0, 1) = top_left;
    g.node(1, 1) = {1, 1};
    g.node(2, 1) = {2, 1};
    return g;
}

TEST(FaceOrder, SquaresHaveNoBackwardFace) {
    EXPECT_FALSE(find_backward_face(compute_metrics(two_cells({0, 1}))).has_value());
}

TEST(FaceOrder, AShearedNonConvexCellWhoseCentreCrossesItsFaceIsFound) {
    // Nodes (0,0), (1,0), (1,1), (10,10.5): a simple quadrilateral of positive area (0.75) with a
    // reflex corner at (1,1) and a sliver reaching up to the right; its centroid, x = 5/3 by
    // hand (triangles of area 0.5 and 0.25 with centroids at x = 2/3 and 11/3), lies beyond its
    // right face x = 1, past the neighbour's centroid x = 1.5.
    const GridMetrics m = compute_metrics(two_cells({10.0, 10.5}));
    ASSERT_GT(m.volume[m.cell(0, 0)], 0.0);
    EXPECT_NEAR(m.centroid[m.cell(0, 0)].x, 5.0 / 3.0, 1e-12);
    const auto face = find_backward_face(m);
    ASSERT_TRUE(face.has_value());
    EXPECT_TRUE(face->i_face);
    EXPECT_EQ(face->i, 1);
    EXPECT_EQ(face->j, 0);
    EXPECT_NEAR(face->where.x, 1.0, 1e-12);
    EXPECT_NEAR(face->where.y, 0.5, 1e-12);
}

/// NACA 0012 (closed edge) at 1536 x 112, first cell for y+ 1 at Re 6e6, far field 100: the
/// outermost cells above the wake at x about 57 chords are so sheared with 64 wake cells that a
/// face there is backward (the flow solver stopped on it with an internal error before); with 96
/// wake cells the grid is fine. Measured on this generator, not a published figure.
CGridSpec fine_around_spec(int wake) {
    CGridSpec spec;
    spec.around = 1536;
    spec.normal = 112;
    spec.wake = wake;
    spec.far_field = 100.0;
    spec.first_cell = first_cell_for_y_plus(1.0, 6e6);
    return spec;
}

TEST(FaceOrder, CGridWithABackwardFaceIsRefusedNamingWhereAndWhatToChange) {
    const std::vector<Vec2> surface = test::naca_surface("0012", 1536);
    try {
        (void)generate_cgrid(surface, fine_around_spec(64));
        ADD_FAILURE() << "a grid with a backward face was returned";
    } catch (const InputError& e) {
        const std::string what = e.what();
        EXPECT_NE(what.find("by the far field above the wake"), std::string::npos) << what;
        EXPECT_NE(what.find("wake = 64"), std::string::npos) << what;
        EXPECT_NE(what.find("wrong sides of a face"), std::string::npos) << what;
    }
    const StructuredGrid grid = generate_cgrid(surface, fine_around_spec(96));
    EXPECT_FALSE(find_backward_face(compute_metrics(grid)).has_value());
}

}  // namespace
}  // namespace veer
