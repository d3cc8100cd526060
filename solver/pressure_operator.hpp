#pragma once
/// The pressure operator in row form, shared by the pressure solvers: A = -L, with L the 5-point
/// stencil of poisson_stencil.hpp, so that A is symmetric positive (semi-)definite:
///
///   (A p)_P = diagonal_P * p_P - sum_k coupling_k * p_neighbour_k,
///   diagonal_P = sum of the coefficients of all faces of P that have a neighbour or are Dirichlet.
///
/// Neighbour slots k: 0 = -i, 1 = +i, 2 = -j, 3 = +j. The -j neighbour of a wake cell on j = 0 is
/// its mirror (ni-1-i, 0); periodic sides wrap. A slot with no neighbour points at the cell itself
/// with coupling 0, so kernels need no branch. Also here: sums in a fixed order, so that results do
/// not depend on how OpenMP splits the work.
#include <array>
#include <vector>

#include "solver/poisson_stencil.hpp"

namespace veer {

/// One row of A (one cell).
struct PressureRow {
    std::array<int, 4> neighbour{};    ///< cell index per slot (-i, +i, -j, +j); self where none
    std::array<double, 4> coupling{};  ///< face coefficient per slot, >= 0; 0 where none
    double diagonal = 0.0;             ///< sum of face coefficients incl. Dirichlet faces
};

/// A = -L of a stencil, cells i fastest.
struct PressureOperator {
    int ni = 0;
    int nj = 0;
    std::vector<PressureRow> rows;
    bool singular = false;  ///< no Dirichlet face: constants are the null space

    int size() const { return static_cast<int>(rows.size()); }
};

/// (A x)_c of one row; the kernel of apply_operator (and of the fused multigrid residual).
inline double row_product(const PressureRow& r, const double* x, int c) {
    return r.diagonal * x[c] - r.coupling[0] * x[r.neighbour[0]] -
           r.coupling[1] * x[r.neighbour[1]] - r.coupling[2] * x[r.neighbour[2]] -
           r.coupling[3] * x[r.neighbour[3]];
}

/// Row form of a stencil. Checks sizes and that wake-cut and periodic faces are not Dirichlet.
PressureOperator make_pressure_operator(const PoissonStencil& stencil);

/// y = A x (= -L x).
void apply_operator(const PressureOperator& op, const std::vector<double>& x,
                    std::vector<double>& y);

/// r = b - A x.
void operator_residual(const PressureOperator& op, const std::vector<double>& b,
                       const std::vector<double>& x, std::vector<double>& r);

/// Sum of a[k] * b[k], added in fixed blocks and combined in a fixed order (bitwise reproducible
/// whatever the thread count).
double ordered_dot(const std::vector<double>& a, const std::vector<double>& b);

/// Arithmetic mean, summed in the same fixed order as ordered_dot.
double ordered_mean(const std::vector<double>& a);

/// Subtracts the mean: projects onto the range of a singular (all-Neumann) operator.
void remove_mean(std::vector<double>& a);

}  // namespace veer
