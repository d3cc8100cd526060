#include "solver/pressure_operator.hpp"

#include <algorithm>
#include <cstddef>
#include <string>

#include "mesh/errors.hpp"
#include "solver/pressure_loops.hpp"

namespace veer {
namespace {

constexpr int slot_im = 0, slot_ip = 1, slot_jm = 2, slot_jp = 3;

bool in_wake(const CGridLayout& c, int i, int ni) { return i < c.wake || i >= ni - c.wake; }

void check_sizes(const PoissonStencil& s) {
    const auto n_i = static_cast<std::size_t>(s.ni + 1) * static_cast<std::size_t>(s.nj);
    const auto n_j = static_cast<std::size_t>(s.ni) * static_cast<std::size_t>(s.nj + 1);
    VEER_VERIFY(s.ni > 0 && s.nj > 0, "stencil without cells");
    VEER_VERIFY(s.coef_i.size() == n_i && s.coef_j.size() == n_j, "stencil coefficient sizes");
    VEER_VERIFY(s.dirichlet_i.empty() || s.dirichlet_i.size() == n_i, "dirichlet_i size");
    VEER_VERIFY(s.dirichlet_j.empty() || s.dirichlet_j.size() == n_j, "dirichlet_j size");
    if (s.wake_cut) {
        VEER_VERIFY(!s.periodic_j, "a wake cut and periodic j exclude each other");
        VEER_VERIFY(s.wake_cut->wake >= 0 && 2 * s.wake_cut->wake + s.wake_cut->around == s.ni,
                    "wake cut layout does not match ni = 2 * wake + around");
    }
}

bool flag(const std::vector<std::uint8_t>& f, std::size_t k) { return !f.empty() && f[k] != 0; }

/// Adds one face of a cell: a neighbour with coupling c, or a Dirichlet boundary, or nothing.
void add_face(PressureRow& row, int slot, int self, int neighbour, double c) {
    if (neighbour >= 0 && neighbour != self) {
        row.neighbour[static_cast<std::size_t>(slot)] = neighbour;
        row.coupling[static_cast<std::size_t>(slot)] = c;
        row.diagonal += c;
    } else if (neighbour < 0) {
        row.diagonal += c;  // Dirichlet-zero face (c already 0 for Neumann faces)
    }
}

}  // namespace

PressureOperator make_pressure_operator(const PoissonStencil& s) {
    check_sizes(s);
    PressureOperator op;
    op.ni = s.ni;
    op.nj = s.nj;
    op.singular = !s.has_dirichlet();
    op.rows.resize(static_cast<std::size_t>(s.ni) * static_cast<std::size_t>(s.nj));
    const int ni = s.ni, nj = s.nj;
    auto fi_index = [&](int fi, int j) { return static_cast<std::size_t>(fi + (ni + 1) * j); };
    auto fj_index = [&](int i, int fj) { return static_cast<std::size_t>(i + ni * fj); };
    // A boundary face contributes its coefficient only if flagged Dirichlet.
    auto boundary_i = [&](std::size_t f) { return flag(s.dirichlet_i, f) ? s.coef_i[f] : 0.0; };
    auto boundary_j = [&](std::size_t f) { return flag(s.dirichlet_j, f) ? s.coef_j[f] : 0.0; };
    for (int j = 0; j < nj; ++j)
        for (int i = 0; i < ni; ++i) {
            const int self = i + ni * j;
            PressureRow& row = op.rows[static_cast<std::size_t>(self)];
            row.neighbour.fill(self);
            // -i face
            if (i > 0)
                add_face(row, slot_im, self, self - 1, s.coef_i[fi_index(i, j)]);
            else if (s.periodic_i)
                add_face(row, slot_im, self, ni - 1 + ni * j, s.coef_i[fi_index(0, j)]);
            else
                add_face(row, slot_im, self, -1, boundary_i(fi_index(0, j)));
            // +i face
            if (i < ni - 1)
                add_face(row, slot_ip, self, self + 1, s.coef_i[fi_index(i + 1, j)]);
            else if (s.periodic_i)
                add_face(row, slot_ip, self, ni * j, s.coef_i[fi_index(0, j)]);
            else
                add_face(row, slot_ip, self, -1, boundary_i(fi_index(ni, j)));
            // -j face: interior, wake cut (mirror cell), periodic, or boundary
            if (j > 0) {
                add_face(row, slot_jm, self, self - ni, s.coef_j[fj_index(i, j)]);
            } else if (s.wake_cut && in_wake(*s.wake_cut, i, ni)) {
                const int mirror = ni - 1 - i;
                VEER_VERIFY(!flag(s.dirichlet_j, fj_index(i, 0)), "Dirichlet face on the wake cut");
                // Both cells use the coefficient of the lower-index face: the matrix stays
                // symmetric.
                add_face(row, slot_jm, self, mirror, s.coef_j[fj_index(std::min(i, mirror), 0)]);
            } else if (s.periodic_j) {
                add_face(row, slot_jm, self, i + ni * (nj - 1), s.coef_j[fj_index(i, 0)]);
            } else {
                add_face(row, slot_jm, self, -1, boundary_j(fj_index(i, 0)));
            }
            // +j face
            if (j < nj - 1)
                add_face(row, slot_jp, self, self + ni, s.coef_j[fj_index(i, j + 1)]);
            else if (s.periodic_j)
                add_face(row, slot_jp, self, i, s.coef_j[fj_index(i, 0)]);
            else
                add_face(row, slot_jp, self, -1, boundary_j(fj_index(i, nj)));
        }
    return op;
}

void apply_operator(const PressureOperator& op, const std::vector<double>& x,
                    std::vector<double>& y) {
    const int n = op.size();
    y.resize(static_cast<std::size_t>(n));
    const PressureRow* rows = op.rows.data();
    const double* xp = x.data();
    double* yp = y.data();
    parallel_for(n, parallel_cell_threshold, [=](int c) { yp[c] = row_product(rows[c], xp, c); });
}

void operator_residual(const PressureOperator& op, const std::vector<double>& b,
                       const std::vector<double>& x, std::vector<double>& r) {
    apply_operator(op, x, r);
    const double* bp = b.data();
    double* rp = r.data();
    parallel_for(op.size(), parallel_cell_threshold, [=](int c) { rp[c] = bp[c] - rp[c]; });
}

double ordered_dot(const std::vector<double>& a, const std::vector<double>& b) {
    VEER_ASSERT(a.size() == b.size(), "dot of vectors of different sizes");
    const double* ap = a.data();
    const double* bp = b.data();
    return ordered_block_sum(a.size(), [=](std::size_t k) { return ap[k] * bp[k]; });
}

double ordered_mean(const std::vector<double>& a) {
    if (a.empty()) return 0.0;
    const double* ap = a.data();
    return ordered_block_sum(a.size(), [=](std::size_t k) { return ap[k]; }) /
           static_cast<double>(a.size());
}

void remove_mean(std::vector<double>& a) {
    const double mean = ordered_mean(a);
    for (double& v : a) v -= mean;
}

}  // namespace veer
