#pragma once
/// Line relaxation for the pressure multigrid: block Gauss-Seidel where each block is a grid line
/// solved exactly (a tridiagonal solve), the standard smoother for grids with cells of high
/// aspect ratio (Trottenberg, Oosterlee & Schueller 2001, Multigrid, sec. 5.1).
///
/// j-lines run wall-normal. On a C-grid the line of a wake column i < wake continues across the
/// cut into its mirror column ni-1-i: (i, nj-1) ... (i, 0), (ni-1-i, 0) ... (ni-1-i, nj-1), so the
/// strong coupling through the thin cells on both sides of the cut is inside one tridiagonal solve.
/// i-lines run along the C (for cells stretched the other way, in the far field). Lines are
/// coloured so that no two lines of one colour are coupled; one colour is relaxed in parallel,
/// colours in order (forward) or in reverse order (backward, the adjoint sweep, which keeps the
/// V-cycle symmetric for conjugate gradients). Couplings that close a periodic line are lagged.
#include <vector>

#include "solver/poisson_stencil.hpp"
#include "solver/pressure_operator.hpp"

namespace veer {

/// One family of lines (all j-lines or all i-lines) with their tridiagonal factors.
class LineRelaxation {
public:
    enum class Direction { j_lines, i_lines };

    LineRelaxation() = default;
    /// Builds the lines of `op` (whose layout `stencil` describes) and factorises them.
    LineRelaxation(const PoissonStencil& stencil, const PressureOperator& op, Direction direction);

    /// One sweep over all lines: x <- relaxed x for A x = b. forward: colours 0, 1, ...;
    /// backward: the reverse order (the adjoint sweep).
    void sweep(const PressureOperator& op, const std::vector<double>& b, std::vector<double>& x,
               bool forward) const;

    int line_count() const { return static_cast<int>(m_line_begin.size()) - 1; }
    int colour_count() const { return static_cast<int>(m_colour_begin.size()) - 1; }

private:
    void add_line(const PressureOperator& op, const std::vector<int>& cells,
                  const std::vector<int>& next_slot);
    void colour_lines(const PressureOperator& op);
    void relax_line(const PressureOperator& op, const double* b, double* x, int line) const;

    std::vector<int> m_line_begin{0};       ///< line l holds positions [begin[l], begin[l+1])
    std::vector<int> m_cell;                ///< cell at each position
    std::vector<unsigned char> m_off_line;  ///< bit s set: slot s of that cell is off the line
    std::vector<double> m_lower;            ///< coupling to the previous cell of the line (>= 0)
    std::vector<double> m_upper_over;       ///< Thomas factor: upper coupling / pivot
    std::vector<double> m_inv_pivot;        ///< Thomas factor: 1 / pivot
    std::vector<int> m_colour_begin{0};     ///< lines of colour c: m_order[begin[c] .. begin[c+1])
    std::vector<int> m_order;               ///< line indices sorted by colour
    mutable std::vector<double> m_work;     ///< forward-elimination values, one per position
};

}  // namespace veer
