#include "solver/face_flux.hpp"

#include "solver/loops.hpp"

namespace veer {

void predicted_face_flux(const FaceGeometry& g, CellView u, CellView v, CellView p, CellView gpx,
                         CellView gpy, const std::vector<double>& rc_i,
                         const std::vector<double>& rc_j, std::vector<double>& flux_i,
                         std::vector<double>& flux_j) {
    const FaceFamily& fi = g.i_faces;
    for_each_cell({0, g.ni + 1, 0, g.nj}, [&](int f, int j) {
        const std::size_t k = g.face_i(f, j);
        const Vec2 a = fi.area[k], d = fi.delta[k];
        double flux = 0.5 * (a.x * (u(f - 1, j) + u(f, j)) + a.y * (v(f - 1, j) + v(f, j)));
        if (!fi.physical[k]) {
            const double third =
                (p(f, j) - p(f - 1, j)) -
                0.5 * (d.x * (gpx(f - 1, j) + gpx(f, j)) + d.y * (gpy(f - 1, j) + gpy(f, j)));
            flux -= rc_i[k] * fi.ortho[k] * third;
        }
        flux_i[k] = flux;
    });
    const FaceFamily& fj = g.j_faces;
    for_each_cell({0, g.ni, 0, g.nj + 1}, [&](int i, int f) {
        const std::size_t k = g.face_j(i, f);
        const Vec2 a = fj.area[k], d = fj.delta[k];
        double flux = 0.5 * (a.x * (u(i, f - 1) + u(i, f)) + a.y * (v(i, f - 1) + v(i, f)));
        if (!fj.physical[k]) {
            const double third =
                (p(i, f) - p(i, f - 1)) -
                0.5 * (d.x * (gpx(i, f - 1) + gpx(i, f)) + d.y * (gpy(i, f - 1) + gpy(i, f)));
            flux -= rc_j[k] * fj.ortho[k] * third;
        }
        flux_j[k] = flux;
    });
}

void net_outflow(const FaceGeometry& g, const std::vector<double>& flux_i,
                 const std::vector<double>& flux_j, std::vector<double>& out) {
    out.resize(g.volume.size());
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        out[g.cell(i, j)] = flux_i[g.face_i(i + 1, j)] - flux_i[g.face_i(i, j)] +
                            flux_j[g.face_j(i, j + 1)] - flux_j[g.face_j(i, j)];
    });
}

void correct_face_flux(const FaceGeometry& g, CellView phi, const std::vector<double>& gamma_i,
                       const std::vector<double>& gamma_j, std::vector<double>& flux_i,
                       std::vector<double>& flux_j) {
    for_each_cell({0, g.ni + 1, 0, g.nj}, [&](int f, int j) {
        const std::size_t k = g.face_i(f, j);
        flux_i[k] -= gamma_i[k] * g.i_faces.ortho[k] * (phi(f, j) - phi(f - 1, j));
    });
    for_each_cell({0, g.ni, 0, g.nj + 1}, [&](int i, int f) {
        const std::size_t k = g.face_j(i, f);
        flux_j[k] -= gamma_j[k] * g.j_faces.ortho[k] * (phi(i, f) - phi(i, f - 1));
    });
}

void flux_consistent_correction(const FaceGeometry& g, CellView phi,
                                const std::vector<double>& gamma_i,
                                const std::vector<double>& gamma_j, CellView du, CellView dv) {
    const FaceFamily& fi = g.i_faces;
    const FaceFamily& fj = g.j_faces;
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        const Vec2 xp = g.centroid[g.cell(i, j)];
        const std::size_t w = g.face_i(i, j), e = g.face_i(i + 1, j);
        const std::size_t s = g.face_j(i, j), n = g.face_j(i, j + 1);
        const double pp = phi(i, j);
        // Outward flux changes through the four faces.
        const double dw = gamma_i[w] * fi.ortho[w] * (pp - phi(i - 1, j));
        const double de = -gamma_i[e] * fi.ortho[e] * (phi(i + 1, j) - pp);
        const double ds = gamma_j[s] * fj.ortho[s] * (pp - phi(i, j - 1));
        const double dn = -gamma_j[n] * fj.ortho[n] * (phi(i, j + 1) - pp);
        const Vec2 sum = dw * (fi.center[w] - xp) + de * (fi.center[e] - xp) +
                         ds * (fj.center[s] - xp) + dn * (fj.center[n] - xp);
        const double inv_v = 1.0 / g.volume[g.cell(i, j)];
        du(i, j) = inv_v * sum.x;
        dv(i, j) = inv_v * sum.y;
    });
}

void interpolated_face_flux(const FaceGeometry& g, CellView u, CellView v,
                            std::vector<double>& flux_i, std::vector<double>& flux_j) {
    const std::vector<double> none_i(flux_i.size(), 0.0), none_j(flux_j.size(), 0.0);
    predicted_face_flux(g, u, v, u, u, u, none_i, none_j, flux_i, flux_j);
}

}  // namespace veer
