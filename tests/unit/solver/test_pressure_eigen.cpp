// The Eigen reference pressure solvers (solver/pressure_solver_eigen.hpp) and the solver factory.
#include <gtest/gtest.h>

#include <string>

#include "mesh/errors.hpp"
#include "pressure_test_problems.hpp"
#include "solver/pressure_solver.hpp"
#include "solver/pressure_solver_eigen.hpp"

namespace veer {
namespace {

// Residual 1e-12 relative. The measured error in p is ~1e-12 of max|p| on these grids; 1e-8
// leaves four decades for other platforms and thread counts, while a wrong operator, wake-cut link
// or projection misses by O(1).
constexpr double solve_tolerance = 1e-12;
constexpr double error_bound = 1e-8;

void expect_solves(PressureSolverKind kind, const test::ManufacturedProblem& pb) {
    auto solver = make_pressure_solver(kind);
    solver->setup(pb.stencil);
    std::vector<double> p(pb.rhs.size(), 0.0);
    const auto stats = solver->solve(pb.rhs, p, solve_tolerance, 5000);
    EXPECT_TRUE(stats.converged) << pb.label << " " << solver->name();
    EXPECT_LE(stats.final_residual, solve_tolerance) << pb.label;
    EXPECT_NEAR(stats.initial_residual, 1.0, 1e-12) << "zero guess has residual ||rhs||";
    EXPECT_LE(test::max_abs_difference(p, pb.exact), error_bound * test::max_abs(pb.exact))
        << pb.label << " " << solver->name() << " after " << stats.iterations << " iterations";
}

TEST(PressureEigen, ConjugateGradientSolvesManufacturedProblems) {
    for (const auto& pb : {test::c_grid_problem(), test::mixed_problem(),
                           test::all_neumann_problem(), test::periodic_problem()})
        expect_solves(PressureSolverKind::eigen_cg, pb);
}

TEST(PressureEigen, BicgstabSolvesManufacturedProblems) {
    for (const auto& pb : {test::c_grid_problem(), test::mixed_problem(),
                           test::all_neumann_problem(), test::periodic_problem()})
        expect_solves(PressureSolverKind::eigen_bicgstab, pb);
}

TEST(PressureEigen, ExactInitialGuessNeedsNoIteration) {
    const auto pb = test::c_grid_problem(32, 16, 8);
    auto solver = make_pressure_solver(PressureSolverKind::eigen_cg);
    solver->setup(pb.stencil);
    auto p = pb.exact;
    // The residual of the exact discrete solution is round-off (~1e-15 relative).
    const auto stats = solver->solve(pb.rhs, p, 1e-10, 100);
    EXPECT_EQ(stats.iterations, 0);
    EXPECT_LE(stats.initial_residual, 1e-12);
}

TEST(PressureEigen, SingularRightHandSideIsProjected) {
    // Adding a constant to the rhs of an all-Neumann problem leaves the projected problem, and so
    // the zero-mean answer, unchanged.
    auto pb = test::periodic_problem();
    for (double& v : pb.rhs) v += 0.25;
    auto solver = make_pressure_solver(PressureSolverKind::eigen_cg);
    solver->setup(pb.stencil);
    std::vector<double> p(pb.rhs.size(), 3.0);  // a guess with a mean of its own
    const auto stats = solver->solve(pb.rhs, p, solve_tolerance, 2000);
    EXPECT_TRUE(stats.converged);
    EXPECT_NEAR(ordered_mean(p), 0.0, 1e-12);
    EXPECT_LE(test::max_abs_difference(p, pb.exact), error_bound * test::max_abs(pb.exact));
}

TEST(PressureSolverKind, CaseFileWordsAreTheReadmeSpellings) {
    // One spelling each (README, [run] pressure_solver); the case file reader accepts only
    // these (tests/unit/io/test_case_file.cpp, tests/unit/app/test_choice_keys.cpp).
    EXPECT_EQ(pressure_solver_kind_name(PressureSolverKind::multigrid), "multigrid");
    EXPECT_EQ(pressure_solver_kind_name(PressureSolverKind::eigen_cg), "eigen-cg");
    EXPECT_EQ(pressure_solver_kind_name(PressureSolverKind::eigen_bicgstab), "eigen-bicgstab");
}

}  // namespace
}  // namespace veer
