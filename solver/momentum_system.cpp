#include "solver/momentum_system.hpp"

#include <algorithm>

#include "solver/loops.hpp"
#include "solver/van_leer.hpp"

namespace veer {

void MomentumSystem::resize(int ni, int nj) {
    const std::size_t n = static_cast<std::size_t>(ni) * static_cast<std::size_t>(nj);
    for (auto* a : {&diag, &west, &east, &south, &north, &rhs_u, &rhs_v}) a->assign(n, 0.0);
    const std::size_t nfi = static_cast<std::size_t>(ni + 1) * static_cast<std::size_t>(nj);
    const std::size_t nfj = static_cast<std::size_t>(ni) * static_cast<std::size_t>(nj + 1);
    explicit_i_u.assign(nfi, 0.0);
    explicit_i_v.assign(nfi, 0.0);
    explicit_j_u.assign(nfj, 0.0);
    explicit_j_v.assign(nfj, 0.0);
}

namespace {

/// Laminar plus eddy viscosity on one face.
inline double face_nu(double nu, const std::vector<double>* eddy, std::size_t k) {
    return eddy ? nu + (*eddy)[k] : nu;
}

/// Explicit face fluxes of both families (towards +i / +j).
void face_pass(const FaceGeometry& g, const MomentumInputs& in, MomentumSystem& s) {
    const FaceFamily& fi = g.i_faces;
    for_each_cell({0, g.ni + 1, 0, g.nj}, [&](int f, int j) {
        const std::size_t k = g.face_i(f, j);
        const double nu = in.nu + (in.eddy_i ? (*in.eddy_i)[k] : 0.0);
        const Vec2 sk = fi.skew[k];
        const double du = nu * (sk.x * 0.5 * (in.ux(f - 1, j) + in.ux(f, j)) +
                                sk.y * 0.5 * (in.uy(f - 1, j) + in.uy(f, j)));
        const double dv = nu * (sk.x * 0.5 * (in.vx(f - 1, j) + in.vx(f, j)) +
                                sk.y * 0.5 * (in.vy(f - 1, j) + in.vy(f, j)));
        if (fi.physical[k]) {
            const double keep = fi.velocity_dirichlet[k] ? 1.0 : 0.0;
            s.explicit_i_u[k] = keep * du;
            s.explicit_i_v[k] = keep * dv;
            return;
        }
        const double flux = (*in.flux_i)[k];
        const CellView& u = in.u_lag;
        const CellView& v = in.v_lag;
        s.explicit_i_u[k] =
            du - van_leer_correction(flux, u(f - 2, j), u(f - 1, j), u(f, j), u(f + 1, j));
        s.explicit_i_v[k] =
            dv - van_leer_correction(flux, v(f - 2, j), v(f - 1, j), v(f, j), v(f + 1, j));
    });
    const FaceFamily& fj = g.j_faces;
    for_each_cell({0, g.ni, 0, g.nj + 1}, [&](int i, int f) {
        const std::size_t k = g.face_j(i, f);
        const double nu = in.nu + (in.eddy_j ? (*in.eddy_j)[k] : 0.0);
        const Vec2 sk = fj.skew[k];
        const double du = nu * (sk.x * 0.5 * (in.ux(i, f - 1) + in.ux(i, f)) +
                                sk.y * 0.5 * (in.uy(i, f - 1) + in.uy(i, f)));
        const double dv = nu * (sk.x * 0.5 * (in.vx(i, f - 1) + in.vx(i, f)) +
                                sk.y * 0.5 * (in.vy(i, f - 1) + in.vy(i, f)));
        if (fj.physical[k]) {
            const double keep = fj.velocity_dirichlet[k] ? 1.0 : 0.0;
            s.explicit_j_u[k] = keep * du;
            s.explicit_j_v[k] = keep * dv;
            return;
        }
        const double flux = (*in.flux_j)[k];
        const CellView& u = in.u_lag;
        const CellView& v = in.v_lag;
        s.explicit_j_u[k] =
            du - van_leer_correction(flux, u(i, f - 2), u(i, f - 1), u(i, f), u(i, f + 1));
        s.explicit_j_v[k] =
            dv - van_leer_correction(flux, v(i, f - 2), v(i, f - 1), v(i, f), v(i, f + 1));
    });
}

/// Coefficients and right-hand sides of every cell, all four faces treated as interior.
void cell_pass(const FaceGeometry& g, const MomentumInputs& in, MomentumSystem& s) {
    const std::vector<double>& fx = *in.flux_i;
    const std::vector<double>& fy = *in.flux_j;
    const double* oi = g.i_faces.ortho.data();
    const double* oj = g.j_faces.ortho.data();
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        const std::size_t c = g.cell(i, j);
        const std::size_t w = g.face_i(i, j), e = g.face_i(i + 1, j);
        const std::size_t so = g.face_j(i, j), n = g.face_j(i, j + 1);
        const double fw = fx[w], fe = fx[e], fs = fy[so], fn = fy[n];
        const double dw = face_nu(in.nu, in.eddy_i, w) * oi[w];
        const double de = face_nu(in.nu, in.eddy_i, e) * oi[e];
        const double ds = face_nu(in.nu, in.eddy_j, so) * oj[so];
        const double dn = face_nu(in.nu, in.eddy_j, n) * oj[n];
        s.west[c] = dw + std::max(fw, 0.0);
        s.east[c] = de + std::max(-fe, 0.0);
        s.south[c] = ds + std::max(fs, 0.0);
        s.north[c] = dn + std::max(-fn, 0.0);
        s.diag[c] = (*in.time_diag)[c] + dw + de + ds + dn + std::max(-fw, 0.0) +
                    std::max(fe, 0.0) + std::max(-fs, 0.0) + std::max(fn, 0.0);
        const double vol = g.volume[c];
        double bu = (*in.time_rhs_u)[c] - vol * in.grad_px(i, j) + s.explicit_i_u[e] -
                    s.explicit_i_u[w] + s.explicit_j_u[n] - s.explicit_j_u[so];
        double bv = (*in.time_rhs_v)[c] - vol * in.grad_py(i, j) + s.explicit_i_v[e] -
                    s.explicit_i_v[w] + s.explicit_j_v[n] - s.explicit_j_v[so];
        if (in.source_u) bu += (*in.source_u)[c];
        if (in.source_v) bv += (*in.source_v)[c];
        s.rhs_u[c] = bu;
        s.rhs_v[c] = bv;
    });
}

/// Folds the ghost neighbour of each physical face into the diagonal and right-hand side.
void fold_boundaries(const FaceGeometry& g, const std::vector<BoundaryFace>& faces,
                     const MomentumInputs& in, MomentumSystem& s) {
    for (const BoundaryFace& b : faces) {
        const std::size_t c = g.cell(b.i, b.j);
        const FaceFamily& fam = b.i_face ? g.i_faces : g.j_faces;
        const double flux_out = b.outward * (b.i_face ? *in.flux_i : *in.flux_j)[b.face];
        const double dg =
            face_nu(in.nu, b.i_face ? in.eddy_i : in.eddy_j, b.face) * fam.ortho[b.face];
        double& slot = b.i_face ? (b.outward < 0 ? s.west[c] : s.east[c])
                                : (b.outward < 0 ? s.south[c] : s.north[c]);
        slot = 0.0;
        s.diag[c] -= std::max(flux_out, 0.0);
        if (conditions_for(b.role).velocity == Condition::dirichlet) {
            s.diag[c] += dg;
            s.rhs_u[c] += (2.0 * dg - flux_out) * b.velocity.x;
            s.rhs_v[c] += (2.0 * dg - flux_out) * b.velocity.y;
        } else if (flux_out > 0.0) {
            s.diag[c] += flux_out - dg;
        } else {
            s.diag[c] -= dg;
            s.rhs_u[c] -= flux_out * in.u_now(b.i, b.j);
            s.rhs_v[c] -= flux_out * in.v_now(b.i, b.j);
        }
    }
}

}  // namespace

void assemble_momentum(const FaceGeometry& g, const std::vector<BoundaryFace>& faces,
                       const MomentumInputs& in, MomentumSystem& sys) {
    face_pass(g, in, sys);
    cell_pass(g, in, sys);
    fold_boundaries(g, faces, in, sys);
}

}  // namespace veer
