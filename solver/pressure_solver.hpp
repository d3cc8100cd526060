#pragma once
/// Pressure-equation solvers: one interface, back-ends chosen at run time (case file key).
///
/// Every back-end solves L(p) = rhs for the 5-point operator of a PoissonStencil (see
/// poisson_stencil.hpp), with p the cell-centred pressure (increment) and rhs in the same units as
/// L(p) (cell-integrated, i.e. per unit depth). Where the stencil has no Dirichlet face the problem
/// is singular: the right-hand side is projected onto the range (its mean removed) and the
/// zero-mean solution is returned. The relative residual is ||rhs - L(p)||_2 / ||rhs||_2 with the
/// projected rhs. PRESSURE.md describes the methods.
#include <memory>
#include <string>
#include <string_view>
#include <vector>

#include "solver/poisson_stencil.hpp"

namespace veer {

/// What one solve did.
struct PressureSolveStats {
    int iterations = 0;             ///< outer iterations (CG/BiCGSTAB steps, MG-PCG steps)
    double initial_residual = 0.0;  ///< relative residual of the initial guess
    double final_residual = 0.0;    ///< relative residual returned
    bool converged = false;         ///< final_residual <= rel_tol
};

/// A pressure solver: set up once per operator, then solve many right-hand sides.
class PressureSolver {
public:
    virtual ~PressureSolver() = default;
    /// Factorise / build levels for this operator. Cheap enough to redo when coefficients change.
    virtual void setup(const PoissonStencil& stencil) = 0;
    /// Solve L(p) = rhs (ni * nj cells, i fastest); p is the initial guess on entry.
    /// Stops at relative residual rel_tol or after max_iter iterations.
    virtual PressureSolveStats solve(const std::vector<double>& rhs, std::vector<double>& p,
                                     double rel_tol, int max_iter) = 0;
    /// Short human-readable name of the method (for logs and benchmarks).
    virtual std::string name() const = 0;
};

/// The back-ends a case file can select.
enum class PressureSolverKind {
    multigrid,       ///< conjugate gradients preconditioned by a geometric multigrid V-cycle
    eigen_cg,        ///< Eigen conjugate gradients with incomplete Cholesky (reference)
    eigen_bicgstab,  ///< Eigen BiCGSTAB with incomplete LU with threshold (reference)
};

/// A fresh solver of the given kind (setup still to be called).
std::unique_ptr<PressureSolver> make_pressure_solver(PressureSolverKind kind);

/// Every kind, in the order the README lists them.
inline constexpr PressureSolverKind pressure_solver_kinds[] = {PressureSolverKind::multigrid,
                                                               PressureSolverKind::eigen_cg,
                                                               PressureSolverKind::eigen_bicgstab};

/// The case-file word for a kind: "multigrid", "eigen-cg", "eigen-bicgstab" (the case file
/// reader, io/case_choices.hpp, accepts these and no other spelling).
std::string_view pressure_solver_kind_name(PressureSolverKind kind);

}  // namespace veer
