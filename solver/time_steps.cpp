#include "solver/time_steps.hpp"

#include <cmath>
#include <limits>

#include "solver/loops.hpp"

namespace veer {

BdfCoefficients bdf_coefficients(bool second_order, double dt, double dt_previous) {
    if (!second_order) return {};
    const double w = dt / dt_previous;
    BdfCoefficients c;
    c.alpha0 = (1.0 + 2.0 * w) / (1.0 + w);
    c.alpha1 = -(1.0 + w);
    c.alpha2 = w * w / (1.0 + w);
    c.extrap0 = 1.0 + w;
    c.extrap1 = -w;
    return c;
}

double cell_spectral_radius(const FaceGeometry& g, int i, int j, double u, double v, double nu,
                            double viscous_weight, double speed_floor) {
    const Vec2 si = 0.5 * (g.i_faces.area[g.face_i(i, j)] + g.i_faces.area[g.face_i(i + 1, j)]);
    const Vec2 sj = 0.5 * (g.j_faces.area[g.face_j(i, j)] + g.j_faces.area[g.face_j(i, j + 1)]);
    const double vol = g.volume[g.cell(i, j)];
    const double convective = std::abs(u * si.x + v * si.y) + std::abs(u * sj.x + v * sj.y) +
                              speed_floor * (norm(si) + norm(sj));
    const double viscous = 2.0 * nu * (dot(si, si) + dot(sj, sj)) / vol;
    return (convective + viscous_weight * viscous) / vol;
}

void local_time_steps(const FaceGeometry& g, CellView u, CellView v, double nu, double cfl,
                      double viscous_weight, std::vector<double>& dt) {
    dt.resize(g.volume.size());
    for_each_cell({0, g.ni, 0, g.nj}, [&](int i, int j) {
        dt[g.cell(i, j)] =
            cfl / cell_spectral_radius(g, i, j, u(i, j), v(i, j), nu, viscous_weight, 1e-3);
    });
}

double convective_time_step(const FaceGeometry& g, CellView u, CellView v, double cfl) {
    const double inf = std::numeric_limits<double>::infinity();
    double dt = min_over_cells({0, g.ni, 0, g.nj}, inf, [&](int i, int j) {
        const double r = cell_spectral_radius(g, i, j, u(i, j), v(i, j), 0.0, 0.0, 0.0);
        return r > 0.0 ? cfl / r : inf;
    });
    if (!std::isfinite(dt))  // fluid at rest: unit speed
        dt = min_over_cells({0, g.ni, 0, g.nj}, inf, [&](int i, int j) {
            return cfl / cell_spectral_radius(g, i, j, 0.0, 0.0, 0.0, 0.0, 1.0);
        });
    return dt;
}

}  // namespace veer
