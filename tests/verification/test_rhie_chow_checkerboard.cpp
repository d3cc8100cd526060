/// The Rhie-Chow term of the predicted face fluxes (Rhie & Chow 1983, AIAA J. 21(11), 1525-1532;
/// solver/README.md, "Projection") on its own: a pressure checkerboard p = eps (-1)^(i+j) over
/// fluid at rest on a uniform doubly periodic grid. The collocated pressure gradient does not see
/// it (every face average of p is zero), so without the term nothing would ever remove it; with
/// it the predicted fluxes carry -D_f ortho (p_R - p_L) and the projection takes the fraction
/// D_f / gamma of the mode away each step:
/// - time-accurate steps (D_f = gamma): the whole checkerboard in one step;
/// - steady pseudo steps (D_f = rhie_chow_scale x local step / pseudo_cfl, gamma = local step):
///   a decay factor of exactly 1 - rhie_chow_scale / pseudo_cfl per step.
/// Both are accuracy figures of the discretisation (derived from its equations in the README),
/// checked to the pressure-solve tolerance, not by whether some run converges.
#include <gtest/gtest.h>

#include <cmath>
#include <iostream>

#include "solver/flow_solver.hpp"
#include "verification_grids.hpp"

namespace veer {
namespace {

constexpr int n = 16;  // cells each way (even, so the checkerboard is periodic)

/// Fluid at rest with the pressure checkerboard of amplitude `eps`.
FlowFields checkerboard(double eps) {
    FlowFields f;
    f.ni = f.nj = n;
    for (int j = 0; j < n; ++j)
        for (int i = 0; i < n; ++i) {
            f.u.push_back(0.0);
            f.v.push_back(0.0);
            f.pressure.push_back((i + j) % 2 == 0 ? eps : -eps);
        }
    return f;
}

/// The checkerboard component of a cell field: mean of (-1)^(i+j) q.
double checkerboard_amplitude(const std::vector<double>& q) {
    double sum = 0.0;
    for (int j = 0; j < n; ++j)
        for (int i = 0; i < n; ++i)
            sum += ((i + j) % 2 == 0 ? 1.0 : -1.0) * q[static_cast<std::size_t>(j * n + i)];
    return sum / (n * n);
}

double largest_speed(const FlowFields& f) {
    double largest = 0.0;
    for (std::size_t k = 0; k < f.u.size(); ++k)
        largest = std::max(largest, std::hypot(f.u[k], f.v[k]));
    return largest;
}

TEST(RhieChow, TimeAccurateStepRemovesThePressureCheckerboard) {
    SolverSettings s;
    s.mode = TimeMode::time_accurate;
    s.pressure_tolerance = 1e-12;
    FlowSolver solver(test::periodic_square(n, 1.0), {100.0, 0.0}, s);
    solver.initialize(checkerboard(1e-2));
    const StepReport r = solver.advance(1e-2);
    ASSERT_TRUE(r.finite);
    const FlowFields f = solver.fields();
    const double left = checkerboard_amplitude(f.pressure) / 1e-2;
    std::cout << "checkerboard left after one time-accurate step: " << left
              << " of it; largest speed " << largest_speed(f) << "\n";
    // Factor 1 - D_f / gamma = 0; what is left is the pressure solve's 1e-12 relative residual.
    EXPECT_LT(std::abs(left), 1e-8);
    // The mode carries no velocity: the flux corrections of a checkerboard cancel in every cell.
    EXPECT_LT(largest_speed(f), 1e-10);
}

TEST(RhieChow, SteadyPseudoStepsDecayTheCheckerboardAtThePredictedRate) {
    for (double cfl : {2.0, 5.0}) {
        SolverSettings s;
        s.mode = TimeMode::steady;
        s.pseudo_cfl = cfl;
        s.steady_pressure_tolerance = 1e-12;
        FlowSolver solver(test::periodic_square(n, 1.0), {100.0, 0.0}, s);
        solver.initialize(checkerboard(1e-2));
        double amplitude = 1e-2;
        const double predicted = 1.0 - s.rhie_chow_scale / cfl;
        for (int step = 1; step <= 5; ++step) {
            ASSERT_TRUE(solver.advance_pseudo_time().finite);
            const double next = checkerboard_amplitude(solver.fields().pressure);
            std::cout << "pseudo CFL " << cfl << ", step " << step << ": decay factor "
                      << next / amplitude << " (predicted " << predicted << ")\n";
            // Exact in the discretisation; 1e-8 is the pressure solve's residual relative to
            // the mode, far below the gap between the two CFL numbers' factors (0.15).
            EXPECT_NEAR(next / amplitude, predicted, 1e-8) << "step " << step;
            amplitude = next;
        }
    }
}

}  // namespace
}  // namespace veer
