#include "solver/scalar_transport.hpp"

#include <algorithm>

#include "solver/loops.hpp"
#include "solver/van_leer.hpp"

namespace veer {

void ScalarFaceWork::resize(const FaceGeometry& g) {
    for (auto* v : {&skew_i, &conv_i}) v->assign(g.i_faces.area.size(), 0.0);
    for (auto* v : {&skew_j, &conv_j}) v->assign(g.j_faces.area.size(), 0.0);
}

namespace {

void face_pass(const FaceGeometry& g, const ScalarTransportInputs& in, ScalarFaceWork& w) {
    const CellView q = in.q, gx = in.grad_x, gy = in.grad_y;
    auto face = [&](const FaceFamily& fam, std::size_t k, double mu, double flux, double q_ll,
                    double q_l, double q_r, double q_rr, double gfx, double gfy, double& skew,
                    double& conv) {
        skew = mu * (fam.skew[k].x * gfx + fam.skew[k].y * gfy);
        const bool corrected = in.second_order && !fam.physical[k];
        conv = corrected ? van_leer_correction(flux, q_ll, q_l, q_r, q_rr) : 0.0;
    };
    for_each_cell({0, g.ni + 1, 0, g.nj}, [&](int f, int j) {
        const std::size_t k = g.face_i(f, j);
        face(g.i_faces, k, (*in.mu_i)[k], (*in.flux_i)[k], q(f - 2, j), q(f - 1, j), q(f, j),
             q(f + 1, j), 0.5 * (gx(f - 1, j) + gx(f, j)), 0.5 * (gy(f - 1, j) + gy(f, j)),
             w.skew_i[k], w.conv_i[k]);
    });
    for_each_cell({0, g.ni, 0, g.nj + 1}, [&](int i, int f) {
        const std::size_t k = g.face_j(i, f);
        face(g.j_faces, k, (*in.mu_j)[k], (*in.flux_j)[k], q(i, f - 2), q(i, f - 1), q(i, f),
             q(i, f + 1), 0.5 * (gx(i, f - 1) + gx(i, f)), 0.5 * (gy(i, f - 1) + gy(i, f)),
             w.skew_j[k], w.conv_j[k]);
    });
}

void cell_pass(const FaceGeometry& g, const ScalarTransportInputs& in, const ScalarFaceWork& w,
               MomentumSystem& s) {
    const std::vector<double>& fx = *in.flux_i;
    const std::vector<double>& fy = *in.flux_j;
    const std::vector<double>& mi = *in.mu_i;
    const std::vector<double>& mj = *in.mu_j;
    const double* oi = g.i_faces.ortho.data();
    const double* oj = g.j_faces.ortho.data();
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        const std::size_t c = g.cell(i, j);
        const std::size_t we = g.face_i(i, j), e = g.face_i(i + 1, j);
        const std::size_t so = g.face_j(i, j), n = g.face_j(i, j + 1);
        double rhs = (*in.time_diag)[c] * in.q(i, j) + g.volume[c] * (*in.source_explicit)[c];
        rhs += w.conv_i[we] - w.conv_i[e] + w.conv_j[so] - w.conv_j[n];
        rhs += w.skew_i[e] - w.skew_i[we] + w.skew_j[n] - w.skew_j[so];
        s.west[c] = mi[we] * oi[we] + std::max(fx[we], 0.0);
        s.east[c] = mi[e] * oi[e] + std::max(-fx[e], 0.0);
        s.south[c] = mj[so] * oj[so] + std::max(fy[so], 0.0);
        s.north[c] = mj[n] * oj[n] + std::max(-fy[n], 0.0);
        s.diag[c] = (*in.time_diag)[c] + s.west[c] + s.east[c] + s.south[c] + s.north[c] +
                    g.volume[c] * (*in.source_implicit)[c];
        s.rhs_u[c] = rhs;
        s.rhs_v[c] = 0.0;
    });
}

}  // namespace

void clear_neumann_skew(const std::vector<BoundaryFace>& faces,
                        const std::vector<ScalarFaceCondition>& conditions,
                        std::vector<double>& skew_i, std::vector<double>& skew_j) {
    for (std::size_t k = 0; k < faces.size(); ++k)
        if (!conditions[k].dirichlet) (faces[k].i_face ? skew_i : skew_j)[faces[k].face] = 0.0;
}

void fold_scalar_boundaries(const FaceGeometry& g, const std::vector<BoundaryFace>& faces,
                            const std::vector<ScalarFaceCondition>& conditions,
                            const std::vector<double>& flux_i, const std::vector<double>& flux_j,
                            MomentumSystem& s) {
    for (std::size_t k = 0; k < faces.size(); ++k) {
        const BoundaryFace& b = faces[k];
        const std::size_t c = g.cell(b.i, b.j);
        double& slot = b.i_face ? (b.outward < 0 ? s.west[c] : s.east[c])
                                : (b.outward < 0 ? s.south[c] : s.north[c]);
        const double flux = (b.i_face ? flux_i : flux_j)[b.face];
        const double inflow = std::max(-b.outward * flux, 0.0);
        if (conditions[k].dirichlet) {
            const double dg = slot - inflow;
            s.diag[c] += dg;
            s.rhs_u[c] += (2.0 * dg + inflow) * conditions[k].value;
        } else {
            s.diag[c] -= slot;  // ghost = q_P: nothing crosses the face
        }
        slot = 0.0;
    }
}

void assemble_scalar(const FaceGeometry& g, const std::vector<BoundaryFace>& faces,
                     const std::vector<ScalarFaceCondition>& conditions,
                     const ScalarTransportInputs& in, ScalarFaceWork& work, MomentumSystem& sys) {
    face_pass(g, in, work);
    clear_neumann_skew(faces, conditions, work.skew_i, work.skew_j);
    cell_pass(g, in, work, sys);
    fold_scalar_boundaries(g, faces, conditions, *in.flux_i, *in.flux_j, sys);
}

}  // namespace veer
