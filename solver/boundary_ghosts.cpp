#include "solver/boundary_ghosts.hpp"

namespace veer {

namespace {

/// Sets both ghost layers behind face f to `value`.
void set_ghosts(const BoundaryFace& f, CellView q, double value) {
    const int di = f.gi - f.i, dj = f.gj - f.j;
    q(f.gi, f.gj) = value;
    q(f.gi + di, f.gj + dj) = value;
}

}  // namespace

void fill_velocity_ghosts(const std::vector<BoundaryFace>& faces, const Connectivity& c, CellView u,
                          CellView v) {
    for (const BoundaryFace& f : faces) {
        if (conditions_for(f.role).velocity == Condition::dirichlet) {
            set_ghosts(f, u, 2.0 * f.velocity.x - u(f.i, f.j));
            set_ghosts(f, v, 2.0 * f.velocity.y - v(f.i, f.j));
        } else {
            set_ghosts(f, u, u(f.i, f.j));
            set_ghosts(f, v, v(f.i, f.j));
        }
    }
    fill_connected_ghosts(c, u);
    fill_connected_ghosts(c, v);
}

void fill_pressure_ghosts(const std::vector<BoundaryFace>& faces, const Connectivity& c,
                          CellView p) {
    for (const BoundaryFace& f : faces) {
        const bool dirichlet = conditions_for(f.role).pressure == Condition::dirichlet;
        set_ghosts(f, p, dirichlet ? 2.0 * f.pressure - p(f.i, f.j) : p(f.i, f.j));
    }
    fill_connected_ghosts(c, p);
}

void fill_increment_ghosts(const std::vector<BoundaryFace>& faces, const Connectivity& c,
                           CellView phi) {
    for (const BoundaryFace& f : faces) {
        const bool dirichlet = conditions_for(f.role).pressure_increment == Condition::dirichlet;
        set_ghosts(f, phi, dirichlet ? -phi(f.i, f.j) : phi(f.i, f.j));
    }
    fill_connected_ghosts(c, phi);
}

std::vector<ScalarFaceCondition> scalar_face_conditions(const std::vector<BoundaryFace>& faces,
                                                        const ScalarColumn& column) {
    std::vector<ScalarFaceCondition> out(faces.size());
    for (std::size_t k = 0; k < faces.size(); ++k) {
        const ScalarCondition& c = column.on(faces[k].role);
        out[k].dirichlet = c.kind == Condition::dirichlet;
        out[k].value = c.value_at ? c.value_at(faces[k].center) : c.value;
    }
    return out;
}

void fill_scalar_ghosts(const std::vector<BoundaryFace>& faces,
                        const std::vector<ScalarFaceCondition>& conditions, const Connectivity& c,
                        CellView q) {
    for (std::size_t k = 0; k < faces.size(); ++k) {
        const BoundaryFace& f = faces[k];
        const double qp = q(f.i, f.j);
        set_ghosts(f, q, conditions[k].dirichlet ? 2.0 * conditions[k].value - qp : qp);
    }
    fill_connected_ghosts(c, q);
}

void fill_copy_ghosts(const std::vector<BoundaryFace>& faces, const Connectivity& c, CellView q) {
    for (const BoundaryFace& f : faces) set_ghosts(f, q, q(f.i, f.j));
    fill_connected_ghosts(c, q);
}

}  // namespace veer
