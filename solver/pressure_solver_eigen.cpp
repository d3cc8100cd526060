#include "solver/pressure_solver_eigen.hpp"

#include <Eigen/IterativeLinearSolvers>
#include <cmath>
#include <string>
#include <vector>

#include "mesh/errors.hpp"

namespace veer {

Eigen::SparseMatrix<double, Eigen::RowMajor> assemble_pressure_matrix(const PressureOperator& op,
                                                                      bool pin_first_cell) {
    std::vector<Eigen::Triplet<double>> entries;
    entries.reserve(static_cast<std::size_t>(op.size()) * 5);
    for (int c = 0; c < op.size(); ++c) {
        const PressureRow& row = op.rows[static_cast<std::size_t>(c)];
        const double pin = (pin_first_cell && c == 0) ? row.diagonal : 0.0;
        entries.emplace_back(c, c, row.diagonal + pin);
        for (std::size_t k = 0; k < 4; ++k)
            if (row.coupling[k] != 0.0) entries.emplace_back(c, row.neighbour[k], -row.coupling[k]);
    }
    Eigen::SparseMatrix<double, Eigen::RowMajor> a(op.size(), op.size());
    a.setFromTriplets(entries.begin(), entries.end());  // duplicates (periodic ni = 2) are summed
    return a;
}

namespace {

double relative_residual(const PressureOperator& op, const std::vector<double>& b,
                         const std::vector<double>& x, double b_norm, std::vector<double>& work) {
    operator_residual(op, b, x, work);
    return std::sqrt(ordered_dot(work, work)) / b_norm;
}

/// The shared driver: Eigen does the iterations, we do the projection and the residual bookkeeping.
template <class EigenSolver>
class EigenPressureSolver final : public PressureSolver {
public:
    explicit EigenPressureSolver(std::string label) : m_label(std::move(label)) {}

    void setup(const PoissonStencil& stencil) override {
        m_op = make_pressure_operator(stencil);
        m_matrix = assemble_pressure_matrix(m_op, m_op.singular);
        configure(m_solver);
        m_solver.compute(m_matrix);
        VEER_VERIFY(m_solver.info() == Eigen::Success, "Eigen preconditioner setup failed");
        m_ready = true;
    }

    PressureSolveStats solve(const std::vector<double>& rhs, std::vector<double>& p, double rel_tol,
                             int max_iter) override {
        VEER_VERIFY(m_ready, "pressure solver used before setup");
        const auto n = static_cast<std::size_t>(m_op.size());
        VEER_VERIFY(rhs.size() == n, "right-hand side size does not match the stencil");
        if (p.size() != n) p.assign(n, 0.0);
        // A = -L: solve A p = -rhs.
        std::vector<double> b(n), work(n);
        for (std::size_t k = 0; k < n; ++k) b[k] = -rhs[k];
        if (m_op.singular) remove_mean(b);
        const double b_norm = std::sqrt(ordered_dot(b, b));
        PressureSolveStats stats;
        if (b_norm == 0.0) {
            p.assign(n, 0.0);
            stats.converged = true;
            return stats;
        }
        stats.initial_residual = relative_residual(m_op, b, p, b_norm, work);
        stats.final_residual = stats.initial_residual;
        // Eigen stops on its recursively updated residual, which can drift below the true one
        // near round-off; restart from the result (at most twice) until the true one is met.
        for (int pass = 0;
             pass < 3 && stats.final_residual > rel_tol && stats.iterations < max_iter; ++pass) {
            iterate(b, p, rel_tol * 0.5, max_iter - stats.iterations);
            stats.iterations += static_cast<int>(m_solver.iterations());
            stats.final_residual = relative_residual(m_op, b, p, b_norm, work);
        }
        stats.converged = stats.final_residual <= rel_tol;
        return stats;
    }

    std::string name() const override { return m_label; }

private:
    static void configure(Eigen::BiCGSTAB<Eigen::SparseMatrix<double, Eigen::RowMajor>,
                                          Eigen::IncompleteLUT<double>>& s) {
        s.preconditioner().setDroptol(1e-4);  // common practice: small drop tolerance, some fill
        s.preconditioner().setFillfactor(10);
    }
    template <class Other>
    static void configure(Other&) {}

    void iterate(const std::vector<double>& b, std::vector<double>& p, double rel_tol,
                 int max_iter) {
        const auto n = static_cast<Eigen::Index>(b.size());
        Eigen::Map<const Eigen::VectorXd> b_map(b.data(), n);
        Eigen::VectorXd guess = Eigen::Map<const Eigen::VectorXd>(p.data(), n);
        // The pinned matrix has the solution with p_0 = 0: shift the guess to that one.
        if (m_op.singular) guess.array() -= guess[0];
        m_solver.setTolerance(rel_tol);
        m_solver.setMaxIterations(max_iter);
        const Eigen::VectorXd x = m_solver.solveWithGuess(b_map, guess);
        Eigen::Map<Eigen::VectorXd>(p.data(), n) = x;
        if (m_op.singular) remove_mean(p);
    }

    std::string m_label;
    PressureOperator m_op;
    Eigen::SparseMatrix<double, Eigen::RowMajor> m_matrix;
    EigenSolver m_solver;
    bool m_ready = false;
};

using CgIc = Eigen::ConjugateGradient<
    Eigen::SparseMatrix<double, Eigen::RowMajor>, Eigen::Lower | Eigen::Upper,
    Eigen::IncompleteCholesky<double, Eigen::Lower, Eigen::NaturalOrdering<int>>>;
using BicgstabIlut =
    Eigen::BiCGSTAB<Eigen::SparseMatrix<double, Eigen::RowMajor>, Eigen::IncompleteLUT<double>>;

}  // namespace

std::unique_ptr<PressureSolver> make_eigen_cg_solver() {
    return std::make_unique<EigenPressureSolver<CgIc>>("Eigen CG + incomplete Cholesky");
}

std::unique_ptr<PressureSolver> make_eigen_bicgstab_solver() {
    return std::make_unique<EigenPressureSolver<BicgstabIlut>>("Eigen BiCGSTAB + ILUT");
}

}  // namespace veer
