#include "solver/projection_stencil.hpp"

namespace veer {

PoissonStencil make_projection_stencil(const FaceGeometry& g, const Connectivity& c,
                                       const std::optional<CGridLayout>& layout,
                                       const std::vector<BoundaryFace>& faces,
                                       const std::vector<double>& gamma_i,
                                       const std::vector<double>& gamma_j) {
    PoissonStencil s;
    s.ni = g.ni;
    s.nj = g.nj;
    s.coef_i.resize(gamma_i.size());
    s.coef_j.resize(gamma_j.size());
    for (std::size_t k = 0; k < gamma_i.size(); ++k)
        s.coef_i[k] = g.i_faces.physical[k] ? 0.0 : gamma_i[k] * g.i_faces.ortho[k];
    for (std::size_t k = 0; k < gamma_j.size(); ++k)
        s.coef_j[k] = g.j_faces.physical[k] ? 0.0 : gamma_j[k] * g.j_faces.ortho[k];
    s.dirichlet_i.assign(gamma_i.size(), 0);
    s.dirichlet_j.assign(gamma_j.size(), 0);
    for (const BoundaryFace& b : faces) {
        if (conditions_for(b.role).pressure_increment != Condition::dirichlet) continue;
        auto& coef = b.i_face ? s.coef_i : s.coef_j;
        const auto& gamma = b.i_face ? gamma_i : gamma_j;
        const auto& ortho = b.i_face ? g.i_faces.ortho : g.j_faces.ortho;
        coef[b.face] = 2.0 * gamma[b.face] * ortho[b.face];
        (b.i_face ? s.dirichlet_i : s.dirichlet_j)[b.face] = 1;
    }
    s.periodic_i = c.periodic_i;
    s.periodic_j = c.periodic_j;
    if (!c.wake_cut_i.empty()) {
        VEER_VERIFY(layout.has_value(), "a grid with a wake cut needs its C-grid layout");
        s.wake_cut = layout;
    }
    return s;
}

}  // namespace veer
