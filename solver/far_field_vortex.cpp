#include "solver/far_field_vortex.hpp"

#include <numbers>

namespace veer {

Vec2 point_vortex_velocity(Vec2 x, Vec2 center, double gamma) {
    const Vec2 r = x - center;
    const double r2 = dot(r, r);
    if (r2 <= 0.0) return {};
    const double s = gamma / (2.0 * std::numbers::pi * r2);
    return {s * r.y, -s * r.x};
}

Vec2 wall_force(const FaceGeometry& g, const std::vector<BoundaryFace>& faces, CellView u,
                CellView v, CellView p, double nu) {
    Vec2 force{};
    for (const BoundaryFace& b : faces) {
        if (b.role != FaceRole::wall) continue;
        const FaceFamily& fam = b.i_face ? g.i_faces : g.j_faces;
        // Diffusive momentum flux into the wall: 2 nu ortho_ghost (u_P - u_wall) (the ghost
        // centroid is twice as far as the face).
        const double k = 2.0 * nu * fam.ortho[b.face];
        force = force + p(b.i, b.j) * b.area_out;
        force = force + k * Vec2{u(b.i, b.j) - b.velocity.x, v(b.i, b.j) - b.velocity.y};
    }
    return force;
}

}  // namespace veer
