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

    int line_count() const { return m_lines; }
    int colour_count() const { return static_cast<int>(m_colour_begin.size()) - 1; }

private:
    /// Lines of one colour and one length, stored position-major (position k of every line, then
    /// k + 1, ...): side-by-side wall-normal lines walk the grid row by row, and several lines'
    /// recurrences run interleaved.
    struct Chunk {
        int base = 0;    ///< first storage index
        int lines = 0;   ///< lines in the chunk
        int length = 0;  ///< cells per line
    };

    void add_line(const PressureOperator& op, const std::vector<int>& cells,
                  const std::vector<int>& prev_slot);
    std::vector<int> colour_lines(const PressureOperator& op) const;
    void pack(const std::vector<int>& colour, int chunk_width);
    void add_off_line(const PressureRow& row, int cell, int prev_slot, int next_slot,
                      bool line_end);
    void relax_chunk(const double* b, double* x, const Chunk& chunk) const;

    // Per stored position (cell of a line): built line by line, then packed into chunks.
    std::vector<int> m_line_begin{0};  ///< while building: line l at [begin[l], begin[l+1])
    std::vector<int> m_cell;           ///< cell index
    std::vector<double> m_off_coupling0, m_off_coupling1;  ///< couplings across the line
    std::vector<int> m_off_neighbour0, m_off_neighbour1;   ///< their cells (self where none)
    std::vector<double> m_end_coupling;  ///< at line ends: the lagged coupling closing the line
    std::vector<int> m_end_neighbour;
    std::vector<double> m_lower;         ///< coupling to the previous cell of the line (>= 0)
    std::vector<double> m_upper_over;    ///< Thomas factor: upper coupling / pivot
    std::vector<double> m_inv_pivot;     ///< Thomas factor: 1 / pivot
    std::vector<Chunk> m_chunks;         ///< by colour
    std::vector<int> m_colour_begin{0};  ///< chunks of colour c: [begin[c], begin[c+1])
    int m_lines = 0;
    mutable std::vector<double> m_work;  ///< elimination values, one per position
};

}  // namespace veer
