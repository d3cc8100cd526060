/// Forced-transition trips (solver/trip_region.hpp) on a C-grid section: each column's wall foot
/// is on the surface it belongs to (lower first in this grid's i order, upper after the leading
/// edge), x/c runs from 0 at the leading edge to 1 at the trailing edge, and the zones follow
/// the trip of each surface alone.
#include <gtest/gtest.h>

#include "mesh/grid_metrics.hpp"
#include "pressure_test_grids.hpp"
#include "solver/boundary_faces.hpp"
#include "solver/connectivity.hpp"
#include "solver/face_geometry.hpp"
#include "solver/trip_region.hpp"

namespace veer {
namespace {

struct Section {
    StructuredGrid grid = test::make_c_grid(64, 12, 10, 1e-3);
    GridMetrics metrics = compute_metrics(grid);
    Connectivity connectivity = make_connectivity(grid, metrics);
    std::vector<BoundaryFace> faces =
        collect_boundary_faces(grid, metrics, {1.0, 0.0}, std::vector<VelocityOverride>{});
    FaceGeometry geom = make_face_geometry(metrics, connectivity, faces);
};

TEST(TripRegion, FeetKnowTheirSurfaceAndChordPosition) {
    const Section s;
    const std::vector<WallFoot> feet = wall_feet(s.geom, s.faces);
    ASSERT_EQ(feet.size(), s.geom.volume.size());
    int upper = 0, lower = 0;
    for (int j : {0, 5, 11})
        for (int i = 0; i < s.geom.ni; ++i) {
            const WallFoot& f = feet[s.geom.cell(i, j)];
            const double x_wall = s.geom.j_faces.center[s.geom.face_j(i, 0)].x;
            const double y_wall = s.geom.j_faces.center[s.geom.face_j(i, 0)].y;
            if (i < 10 || i >= 74) {  // wake columns: no wall at the foot
                EXPECT_EQ(f.side, WallFoot::Side::none) << i;
                continue;
            }
            // The leading edge face sits at x ~ 0 and the trailing edge at x ~ 1 in this grid,
            // so x/c is the face centre's x within the spread of the end faces.
            EXPECT_NEAR(f.x_over_c, x_wall, 2e-3) << i;
            if (y_wall > 1e-9) {
                EXPECT_EQ(f.side, WallFoot::Side::upper) << i;
                ++upper;
            } else if (y_wall < -1e-9) {
                EXPECT_EQ(f.side, WallFoot::Side::lower) << i;
                ++lower;
            }
        }
    EXPECT_GT(upper, 80);  // 3 rows x about 31 columns each
    EXPECT_GT(lower, 80);
}

TEST(TripRegion, ZonesFollowEachSurfacesTrip) {
    const Section s;
    const std::vector<WallFoot> feet = wall_feet(s.geom, s.faces);
    const std::vector<TripZone> none = trip_zones(feet, {});
    for (TripZone z : none) EXPECT_EQ(z, TripZone::free);
    const std::vector<TripZone> zones = trip_zones(feet, {0.3, std::nullopt});
    int laminar = 0, turbulent = 0;
    for (std::size_t k = 0; k < feet.size(); ++k) {
        const WallFoot& f = feet[k];
        const TripZone expected = f.side != WallFoot::Side::upper ? TripZone::free
                                  : f.x_over_c < 0.3              ? TripZone::laminar
                                                                  : TripZone::turbulent;
        EXPECT_EQ(zones[k], expected) << k;
        laminar += zones[k] == TripZone::laminar;
        turbulent += zones[k] == TripZone::turbulent;
    }
    EXPECT_GT(laminar, 0);
    EXPECT_GT(turbulent, laminar);  // 70 % of the upper chord lies behind a trip at 0.3
}

}  // namespace
}  // namespace veer
