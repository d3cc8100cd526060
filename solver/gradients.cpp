#include "solver/gradients.hpp"

#include "solver/loops.hpp"

namespace veer {

void green_gauss_gradient(const FaceGeometry& g, CellView q, CellView gx, CellView gy) {
    const Vec2* ai = g.i_faces.area.data();
    const Vec2* aj = g.j_faces.area.data();
    const double* vol = g.volume.data();
    const double* wi = g.i_faces.weight.data();
    const double* wj = g.j_faces.weight.data();
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        const double qp = q(i, j);
        const std::size_t w = g.face_i(i, j), e = g.face_i(i + 1, j);
        const std::size_t s = g.face_j(i, j), n = g.face_j(i, j + 1);
        const double qw = wi[w] * q(i - 1, j) + (1.0 - wi[w]) * qp;
        const double qe = wi[e] * qp + (1.0 - wi[e]) * q(i + 1, j);
        const double qs = wj[s] * q(i, j - 1) + (1.0 - wj[s]) * qp;
        const double qn = wj[n] * qp + (1.0 - wj[n]) * q(i, j + 1);
        const Vec2 aw = ai[w], ae = ai[e];
        const Vec2 as = aj[s], an = aj[n];
        const double inv_v = 1.0 / vol[g.cell(i, j)];
        gx(i, j) = inv_v * (qe * ae.x - qw * aw.x + qn * an.x - qs * as.x);
        gy(i, j) = inv_v * (qe * ae.y - qw * aw.y + qn * an.y - qs * as.y);
    });
}

}  // namespace veer
