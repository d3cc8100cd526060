#include "solver/line_relaxation.hpp"

#include <algorithm>
#include <cmath>

#include "solver/loops.hpp"

namespace veer {

void LineWork::prepare(const Connectivity& c, bool fold_wake_cut) {
    const std::size_t n = static_cast<std::size_t>(c.ni) * static_cast<std::size_t>(c.nj);
    c_prime.assign(n, 0.0);
    d_u.assign(n, 0.0);
    d_v.assign(n, 0.0);
    j_lines = plan_wall_normal_lines(c, fold_wake_cut);
}

namespace {

std::size_t idx(int ni, int i, int j) {
    return static_cast<std::size_t>(j) * static_cast<std::size_t>(ni) + static_cast<std::size_t>(i);
}

/// Thomas algorithm along one line of `len` cells; cell(k) gives the cell index of position k,
/// sub/super(k) the couplings to positions k-1, k+1, extra_u/v(k) the explicit right-hand side.
template <class Cell, class Sub, class Super, class Extra>
void solve_line(const MomentumSystem& s, int len, Cell cell, Sub sub, Super super, Extra extra,
                LineWork& w, CellView u, CellView v, int ni) {
    double prev_c = 0.0, prev_du = 0.0, prev_dv = 0.0;
    for (int k = 0; k < len; ++k) {
        const std::size_t c = cell(k);
        const double a = k > 0 ? sub(c) : 0.0;  // coupling to k - 1 (moved to rhs when k = 0)
        double eu = 0.0, ev = 0.0;
        extra(k, c, eu, ev);
        const double denom = s.diag[c] - a * prev_c;
        const double cp = (k + 1 < len ? super(c) : 0.0) / denom;
        prev_du = (s.rhs_u[c] + eu + a * prev_du) / denom;
        prev_dv = (s.rhs_v[c] + ev + a * prev_dv) / denom;
        prev_c = cp;
        w.c_prime[c] = cp;
        w.d_u[c] = prev_du;
        w.d_v[c] = prev_dv;
    }
    double nu_ = 0.0, nv_ = 0.0;
    for (int k = len - 1; k >= 0; --k) {
        const std::size_t c = cell(k);
        nu_ = w.d_u[c] + w.c_prime[c] * nu_;
        nv_ = w.d_v[c] + w.c_prime[c] * nv_;
        const int i = static_cast<int>(c % static_cast<std::size_t>(ni));
        const int j = static_cast<int>(c / static_cast<std::size_t>(ni));
        u(i, j) = nu_;
        v(i, j) = nv_;
    }
}

/// The j-lines colour by colour, chunks of one colour in parallel.
void sweep_j_lines(const MomentumSystem& s, const Connectivity& con, CellView u, CellView v,
                   LineWork& w) {
    VEER_VERIFY(!w.j_lines.colours.empty(), "line relaxation used before LineWork::prepare");
    const long cells = static_cast<long>(con.ni) * con.nj / 2;
    for (const std::vector<LineChunk>& chunks : w.j_lines.colours) {
        fill_connected_ghosts(con, u);
        fill_connected_ghosts(con, v);
        for_each_line(0, static_cast<int>(chunks.size()), 1, cells, [&](int k) {
            relax_line_chunk(s, con, chunks[static_cast<std::size_t>(k)], u, v, w);
        });
    }
}

void sweep_i_lines(const MomentumSystem& s, const Connectivity& con, CellView u, CellView v,
                   LineWork& w) {
    const int ni = con.ni, nj = con.nj;
    for (int colour = 0; colour < 2; ++colour) {
        fill_connected_ghosts(con, u);
        fill_connected_ghosts(con, v);
        for_each_line(colour, nj, 2, static_cast<long>(ni) * nj / 2, [&](int j) {
            solve_line(
                s, ni, [&](int k) { return idx(ni, k, j); },
                [&](std::size_t c) { return s.west[c]; }, [&](std::size_t c) { return s.east[c]; },
                [&](int k, std::size_t c, double& eu, double& ev) {
                    eu = s.south[c] * u(k, j - 1) + s.north[c] * u(k, j + 1);
                    ev = s.south[c] * v(k, j - 1) + s.north[c] * v(k, j + 1);
                    if (k == 0) {
                        eu += s.west[c] * u(-1, j);
                        ev += s.west[c] * v(-1, j);
                    }
                    if (k == ni - 1) {
                        eu += s.east[c] * u(ni, j);
                        ev += s.east[c] * v(ni, j);
                    }
                },
                w, u, v, ni);
        });
    }
}

}  // namespace

double momentum_residual(const MomentumSystem& s, const Connectivity& con, CellView u, CellView v) {
    fill_connected_ghosts(con, u);
    fill_connected_ghosts(con, v);
    const int ni = con.ni;
    const double sum = sum_over_cells({0, con.ni, 0, con.nj}, [&](int i, int j) {
        const std::size_t c = idx(ni, i, j);
        const double ru = s.rhs_u[c] - s.diag[c] * u(i, j) + s.west[c] * u(i - 1, j) +
                          s.east[c] * u(i + 1, j) + s.south[c] * u(i, j - 1) +
                          s.north[c] * u(i, j + 1);
        const double rv = s.rhs_v[c] - s.diag[c] * v(i, j) + s.west[c] * v(i - 1, j) +
                          s.east[c] * v(i + 1, j) + s.south[c] * v(i, j - 1) +
                          s.north[c] * v(i, j + 1);
        return ru * ru + rv * rv;
    });
    return std::sqrt(sum);
}

RelaxationStats relax_momentum(const MomentumSystem& sys, const Connectivity& c, CellView u,
                               CellView v, int max_sweeps, double rel_tol, LineWork& work) {
    RelaxationStats st;
    if (rel_tol > 0.0) st.initial_residual = momentum_residual(sys, c, u, v);
    for (int n = 0; n < max_sweeps; ++n) {
        sweep_j_lines(sys, c, u, v, work);
        sweep_i_lines(sys, c, u, v, work);
        ++st.sweeps;
        if (rel_tol > 0.0) {
            st.final_residual = momentum_residual(sys, c, u, v);
            if (st.final_residual <= rel_tol * st.initial_residual) break;
        }
    }
    fill_connected_ghosts(c, u);
    fill_connected_ghosts(c, v);
    return st;
}

}  // namespace veer
