#pragma once
/// Geometric multigrid for the pressure equation, used as the preconditioner of conjugate
/// gradients (MG-PCG). Levels: 2 x 2 cell agglomeration with rediscretised coarse faces
/// (multigrid_coarsening.hpp), as many as ni, nj, wake and around allow; smoothing: wall-normal
/// line relaxation then along-C line relaxation (multigrid_lines.hpp); transfers: sum of the four
/// fine residuals (restriction) and piecewise-constant correction (prolongation), each the
/// transpose of the other; coarsest level: sparse Cholesky. The V-cycle is symmetric (post-
/// smoothing is the adjoint of pre-smoothing), as conjugate gradients need. PRESSURE.md has more.
#include <Eigen/SparseCholesky>
#include <memory>
#include <vector>

#include "solver/multigrid_lines.hpp"
#include "solver/pressure_operator.hpp"
#include "solver/pressure_solver.hpp"

namespace veer {

/// Knobs of the multigrid (defaults are what the tests and benchmark use).
struct MultigridOptions {
    int max_levels = 0;         ///< 0: as many as the grid allows
    int coarsest_cells = 64;    ///< stop coarsening at or below this many cells
    int smoothing_steps = 1;    ///< pre- and post-smoothing steps (each: j-lines then i-lines)
    bool krylov = true;         ///< true: MG-PCG; false: plain V-cycles (for studying the cycle)
    bool along_c_lines = true;  ///< smooth with i-lines too (after the wall-normal j-lines)
    int cycle_index = 2;        ///< coarse-grid visits per level: 1 = V-cycle, 2 = W-cycle
};

/// MG-PCG (or plain cycles) on one stencil: setup builds the levels, line factors and the
/// coarsest Cholesky factor in a few passes over the grid; solve iterates on cell-centred p.
class MultigridSolver final : public PressureSolver {
public:
    explicit MultigridSolver(MultigridOptions options = {});
    ~MultigridSolver() override;

    void setup(const PoissonStencil& stencil) override;
    PressureSolveStats solve(const std::vector<double>& rhs, std::vector<double>& p, double rel_tol,
                             int max_iter) override;
    std::string name() const override;

    int level_count() const;
    /// Cells ni x nj of a level (0 = finest).
    std::pair<int, int> level_shape(int level) const;
    /// Relative residual after each iteration of the last solve (index 0: initial guess).
    const std::vector<double>& residual_history() const { return m_history; }

private:
    struct Level;
    void cycle(std::size_t level);
    void precondition(std::vector<double>& r, std::vector<double>& z);
    PressureSolveStats iterate_pcg(const std::vector<double>& b, std::vector<double>& x,
                                   double b_norm, double rel_tol, int max_iter);
    PressureSolveStats iterate_cycles(const std::vector<double>& b, std::vector<double>& x,
                                      double b_norm, double rel_tol, int max_iter);

    MultigridOptions m_options;
    std::vector<Level> m_levels;
    Eigen::SimplicialLDLT<Eigen::SparseMatrix<double>> m_coarsest;
    std::vector<double> m_history;
};

}  // namespace veer
