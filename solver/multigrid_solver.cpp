#include "solver/multigrid_solver.hpp"

#include <cmath>
#include <string>

#include "mesh/errors.hpp"
#include "solver/multigrid_coarsening.hpp"
#include "solver/pressure_loops.hpp"
#include "solver/pressure_solver_eigen.hpp"

namespace veer {

struct MultigridSolver::Level {
    PressureOperator op;
    LineRelaxation j_lines;
    LineRelaxation i_lines;
    std::vector<double> b, x;  ///< right-hand side and correction of this level
};

MultigridSolver::MultigridSolver(MultigridOptions options) : m_options(options) {}
MultigridSolver::~MultigridSolver() = default;

std::string MultigridSolver::name() const {
    return std::string(m_options.krylov ? "multigrid-PCG" : "multigrid V-cycles") + " (" +
           std::to_string(m_levels.size()) + " levels, line relaxation)";
}

int MultigridSolver::level_count() const { return static_cast<int>(m_levels.size()); }

std::pair<int, int> MultigridSolver::level_shape(int level) const {
    const Level& l = m_levels.at(static_cast<std::size_t>(level));
    return {l.op.ni, l.op.nj};
}

void MultigridSolver::setup(const PoissonStencil& stencil) {
    const int levels =
        multigrid_level_count(stencil, m_options.max_levels, m_options.coarsest_cells);
    m_levels.clear();
    m_levels.resize(static_cast<std::size_t>(levels));
    PoissonStencil coarse;
    const PoissonStencil* current = &stencil;
    for (int l = 0; l < levels; ++l) {
        Level& level = m_levels[static_cast<std::size_t>(l)];
        level.op = make_pressure_operator(*current);
        const auto n = static_cast<std::size_t>(level.op.size());
        level.b.assign(n, 0.0);
        level.x.assign(n, 0.0);
        if (l == levels - 1) break;
        level.j_lines = LineRelaxation(*current, level.op, LineRelaxation::Direction::j_lines);
        level.i_lines = LineRelaxation(*current, level.op, LineRelaxation::Direction::i_lines);
        coarse = coarsen_stencil(*current);
        current = &coarse;
    }
    const PressureOperator& last = m_levels.back().op;
    const Eigen::SparseMatrix<double> a = assemble_pressure_matrix(last, last.singular);
    m_coarsest.compute(a);
    VEER_VERIFY(m_coarsest.info() == Eigen::Success, "coarsest-level factorisation failed");
}

void MultigridSolver::cycle(std::size_t l) {
    Level& level = m_levels[l];
    if (l + 1 == m_levels.size()) {
        if (level.op.singular) remove_mean(level.b);  // keep the pinned system consistent
        const auto n = static_cast<Eigen::Index>(level.b.size());
        Eigen::Map<Eigen::VectorXd>(level.x.data(), n) =
            m_coarsest.solve(Eigen::Map<const Eigen::VectorXd>(level.b.data(), n));
        return;
    }
    for (int s = 0; s < m_options.smoothing_steps; ++s) {
        level.j_lines.sweep(level.op, level.b, level.x, true);
        if (m_options.along_c_lines) level.i_lines.sweep(level.op, level.b, level.x, true);
    }
    // Residual and restriction fused: the sum of the four fine residuals of each coarse cell.
    Level& coarse = m_levels[l + 1];
    const int ni = level.op.ni, nic = coarse.op.ni, njc = coarse.op.nj;
    const PressureRow* rows = level.op.rows.data();
    const double* b = level.b.data();
    const double* xf = level.x.data();
    double* bc = coarse.b.data();
    parallel_for(njc, parallel_cell_threshold / (4 * nic), [=](int jc) {
        for (int ic = 0; ic < nic; ++ic) {
            const int f = 2 * ic + ni * 2 * jc;
            auto r = [=](int c) { return b[c] - row_product(rows[c], xf, c); };
            bc[ic + nic * jc] = (r(f) + r(f + 1)) + (r(f + ni) + r(f + ni + 1));
        }
    });
    if (coarse.op.singular) remove_mean(coarse.b);
    std::fill(coarse.x.begin(), coarse.x.end(), 0.0);
    cycle(l + 1);
    // W-cycle: visit the coarse level again, starting from the correction it has already.
    for (int visit = 1; visit < m_options.cycle_index && l + 2 < m_levels.size(); ++visit)
        cycle(l + 1);
    const double* xc = coarse.x.data();
    double* x = level.x.data();
    parallel_for(level.op.nj, parallel_cell_threshold / ni, [=](int j) {
        for (int i = 0; i < ni; ++i) x[i + ni * j] += xc[i / 2 + nic * (j / 2)];
    });
    for (int s = 0; s < m_options.smoothing_steps; ++s) {  // adjoint of the pre-smoothing
        if (m_options.along_c_lines) level.i_lines.sweep(level.op, level.b, level.x, false);
        level.j_lines.sweep(level.op, level.b, level.x, false);
    }
}

void MultigridSolver::precondition(std::vector<double>& r, std::vector<double>& z) {
    Level& top = m_levels.front();
    // Borrow r and z as the finest level's right-hand side and correction (no copies).
    top.b.swap(r);
    z.resize(top.b.size());
    top.x.swap(z);
    std::fill(top.x.begin(), top.x.end(), 0.0);
    cycle(0);
    top.b.swap(r);
    top.x.swap(z);
    if (top.op.singular) remove_mean(z);
}

namespace {
/// y += a * x
void axpy(double a, const std::vector<double>& x, std::vector<double>& y) {
    const double* xp = x.data();
    double* yp = y.data();
    parallel_for(static_cast<int>(x.size()), parallel_cell_threshold,
                 [=](int k) { yp[k] += a * xp[k]; });
}
double norm2(const std::vector<double>& v) { return std::sqrt(ordered_dot(v, v)); }
}  // namespace

PressureSolveStats MultigridSolver::iterate_pcg(const std::vector<double>& b,
                                                std::vector<double>& x, double b_norm,
                                                double rel_tol, int max_iter) {
    const PressureOperator& op = m_levels.front().op;
    std::vector<double> r, z, dir, q;
    operator_residual(op, b, x, r);
    PressureSolveStats st;
    st.initial_residual = st.final_residual = norm2(r) / b_norm;
    if (st.final_residual <= rel_tol || max_iter <= 0) return st;
    precondition(r, z);
    dir = z;
    double rz = ordered_dot(r, z);
    for (st.iterations = 1; st.iterations <= max_iter; ++st.iterations) {
        apply_operator(op, dir, q);
        const double alpha = rz / ordered_dot(dir, q);
        double* xp = x.data();
        double* rp = r.data();
        const double* dp = dir.data();
        const double* qp = q.data();
        const double rr = ordered_block_sum(r.size(), [=](std::size_t k) {  // fused update
            xp[k] += alpha * dp[k];
            rp[k] -= alpha * qp[k];
            return rp[k] * rp[k];
        });
        st.final_residual = std::sqrt(rr) / b_norm;
        m_history.push_back(st.final_residual);
        if (st.final_residual <= rel_tol || st.iterations == max_iter) break;
        precondition(r, z);
        const double rz_next = ordered_dot(r, z);
        const double beta = rz_next / rz;
        rz = rz_next;
        const double* zp = z.data();
        double* dir_p = dir.data();
        parallel_for(static_cast<int>(z.size()), parallel_cell_threshold,
                     [=](int k) { dir_p[k] = zp[k] + beta * dir_p[k]; });
    }
    return st;
}

PressureSolveStats MultigridSolver::iterate_cycles(const std::vector<double>& b,
                                                   std::vector<double>& x, double b_norm,
                                                   double rel_tol, int max_iter) {
    const PressureOperator& op = m_levels.front().op;
    std::vector<double> r, z;
    operator_residual(op, b, x, r);
    PressureSolveStats st;
    st.initial_residual = st.final_residual = norm2(r) / b_norm;
    while (st.final_residual > rel_tol && st.iterations < max_iter) {
        precondition(r, z);
        axpy(1.0, z, x);
        operator_residual(op, b, x, r);
        st.final_residual = norm2(r) / b_norm;
        m_history.push_back(st.final_residual);
        ++st.iterations;
    }
    return st;
}

PressureSolveStats MultigridSolver::solve(const std::vector<double>& rhs, std::vector<double>& p,
                                          double rel_tol, int max_iter) {
    VEER_VERIFY(!m_levels.empty(), "pressure solver used before setup");
    const PressureOperator& op = m_levels.front().op;
    const auto n = static_cast<std::size_t>(op.size());
    VEER_VERIFY(rhs.size() == n, "right-hand side size does not match the stencil");
    if (p.size() != n) p.assign(n, 0.0);
    std::vector<double> b(n);
    for (std::size_t k = 0; k < n; ++k) b[k] = -rhs[k];  // A = -L: solve A p = -rhs
    if (op.singular) remove_mean(b);
    const double b_norm = norm2(b);
    PressureSolveStats stats;
    m_history.clear();
    if (b_norm == 0.0) {
        p.assign(n, 0.0);
        stats.converged = true;
        return stats;
    }
    m_history.push_back(0.0);  // filled below with the initial residual
    // The recursively updated CG residual can drift from the true one near round-off: restart
    // from the result (at most twice) until the true residual meets the tolerance.
    for (int pass = 0; pass < 3; ++pass) {
        const auto st = m_options.krylov
                            ? iterate_pcg(b, p, b_norm, rel_tol, max_iter - stats.iterations)
                            : iterate_cycles(b, p, b_norm, rel_tol, max_iter - stats.iterations);
        if (pass == 0) stats.initial_residual = m_history.front() = st.initial_residual;
        stats.iterations += st.iterations;
        std::vector<double> r;
        operator_residual(op, b, p, r);
        stats.final_residual = norm2(r) / b_norm;
        if (stats.final_residual <= rel_tol || stats.iterations >= max_iter) break;
    }
    if (op.singular) remove_mean(p);
    stats.converged = stats.final_residual <= rel_tol;
    return stats;
}

}  // namespace veer
