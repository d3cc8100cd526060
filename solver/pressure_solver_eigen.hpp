#pragma once
/// Reference pressure solvers built on Eigen's sparse iterative solvers, on the matrix A = -L of
/// the stencil (pressure_operator.hpp): conjugate gradients with incomplete Cholesky, and BiCGSTAB
/// with incomplete LU with threshold. They are slower than the multigrid but independent of it,
/// so tests and benchmarks compare against them.
#include <Eigen/SparseCore>
#include <memory>

#include "solver/pressure_operator.hpp"
#include "solver/pressure_solver.hpp"

namespace veer {

/// Row-major sparse matrix of A = -L (symmetric, positive semi-definite). With pin_first_cell the
/// diagonal of cell 0 is doubled: for a singular (all-Neumann) operator and a right-hand side in
/// its range this gives a regular matrix whose solution is an exact solution of the original
/// problem (the one with p_0 = 0), so the zero-mean one is a shift away.
Eigen::SparseMatrix<double, Eigen::RowMajor> assemble_pressure_matrix(const PressureOperator& op,
                                                                      bool pin_first_cell);

/// Eigen conjugate gradients preconditioned by incomplete Cholesky in the grid's own (i-fastest)
/// order: on structured grids that beats a fill-reducing ordering by far (289 against 2312
/// iterations on the 96 x 32 test C-grid to 1e-12).
std::unique_ptr<PressureSolver> make_eigen_cg_solver();

/// Eigen BiCGSTAB preconditioned by incomplete LU with threshold.
std::unique_ptr<PressureSolver> make_eigen_bicgstab_solver();

}  // namespace veer
