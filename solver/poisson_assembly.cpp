#include "solver/poisson_assembly.hpp"

#include <string>

#include "mesh/errors.hpp"

namespace veer {
namespace {

bool side_is_periodic(const StructuredGrid& grid, Side a, Side b) {
    bool found_a = false, found_b = false;
    for (const BoundarySegment& s : grid.segments()) {
        if (s.kind != SegmentKind::periodic) continue;
        found_a = found_a || s.side == a;
        found_b = found_b || s.side == b;
    }
    VEER_VERIFY(found_a == found_b, "a periodic side needs a periodic partner on the other side");
    return found_a;
}

/// |S|^2 / (S . d): the orthogonal-part coefficient of one face.
double orthogonal_coefficient(Vec2 area, Vec2 d) {
    const double s_dot_d = dot(area, d);
    VEER_VERIFY(s_dot_d > 0.0, "face area and centroid distance point opposite ways (folded grid)");
    return dot(area, area) / s_dot_d;
}

struct Inputs {
    const GridMetrics& m;
    const std::vector<double>* weight_i;
    const std::vector<double>* weight_j;
    double wi(std::size_t f) const { return weight_i ? (*weight_i)[f] : 1.0; }
    double wj(std::size_t f) const { return weight_j ? (*weight_j)[f] : 1.0; }
};

void assemble_i_faces(const Inputs& in, bool periodic, PoissonStencil& s) {
    const GridMetrics& m = in.m;
    const int ni = m.ni;
    for (int j = 0; j < m.nj; ++j) {
        for (int fi = 1; fi < ni; ++fi) {
            const std::size_t f = m.face_i(fi, j);
            const Vec2 d = m.centroid[m.cell(fi, j)] - m.centroid[m.cell(fi - 1, j)];
            s.coef_i[f] = in.wi(f) * orthogonal_coefficient(m.area_i[f], d);
        }
        const std::size_t f0 = m.face_i(0, j), f1 = m.face_i(ni, j);
        const Vec2 c_first = m.centroid[m.cell(0, j)], c_last = m.centroid[m.cell(ni - 1, j)];
        if (periodic) {
            const Vec2 period = m.face_center_i[f1] - m.face_center_i[f0];
            const double w = 0.5 * (in.wi(f0) + in.wi(f1));
            s.coef_i[f0] = w * orthogonal_coefficient(m.area_i[f0], c_first - (c_last - period));
            s.coef_i[f1] = s.coef_i[f0];
        } else {
            s.coef_i[f0] =
                in.wi(f0) * orthogonal_coefficient(m.area_i[f0], c_first - m.face_center_i[f0]);
            s.coef_i[f1] =
                in.wi(f1) * orthogonal_coefficient(m.area_i[f1], m.face_center_i[f1] - c_last);
        }
    }
}

void assemble_j_faces(const Inputs& in, bool periodic, const std::optional<CGridLayout>& cut,
                      PoissonStencil& s) {
    const GridMetrics& m = in.m;
    const int ni = m.ni, nj = m.nj;
    for (int fj = 1; fj < nj; ++fj)
        for (int i = 0; i < ni; ++i) {
            const std::size_t f = m.face_j(i, fj);
            const Vec2 d = m.centroid[m.cell(i, fj)] - m.centroid[m.cell(i, fj - 1)];
            s.coef_j[f] = in.wj(f) * orthogonal_coefficient(m.area_j[f], d);
        }
    for (int i = 0; i < ni; ++i) {
        const std::size_t f0 = m.face_j(i, 0), f1 = m.face_j(i, nj);
        const Vec2 c_first = m.centroid[m.cell(i, 0)], c_last = m.centroid[m.cell(i, nj - 1)];
        const bool wake = cut && (i < cut->wake || i >= ni - cut->wake);
        if (wake) {
            const int mirror = ni - 1 - i;
            const std::size_t fm = m.face_j(mirror, 0);
            const double w = 0.5 * (in.wj(f0) + in.wj(fm));
            const Vec2 d = c_first - m.centroid[m.cell(mirror, 0)];
            // Both faces get the value computed from the lower-index side: bitwise symmetric.
            if (i < mirror) {
                s.coef_j[f0] = w * orthogonal_coefficient(m.area_j[f0], d);
                s.coef_j[fm] = s.coef_j[f0];
            }
        } else if (periodic) {
            const Vec2 period = m.face_center_j[f1] - m.face_center_j[f0];
            const double w = 0.5 * (in.wj(f0) + in.wj(f1));
            s.coef_j[f0] = w * orthogonal_coefficient(m.area_j[f0], c_first - (c_last - period));
        } else {
            s.coef_j[f0] =
                in.wj(f0) * orthogonal_coefficient(m.area_j[f0], c_first - m.face_center_j[f0]);
        }
        if (periodic)
            s.coef_j[f1] = s.coef_j[f0];
        else
            s.coef_j[f1] =
                in.wj(f1) * orthogonal_coefficient(m.area_j[f1], m.face_center_j[f1] - c_last);
    }
}

std::vector<std::uint8_t> checked_flags(const std::vector<std::uint8_t>& flags, std::size_t n,
                                        const char* what) {
    if (flags.empty()) return std::vector<std::uint8_t>(n, 0);
    VEER_VERIFY(flags.size() == n, std::string(what) + " has the wrong size for this grid");
    return flags;
}

}  // namespace

PoissonStencil assemble_laplacian(const StructuredGrid& grid, const GridMetrics& metrics,
                                  const std::vector<std::uint8_t>& dirichlet_i,
                                  const std::vector<std::uint8_t>& dirichlet_j,
                                  const std::vector<double>* face_weight_i,
                                  const std::vector<double>* face_weight_j) {
    const int ni = grid.ni(), nj = grid.nj();
    VEER_VERIFY(metrics.ni == ni && metrics.nj == nj, "metrics do not belong to this grid");
    const auto n_i = static_cast<std::size_t>(ni + 1) * static_cast<std::size_t>(nj);
    const auto n_j = static_cast<std::size_t>(ni) * static_cast<std::size_t>(nj + 1);
    VEER_VERIFY(!face_weight_i || face_weight_i->size() == n_i, "face_weight_i size");
    VEER_VERIFY(!face_weight_j || face_weight_j->size() == n_j, "face_weight_j size");
    PoissonStencil s;
    s.ni = ni;
    s.nj = nj;
    s.coef_i.assign(n_i, 0.0);
    s.coef_j.assign(n_j, 0.0);
    s.dirichlet_i = checked_flags(dirichlet_i, n_i, "dirichlet_i");
    s.dirichlet_j = checked_flags(dirichlet_j, n_j, "dirichlet_j");
    s.periodic_i = side_is_periodic(grid, Side::i_min, Side::i_max);
    s.periodic_j = side_is_periodic(grid, Side::j_min, Side::j_max);
    s.wake_cut = grid.c_layout();
    const Inputs in{metrics, face_weight_i, face_weight_j};
    assemble_i_faces(in, s.periodic_i, s);
    assemble_j_faces(in, s.periodic_j, s.wake_cut, s);
    return s;
}

}  // namespace veer
