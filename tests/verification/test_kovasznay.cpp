/// Kovasznay flow at Re = 40 (Kovasznay 1948, Proc. Camb. Phil. Soc. 44, 58-62; formulas and
/// lambda(40) = -0.963741 in tests/reference/kovasznay1948.csv) on [-0.5, 1] x [-0.5, 1.5], the
/// exact velocity prescribed on the sides: the error falls at second order.
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>
#include <numbers>

#include "field_norms.hpp"
#include "mesh/grid_metrics.hpp"
#include "solver/flow_solver.hpp"
#include "steady_driver.hpp"
#include "tests/reference_table.hpp"
#include "verification_grids.hpp"

namespace veer {
namespace {

constexpr double pi = std::numbers::pi;
constexpr double reynolds = 40.0;
const double lambda = reynolds / 2.0 - std::sqrt(reynolds * reynolds / 4.0 + 4.0 * pi * pi);

Vec2 exact_velocity(Vec2 x, double) {
    const double e = std::exp(lambda * x.x);
    return {1.0 - e * std::cos(2.0 * pi * x.y), lambda / (2.0 * pi) * e * std::sin(2.0 * pi * x.y)};
}

double solve_on(int k) {
    const StructuredGrid grid = test::cartesian_block(3 * k, 4 * k, -0.5, 1.0, -0.5, 1.5);
    SolverSettings s;
    s.mode = TimeMode::steady;
    for (const char* side : {"left", "right", "bottom", "top"})
        s.velocity_overrides.push_back({side, exact_velocity});
    FlowSolver solver(grid, {reynolds, 0.0}, s);
    const StepReport r = test::march_to_steady(solver, 1e-9, 20000);
    EXPECT_TRUE(r.finite);
    EXPECT_LT(std::max(r.residual_u, r.residual_v), 1e-9) << "k = " << k;
    const GridMetrics m = compute_metrics(grid);
    const FlowFields f = solver.fields();
    return std::hypot(test::l2_error(m, f.u, [](Vec2 x) { return exact_velocity(x, 0.0).x; }),
                      test::l2_error(m, f.v, [](Vec2 x) { return exact_velocity(x, 0.0).y; }));
}

TEST(Kovasznay, Re40ErrorFallsAtSecondOrder) {
    // The formula's worked values [D] (kovasznay1948.csv, Re 20 and 40) to the 6 decimals given.
    const test::ReferenceTable ref = test::ReferenceTable::read("kovasznay1948.csv", 2);
    for (std::size_t row = 0; row < ref.rows(); ++row) {
        const double re = ref.number(row, "reynolds");
        EXPECT_NEAR(re / 2.0 - std::sqrt(re * re / 4.0 + 4.0 * pi * pi), ref.number(row, "lambda"),
                    5e-7)
            << "Re " << re;
    }
    EXPECT_NEAR(lambda, ref.number(ref.row_where("reynolds", "40"), "lambda"), 5e-7);
    const double e1 = solve_on(8), e2 = solve_on(16), e3 = solve_on(32);
    const double o1 = test::observed_order(e1, e2), o2 = test::observed_order(e2, e3);
    std::cout << "Kovasznay Re 40: L2 velocity errors " << e1 << " " << e2 << " " << e3
              << ", orders " << o1 << " " << o2 << "\n";
    EXPECT_GE(o2, 1.8);  // second order, the bound used for the manufactured solution
}

}  // namespace
}  // namespace veer
