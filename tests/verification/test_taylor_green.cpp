/// Taylor-Green vortex decay (Taylor & Green 1937, Proc. R. Soc. Lond. A 158, 499-521; the exact
/// solution is written in the test) on a doubly periodic square: temporal order of BDF2 with
/// the incremental projection, and agreement with the exact decay.
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>
#include <numbers>

#include "field_norms.hpp"
#include "mesh/grid_metrics.hpp"
#include "solver/flow_solver.hpp"
#include "verification_grids.hpp"

namespace veer {
namespace {

constexpr double pi = std::numbers::pi;
constexpr double reynolds = 2.0;  // nu = 0.5: the decay e^{-2 nu t} is felt within t = 1
constexpr double end_time = 1.0;

/// u, v, p of the vortex at time t (analytic.md), nu = 1 / reynolds.
FlowFields exact(const GridMetrics& m, double t) {
    const double f = std::exp(-2.0 * t / reynolds);
    FlowFields out;
    for (const Vec2& x : m.centroid) {
        out.u.push_back(std::sin(x.x) * std::cos(x.y) * f);
        out.v.push_back(-std::cos(x.x) * std::sin(x.y) * f);
        out.pressure.push_back(0.25 * (std::cos(2.0 * x.x) + std::cos(2.0 * x.y)) * f * f);
    }
    return out;
}

FlowFields run(const StructuredGrid& grid, int steps) {
    SolverSettings s;
    s.mode = TimeMode::time_accurate;
    s.pressure_tolerance = 1e-11;
    s.momentum_tolerance = 1e-11;
    FlowSolver solver(grid, {reynolds, 0.0}, s);
    const GridMetrics m = compute_metrics(grid);
    solver.initialize(exact(m, 0.0));
    const double dt = end_time / steps;
    for (int n = 0; n < steps; ++n) EXPECT_TRUE(solver.advance(dt).finite);
    EXPECT_NEAR(solver.time(), end_time, 1e-12);
    return solver.fields();
}

double difference(const GridMetrics& m, const FlowFields& a, const FlowFields& b) {
    double sum = 0.0, vol = 0.0;
    for (std::size_t k = 0; k < a.u.size(); ++k) {
        const double du = a.u[k] - b.u[k], dv = a.v[k] - b.v[k];
        sum += m.volume[k] * (du * du + dv * dv);
        vol += m.volume[k];
    }
    return std::sqrt(sum / vol);
}

TEST(TaylorGreen, Bdf2IsSecondOrderInTime) {
    const StructuredGrid grid = test::periodic_square(32, 2.0 * pi);
    const GridMetrics m = compute_metrics(grid);
    const FlowFields a = run(grid, 5), b = run(grid, 10), c = run(grid, 20);
    // Differences between successive step sizes on one grid: the spatial error cancels, so the
    // ratio measures the temporal order alone (Roache 2002, J. Fluids Eng. 124(1), 4-10).
    const double d1 = difference(m, a, b), d2 = difference(m, b, c);
    const double order = test::observed_order(d1, d2);
    const FlowFields ref = exact(m, end_time);
    const double error = difference(m, c, ref);
    std::cout << "Taylor-Green: step differences " << d1 << " " << d2 << ", temporal order "
              << order << "; error against the exact decay at t = 1: " << error << "\n";
    EXPECT_GE(order, 1.8);  // the bound for BDF2
    // Spatial error of the 32x32 grid (h = 0.2, second order): well under 1% of the amplitude
    // e^{-1} = 0.37.
    EXPECT_LT(error, 3e-3);
}

}  // namespace
}  // namespace veer
