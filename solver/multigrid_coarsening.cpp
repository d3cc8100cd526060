#include "solver/multigrid_coarsening.hpp"

#include <cstddef>

#include "mesh/errors.hpp"

namespace veer {
namespace {

/// Read access to the fine conductances, with Neumann boundary faces reading 0.
struct FineFaces {
    const PoissonStencil& s;
    double i_face(int fi, int j) const {
        const auto f = static_cast<std::size_t>(fi + (s.ni + 1) * j);
        const bool boundary = (fi == 0 || fi == s.ni) && !s.periodic_i;
        return boundary && !dirichlet_i(fi, j) ? 0.0 : s.coef_i[f];
    }
    double j_face(int i, int fj) const {
        const auto f = static_cast<std::size_t>(i + s.ni * fj);
        const bool cut = fj == 0 && s.wake_cut && in_wake(i);
        const bool boundary = (fj == 0 || fj == s.nj) && !s.periodic_j && !cut;
        return boundary && !dirichlet_j(i, fj) ? 0.0 : s.coef_j[f];
    }
    bool dirichlet_i(int fi, int j) const {
        return !s.dirichlet_i.empty() &&
               s.dirichlet_i[static_cast<std::size_t>(fi + (s.ni + 1) * j)];
    }
    bool dirichlet_j(int i, int fj) const {
        return !s.dirichlet_j.empty() && s.dirichlet_j[static_cast<std::size_t>(i + s.ni * fj)];
    }
    bool in_wake(int i) const { return i < s.wake_cut->wake || i >= s.ni - s.wake_cut->wake; }
};

/// Conductance of a series of faces with weights (0.5, 1, 0.5) or (1, 0.5) ...; 0 if any is 0.
double series(std::initializer_list<std::pair<double, double>> weighted) {
    double resistance = 0.0;
    for (const auto& [weight, c] : weighted) {
        if (c <= 0.0) return 0.0;
        resistance += weight / c;
    }
    return 1.0 / resistance;
}

/// Path conductance along fine column i to coarse j-face fj_coarse.
double j_path(const FineFaces& f, int i, int fjc) {
    const PoissonStencil& s = f.s;
    const int fj = 2 * fjc;
    if (fjc > 0 && 2 * fjc < s.nj)
        return series(
            {{0.5, f.j_face(i, fj - 1)}, {1.0, f.j_face(i, fj)}, {0.5, f.j_face(i, fj + 1)}});
    if (fjc == 0 && s.wake_cut && f.in_wake(i))
        return series(
            {{0.5, f.j_face(i, 1)}, {1.0, f.j_face(i, 0)}, {0.5, f.j_face(s.ni - 1 - i, 1)}});
    if (s.periodic_j)
        return series({{0.5, f.j_face(i, s.nj - 1)}, {1.0, f.j_face(i, 0)}, {0.5, f.j_face(i, 1)}});
    if (fjc == 0) return series({{1.0, f.j_face(i, 0)}, {0.5, f.j_face(i, 1)}});
    return series({{0.5, f.j_face(i, s.nj - 1)}, {1.0, f.j_face(i, s.nj)}});
}

/// Path conductance along fine row j to coarse i-face fic.
double i_path(const FineFaces& f, int fic, int j) {
    const PoissonStencil& s = f.s;
    const int fi = 2 * fic;
    if (fic > 0 && 2 * fic < s.ni)
        return series(
            {{0.5, f.i_face(fi - 1, j)}, {1.0, f.i_face(fi, j)}, {0.5, f.i_face(fi + 1, j)}});
    if (s.periodic_i)
        return series({{0.5, f.i_face(s.ni - 1, j)}, {1.0, f.i_face(0, j)}, {0.5, f.i_face(1, j)}});
    if (fic == 0) return series({{1.0, f.i_face(0, j)}, {0.5, f.i_face(1, j)}});
    return series({{0.5, f.i_face(s.ni - 1, j)}, {1.0, f.i_face(s.ni, j)}});
}

void coarsen_i_faces(const FineFaces& f, PoissonStencil& c) {
    for (int jc = 0; jc < c.nj; ++jc)
        for (int fic = 0; fic <= c.ni; ++fic) {
            const auto k = static_cast<std::size_t>(fic + (c.ni + 1) * jc);
            if (c.periodic_i && fic == c.ni) {
                c.coef_i[k] = c.coef_i[static_cast<std::size_t>((c.ni + 1) * jc)];
                continue;
            }
            c.coef_i[k] = i_path(f, fic, 2 * jc) + i_path(f, fic, 2 * jc + 1);
            if ((fic == 0 || fic == c.ni) && !c.periodic_i) {
                const int fi = fic == 0 ? 0 : f.s.ni;
                c.dirichlet_i[k] = f.dirichlet_i(fi, 2 * jc) || f.dirichlet_i(fi, 2 * jc + 1);
            }
        }
}

void coarsen_j_faces(const FineFaces& f, PoissonStencil& c) {
    for (int fjc = 0; fjc <= c.nj; ++fjc)
        for (int ic = 0; ic < c.ni; ++ic) {
            const auto k = static_cast<std::size_t>(ic + c.ni * fjc);
            const bool cut =
                fjc == 0 && c.wake_cut && (ic < c.wake_cut->wake || ic >= c.ni - c.wake_cut->wake);
            if (cut && ic >= c.ni - c.wake_cut->wake) {
                c.coef_j[k] = c.coef_j[static_cast<std::size_t>(c.ni - 1 - ic)];  // its mirror
                continue;
            }
            if (c.periodic_j && fjc == c.nj) {
                c.coef_j[k] = c.coef_j[static_cast<std::size_t>(ic)];
                continue;
            }
            c.coef_j[k] = j_path(f, 2 * ic, fjc) + j_path(f, 2 * ic + 1, fjc);
            if ((fjc == 0 || fjc == c.nj) && !c.periodic_j && !cut) {
                const int fj = fjc == 0 ? 0 : f.s.nj;
                c.dirichlet_j[k] = f.dirichlet_j(2 * ic, fj) || f.dirichlet_j(2 * ic + 1, fj);
            }
        }
}

}  // namespace

bool can_coarsen(const PoissonStencil& fine) {
    if (fine.ni % 2 != 0 || fine.nj % 2 != 0 || fine.ni < 4 || fine.nj < 4) return false;
    if (!fine.wake_cut) return true;
    return fine.wake_cut->wake % 2 == 0 && fine.wake_cut->around % 2 == 0 &&
           fine.wake_cut->around >= 4;
}

int multigrid_level_count(const PoissonStencil& fine, int max_levels, int coarsest_cells) {
    int levels = 1;
    PoissonStencil shape;  // only sizes and layout matter here
    shape.ni = fine.ni;
    shape.nj = fine.nj;
    shape.wake_cut = fine.wake_cut;
    while ((max_levels <= 0 || levels < max_levels) && shape.ni * shape.nj > coarsest_cells &&
           can_coarsen(shape)) {
        shape.ni /= 2;
        shape.nj /= 2;
        if (shape.wake_cut)
            shape.wake_cut = CGridLayout{shape.wake_cut->wake / 2, shape.wake_cut->around / 2};
        ++levels;
    }
    return levels;
}

PoissonStencil coarsen_stencil(const PoissonStencil& fine) {
    VEER_VERIFY(can_coarsen(fine), "stencil cannot be coarsened (odd sizes)");
    PoissonStencil c;
    c.ni = fine.ni / 2;
    c.nj = fine.nj / 2;
    c.periodic_i = fine.periodic_i;
    c.periodic_j = fine.periodic_j;
    if (fine.wake_cut) c.wake_cut = CGridLayout{fine.wake_cut->wake / 2, fine.wake_cut->around / 2};
    const auto n_i = static_cast<std::size_t>(c.ni + 1) * static_cast<std::size_t>(c.nj);
    const auto n_j = static_cast<std::size_t>(c.ni) * static_cast<std::size_t>(c.nj + 1);
    c.coef_i.assign(n_i, 0.0);
    c.coef_j.assign(n_j, 0.0);
    c.dirichlet_i.assign(n_i, 0);
    c.dirichlet_j.assign(n_j, 0);
    const FineFaces f{fine};
    coarsen_i_faces(f, c);
    coarsen_j_faces(f, c);
    return c;
}

}  // namespace veer
