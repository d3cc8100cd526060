/// The hook a transition model built on Spalart-Allmaras uses (SaSourceModifiers): a factor on
/// the production and f_t2 given per cell. Left at its defaults it is the standard model to the
/// bit; a factor scales the production alone; f_t2 = 0 removes the trip terms (SA-noft2).
#include <gtest/gtest.h>

#include <cmath>
#include <cstring>

#include "mesh/grid_metrics.hpp"
#include "mesh/wall_distance.hpp"
#include "pressure_test_grids.hpp"
#include "solver/boundary_faces.hpp"
#include "solver/connectivity.hpp"
#include "solver/face_geometry.hpp"
#include "solver/spalart_allmaras.hpp"
#include "solver/spalart_allmaras_terms.hpp"

namespace veer {
namespace {

using C = SpalartAllmarasConstants;
constexpr double nu = 1e-5;

bool same_bits(double a, double b) { return std::memcmp(&a, &b, sizeof a) == 0; }

TEST(SaSourceModifiers, DefaultsAreTheStandardSourceToTheBit) {
    for (double chi : {0.0, 0.3, 2.0, 40.0, 900.0})
        for (double omega : {1e-3, 2.0, 3e4})
            for (double d : {1e-6, 1e-3, 0.4}) {
                const SaSourceSplit a = sa_source_linearised(chi * nu, omega, d, nu);
                const SaSourceSplit b = sa_source_linearised(chi * nu, omega, d, nu, {1.0, {}});
                EXPECT_TRUE(same_bits(a.explicit_part, b.explicit_part)) << chi << " " << omega;
                EXPECT_TRUE(same_bits(a.implicit_coefficient, b.implicit_coefficient));
                EXPECT_TRUE(same_bits(a.production, b.production));
                EXPECT_TRUE(same_bits(a.destruction, b.destruction));
            }
}

TEST(SaSourceModifiers, FactorScalesProductionAndFt2ReplacesTheTrip) {
    const double q = 5.0 * nu, omega = 40.0, d = 2e-3;
    const SaSourceSplit standard = sa_source(q, omega, d, nu);
    const SaSourceSplit half = sa_source(q, omega, d, nu, {0.5, {}});
    EXPECT_NEAR(half.production, 0.5 * standard.production, 1e-15 * standard.production);
    EXPECT_EQ(half.destruction, standard.destruction);
    EXPECT_EQ(sa_source(q, omega, d, nu, {0.0, {}}).production, 0.0);
    // f_t2 = 0: production c_b1 S~ nu~ and destruction c_w1 f_w (nu~/d)^2, by hand from the
    // standard split: P_std = c_b1 (1 - f_t2) S~ nu~, so c_b1 S~ nu~ = P_std / (1 - f_t2).
    const double ft2 = sa_ft2(q / nu);
    const SaSourceSplit no_trip = sa_source(q, omega, d, nu, {1.0, 0.0});
    EXPECT_NEAR(no_trip.production, standard.production / (1.0 - ft2), 1e-12 * no_trip.production);
    const double trip_destruction = -C::cb1 * ft2 / (C::kappa * C::kappa) * q * q / (d * d);
    EXPECT_NEAR(no_trip.destruction, standard.destruction - trip_destruction,
                1e-12 * no_trip.destruction);
}

TEST(SaSourceModifiers, ModelWithUnitFactorsStepsAsTheStandardOne) {
    const StructuredGrid grid = test::make_c_grid(32, 16, 8, 2e-4);
    const GridMetrics metrics = compute_metrics(grid);
    const Connectivity connectivity = make_connectivity(grid, metrics);
    const std::vector<BoundaryFace> faces =
        collect_boundary_faces(grid, metrics, {1.0, 0.0}, std::vector<VelocityOverride>{});
    const FaceGeometry geom = make_face_geometry(metrics, connectivity, faces);
    const std::vector<double> distance = wall_distance(grid, metrics);
    CellField u(grid.ni(), grid.nj()), v(grid.ni(), grid.nj()), dt(grid.ni(), grid.nj());
    for (int j = -2; j < grid.nj() + 2; ++j)
        for (int i = -2; i < grid.ni() + 2; ++i) {
            const std::size_t k =
                geom.cell(std::clamp(i, 0, grid.ni() - 1), std::clamp(j, 0, grid.nj() - 1));
            u(i, j) = std::tanh(distance[k] / 0.02);
            dt(i, j) = 10.0 * std::sqrt(geom.volume[k]);
        }
    std::vector<double> flux_i, flux_j;
    for (const Vec2& a : geom.i_faces.area) flux_i.push_back(0.5 * a.x);
    for (const Vec2& a : geom.j_faces.area) flux_j.push_back(0.5 * a.x);
    ModelStepInputs in;
    in.u = u.view();
    in.v = v.view();
    in.flux_i = &flux_i;
    in.flux_j = &flux_j;
    in.local_dt = dt.view();

    SpalartAllmaras standard(geom, faces, connectivity, distance, nu);
    SpalartAllmaras unit(geom, faces, connectivity, distance, nu);
    SpalartAllmaras no_production(geom, faces, connectivity, distance, nu);
    const std::vector<double> ones(geom.volume.size(), 1.0), zeros(geom.volume.size(), 0.0);
    unit.set_source_modifiers(&ones, nullptr);
    no_production.set_source_modifiers(&zeros, nullptr);
    for (int step = 0; step < 30; ++step) {
        standard.advance(in);
        unit.advance(in);
        no_production.advance(in);
    }
    const std::vector<double> a = standard.nu_tilde(), b = unit.nu_tilde();
    ASSERT_EQ(a.size(), b.size());
    EXPECT_EQ(std::memcmp(a.data(), b.data(), a.size() * sizeof(double)), 0);
    // Without production nothing grows the working variable above its free-stream value.
    const std::vector<double> c = no_production.nu_tilde();
    const double largest_standard = *std::max_element(a.begin(), a.end());
    const double largest_without = *std::max_element(c.begin(), c.end());
    EXPECT_GT(largest_standard, 2.0 * standard.free_stream_nu_tilde());
    EXPECT_LE(largest_without, standard.free_stream_nu_tilde() * (1.0 + 1e-9));
}

}  // namespace
}  // namespace veer
