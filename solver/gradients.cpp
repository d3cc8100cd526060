#include "solver/gradients.hpp"

#include "solver/loops.hpp"

namespace veer {

void green_gauss_gradient(const FaceGeometry& g, CellView q, CellView gx, CellView gy) {
    const Vec2* ai = g.i_faces.area.data();
    const Vec2* aj = g.j_faces.area.data();
    const double* vol = g.volume.data();
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        const double qp = q(i, j);
        const double qw = 0.5 * (qp + q(i - 1, j)), qe = 0.5 * (qp + q(i + 1, j));
        const double qs = 0.5 * (qp + q(i, j - 1)), qn = 0.5 * (qp + q(i, j + 1));
        const Vec2 aw = ai[g.face_i(i, j)], ae = ai[g.face_i(i + 1, j)];
        const Vec2 as = aj[g.face_j(i, j)], an = aj[g.face_j(i, j + 1)];
        const double inv_v = 1.0 / vol[g.cell(i, j)];
        gx(i, j) = inv_v * (qe * ae.x - qw * aw.x + qn * an.x - qs * as.x);
        gy(i, j) = inv_v * (qe * ae.y - qw * aw.y + qn * an.y - qs * as.y);
    });
}

}  // namespace veer
