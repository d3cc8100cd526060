// Checks of the orthogonal finite-volume Laplacian (solver/poisson_assembly.hpp) and of its row
// form (solver/pressure_operator.hpp).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <vector>

#include "pressure_test_grids.hpp"
#include "solver/poisson_assembly.hpp"
#include "solver/pressure_operator.hpp"

namespace veer {
namespace {

TEST(PressureAssembly, UniformGridCoefficients) {
    // On a uniform Cartesian grid |S|^2 / (S . d) is h^2 / h^2 = 1 inside and h^2 / (h^2 / 2) = 2
    // on boundary faces (half a cell to the face). Exact up to round-off of the metrics (1e-12).
    const int ni = 4, nj = 3;
    const double h = 0.25;
    StructuredGrid g(ni, nj);
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i) g.node(i, j) = {h * i, h * j};
    const auto s = assemble_laplacian(g, compute_metrics(g), {}, {});
    for (int j = 0; j < nj; ++j)
        for (int fi = 0; fi <= ni; ++fi)
            EXPECT_NEAR(s.coef_i[static_cast<std::size_t>(fi + (ni + 1) * j)],
                        (fi == 0 || fi == ni) ? 2.0 : 1.0, 1e-12);
    for (int fj = 0; fj <= nj; ++fj)
        for (int i = 0; i < ni; ++i)
            EXPECT_NEAR(s.coef_j[static_cast<std::size_t>(i + ni * fj)],
                        (fj == 0 || fj == nj) ? 2.0 : 1.0, 1e-12);
    EXPECT_FALSE(s.has_dirichlet());
    EXPECT_FALSE(s.wake_cut.has_value());
}

TEST(PressureAssembly, CGridOperatorIsSymmetricAcrossTheWakeCut) {
    // Symmetry is exact by construction (one value per physical face), so compare bitwise.
    const auto g = test::make_c_grid(32, 16, 8, 1e-4);
    const auto m = compute_metrics(g);
    const auto flags = test::far_field_dirichlet(g.ni(), g.nj(), true, false);
    const auto op = make_pressure_operator(assemble_laplacian(g, m, flags.i, flags.j));
    int wake_links = 0;
    for (int c = 0; c < op.size(); ++c) {
        const auto& row = op.rows[static_cast<std::size_t>(c)];
        double off_sum = 0.0;
        for (std::size_t k = 0; k < 4; ++k) {
            off_sum += row.coupling[k];
            if (row.coupling[k] == 0.0) continue;
            const auto& other = op.rows[static_cast<std::size_t>(row.neighbour[k])];
            const auto back = std::find(other.neighbour.begin(), other.neighbour.end(), c);
            ASSERT_NE(back, other.neighbour.end());
            EXPECT_EQ(other.coupling[static_cast<std::size_t>(back - other.neighbour.begin())],
                      row.coupling[k]);
            if (k == 2 && c < g.ni()) ++wake_links;
        }
        EXPECT_GE(row.diagonal, off_sum * (1.0 - 1e-14));  // weak diagonal dominance
    }
    EXPECT_EQ(wake_links, 2 * 8);  // every wake cell on j = 0 sees its mirror
    EXPECT_FALSE(op.singular);
}

TEST(PressureAssembly, LinearFieldCrossesTheWakeCutWithoutJump) {
    // In the wake the test grid is made of rectangles (orthogonal), so the orthogonal stencil is
    // exact for linear p: L(p) = 0 in wake cells on j = 0 away from the trailing edge and outlet.
    // p = y has a flux through the cut; treating the cut as a wall would leave |L(p)| ~ coef * dy.
    // Round-off bound: coef (up to ~1e3) * |p| (~1) * 1e-13.
    const int wake = 8;
    const auto g = test::make_c_grid(32, 16, wake, 1e-4);
    const auto m = compute_metrics(g);
    const auto op = make_pressure_operator(assemble_laplacian(g, m, {}, {}));
    const auto p = test::at_centroids(m, [](Vec2 x) { return 0.3 * x.x + x.y; });
    std::vector<double> ap;
    apply_operator(op, p, ap);
    for (int i = 1; i < wake - 1; ++i) {
        EXPECT_NEAR(ap[static_cast<std::size_t>(i)], 0.0, 1e-9) << "cell " << i;
        EXPECT_NEAR(ap[static_cast<std::size_t>(g.ni() - 1 - i)], 0.0, 1e-9) << "mirror of " << i;
    }
}

/// Max over interior cells of |L(p) / V - lap(p)| on a log-polar annulus with ni = 4 nj cells.
double laplacian_error(int nj) {
    const auto g = test::make_log_polar_annulus(4 * nj, nj, 1.0);
    const auto m = compute_metrics(g);
    const auto op = make_pressure_operator(assemble_laplacian(g, m, {}, {}));
    auto field = [](Vec2 x) { return std::exp(0.5 * x.x) * std::cos(0.7 * x.y); };
    const auto p = test::at_centroids(m, field);
    std::vector<double> ap;
    apply_operator(op, p, ap);
    double err = 0.0;
    for (int j = 1; j < nj - 1; ++j)  // boundary rows are Neumann: not a consistent Laplacian
        for (int i = 0; i < 4 * nj; ++i) {
            const auto c = m.cell(i, j);
            const double exact = (0.25 - 0.49) * field(m.centroid[c]);
            err = std::max(err, std::abs(-ap[c] / m.volume[c] - exact));
        }
    return err;
}

TEST(PressureAssembly, LaplacianConvergesAtSecondOrderOnASmoothGrid) {
    // Cell-centred finite volumes on a smooth orthogonal grid: truncation error O(h^2) (common
    // practice). Observed order between successive doublings must be at least 1.8 (measured 1.82
    // from nj = 8 to 16, so the grids start at 16, in the asymptotic range; a first-order defect
    // would show as ~1).
    const double e1 = laplacian_error(16), e2 = laplacian_error(32), e3 = laplacian_error(64);
    const double order12 = std::log2(e1 / e2), order23 = std::log2(e2 / e3);
    RecordProperty("order_coarse", std::to_string(order12));
    RecordProperty("order_fine", std::to_string(order23));
    EXPECT_GT(order23, 1.8) << "errors " << e1 << " " << e2 << " " << e3;
    EXPECT_GT(order12, 1.8) << "errors " << e1 << " " << e2 << " " << e3;
}

TEST(PressureAssembly, RejectsDirichletOnTheWakeCut) {
    const auto g = test::make_c_grid(16, 8, 4, 1e-3);
    auto flags = test::far_field_dirichlet(g.ni(), g.nj(), true, false);
    flags.j[0] = 1;  // cell (0, 0) lies on the wake cut
    EXPECT_THROW(
        make_pressure_operator(assemble_laplacian(g, compute_metrics(g), flags.i, flags.j)),
        InternalError);
}

}  // namespace
}  // namespace veer
