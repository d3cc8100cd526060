#include "solver/spalart_allmaras_transport.hpp"

#include <algorithm>

#include "solver/loops.hpp"
#include "solver/scalar_transport.hpp"
#include "solver/spalart_allmaras_terms.hpp"
#include "solver/van_leer.hpp"

namespace veer {

ScalarColumn nu_tilde_column(double free_stream_nu_tilde,
                             const std::function<double(Vec2)>& prescribed) {
    ScalarColumn c;
    c.wall = {Condition::dirichlet, 0.0, {}};
    c.inflow = {Condition::dirichlet, free_stream_nu_tilde, {}};
    c.outflow = {Condition::neumann, 0.0, {}};
    c.prescribed_velocity = {Condition::dirichlet, 0.0, prescribed};
    return c;
}

namespace {

void face_pass(const FaceGeometry& g, const NuTildeInputs& in, NuTildeFaceWork& w) {
    const CellView q = in.nu_tilde, gx = in.grad_x, gy = in.grad_y;
    // mu_f, mu_f skew . grad q and the convective correction of one face, from the four cells
    // across it (ll, l | r, rr) and the face mean of the cell gradients.
    auto face = [&](const FaceFamily& fam, std::size_t k, double flux, double q_ll, double q_l,
                    double q_r, double q_rr, double gfx, double gfy, std::vector<double>& mu,
                    std::vector<double>& skew, std::vector<double>& conv) {
        mu[k] = sa_diffusivity(0.5 * (q_l + q_r), in.nu);
        skew[k] = mu[k] * (fam.skew[k].x * gfx + fam.skew[k].y * gfy);
        const bool corrected = in.second_order && !fam.physical[k];
        conv[k] = corrected ? van_leer_correction(flux, q_ll, q_l, q_r, q_rr) : 0.0;
    };
    for_each_cell({0, g.ni + 1, 0, g.nj}, [&](int f, int j) {
        face(g.i_faces, g.face_i(f, j), (*in.flux_i)[g.face_i(f, j)], q(f - 2, j), q(f - 1, j),
             q(f, j), q(f + 1, j), 0.5 * (gx(f - 1, j) + gx(f, j)), 0.5 * (gy(f - 1, j) + gy(f, j)),
             w.mu_i, w.skew_i, w.conv_i);
    });
    for_each_cell({0, g.ni, 0, g.nj + 1}, [&](int i, int f) {
        face(g.j_faces, g.face_j(i, f), (*in.flux_j)[g.face_j(i, f)], q(i, f - 2), q(i, f - 1),
             q(i, f), q(i, f + 1), 0.5 * (gx(i, f - 1) + gx(i, f)), 0.5 * (gy(i, f - 1) + gy(i, f)),
             w.mu_j, w.skew_j, w.conv_j);
    });
}

/// The terms of one face of cell P (value q_p, mu_p) towards its neighbour value q_n; sign is
/// +1 where the face's +i/+j direction points out of P. Returns the neighbour coefficient.
inline double cell_face(double mu_f, double ortho, double skew, double conv, double sign,
                        double inflow, double q_p, double q_n, double mu_p, bool split,
                        double& rhs) {
    constexpr double cb2 = SpalartAllmarasConstants::cb2;
    double coef = mu_f * ortho;
    rhs -= sign * conv;
    if (split) {
        const double raw = coef + cb2 * (mu_f - mu_p) * ortho;
        coef = std::max(raw, 0.0);
        rhs += (raw - coef) * (q_n - q_p) + (1.0 + cb2 * (1.0 - mu_p / mu_f)) * sign * skew;
    } else {
        rhs += sign * skew;
    }
    return coef + inflow;
}

void cell_pass(const FaceGeometry& g, const NuTildeInputs& in, const NuTildeFaceWork& w,
               MomentumSystem& s) {
    constexpr double cb2_over_sigma =
        SpalartAllmarasConstants::cb2 / SpalartAllmarasConstants::sigma;
    const std::vector<double>& fx = *in.flux_i;
    const std::vector<double>& fy = *in.flux_j;
    const double* oi = g.i_faces.ortho.data();
    const double* oj = g.j_faces.ortho.data();
    const CellView q = in.nu_tilde, gx = in.grad_x, gy = in.grad_y;
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        const std::size_t c = g.cell(i, j);
        const std::size_t we = g.face_i(i, j), e = g.face_i(i + 1, j);
        const std::size_t so = g.face_j(i, j), n = g.face_j(i, j + 1);
        const double qp = q(i, j), qw = q(i - 1, j), qe = q(i + 1, j);
        const double qs = q(i, j - 1), qn = q(i, j + 1);
        const double lowest_face = 0.5 * (qp + std::min(std::min(qw, qe), std::min(qs, qn)));
        const bool split = qp >= 0.0 && lowest_face >= 0.0;
        const double mu_p = sa_diffusivity(qp, in.nu);
        const double vol = g.volume[c];
        double rhs = (*in.time_diag)[c] * qp + vol * (*in.source_explicit)[c];
        if (!split) rhs += vol * cb2_over_sigma * (gx(i, j) * gx(i, j) + gy(i, j) * gy(i, j));
        s.west[c] = cell_face(w.mu_i[we], oi[we], w.skew_i[we], w.conv_i[we], -1.0,
                              std::max(fx[we], 0.0), qp, qw, mu_p, split, rhs);
        s.east[c] = cell_face(w.mu_i[e], oi[e], w.skew_i[e], w.conv_i[e], 1.0,
                              std::max(-fx[e], 0.0), qp, qe, mu_p, split, rhs);
        s.south[c] = cell_face(w.mu_j[so], oj[so], w.skew_j[so], w.conv_j[so], -1.0,
                               std::max(fy[so], 0.0), qp, qs, mu_p, split, rhs);
        s.north[c] = cell_face(w.mu_j[n], oj[n], w.skew_j[n], w.conv_j[n], 1.0,
                               std::max(-fy[n], 0.0), qp, qn, mu_p, split, rhs);
        s.diag[c] = (*in.time_diag)[c] + s.west[c] + s.east[c] + s.south[c] + s.north[c] +
                    vol * (*in.source_implicit)[c];
        s.rhs_u[c] = rhs;
        s.rhs_v[c] = 0.0;
    });
}

}  // namespace

void NuTildeFaceWork::resize(const FaceGeometry& g) {
    for (auto* v : {&mu_i, &skew_i, &conv_i}) v->assign(g.i_faces.area.size(), 0.0);
    for (auto* v : {&mu_j, &skew_j, &conv_j}) v->assign(g.j_faces.area.size(), 0.0);
}

void assemble_nu_tilde(const FaceGeometry& g, const std::vector<BoundaryFace>& faces,
                       const std::vector<ScalarFaceCondition>& conditions, const NuTildeInputs& in,
                       NuTildeFaceWork& work, MomentumSystem& sys) {
    face_pass(g, in, work);
    clear_neumann_skew(faces, conditions, work.skew_i, work.skew_j);
    cell_pass(g, in, work, sys);
    fold_scalar_boundaries(g, faces, conditions, *in.flux_i, *in.flux_j, sys);
}

}  // namespace veer
