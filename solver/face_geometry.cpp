#include "solver/face_geometry.hpp"

#include <algorithm>

namespace veer {

namespace {

/// Centroid of cell (i, j) seen from inside the block, ghosts of connected sides included
/// (periodic ghosts are shifted by the period, wake-cut ghosts are the mirrored cells).
Vec2 neighbour_centroid(const GridMetrics& m, const Connectivity& c, int i, int j) {
    Vec2 shift{};
    if (i < 0) {
        i += c.ni;
        shift = shift - c.period_i;
    } else if (i >= c.ni) {
        i -= c.ni;
        shift = shift + c.period_i;
    }
    if (j < 0 && c.periodic_j) {
        j += c.nj;
        shift = shift - c.period_j;
    } else if (j < 0) {
        i = c.ni - 1 - i;  // wake cut
        j = 0;
    } else if (j >= c.nj) {
        j -= c.nj;
        shift = shift + c.period_j;
    }
    return m.centroid[m.cell(i, j)] + shift;
}

/// Weight of the -side cell at a face between centroids x_r - d and x_r, face centre x_f.
double left_weight(Vec2 x_r, Vec2 d, Vec2 x_f) {
    const double w = dot(x_r - x_f, d) / dot(d, d);
    return std::clamp(w, 0.1, 0.9);  // guards degenerate corner cells
}

void finish_family(FaceFamily& f) {
    const std::size_t n = f.area.size();
    f.ortho.resize(n);
    f.skew.resize(n);
    for (std::size_t k = 0; k < n; ++k) {
        const Vec2 a = f.area[k], d = f.delta[k];
        VEER_VERIFY(dot(a, d) > 0.0, "a face whose centroids lie on the wrong side of it");
        f.ortho[k] = dot(a, a) / dot(a, d);
        f.skew[k] = a - f.ortho[k] * d;
    }
}

}  // namespace

FaceGeometry make_face_geometry(const GridMetrics& m, const Connectivity& c,
                                const std::vector<BoundaryFace>& faces) {
    FaceGeometry g;
    g.ni = m.ni;
    g.nj = m.nj;
    g.volume = m.volume;
    g.centroid = m.centroid;
    g.i_faces.center = m.face_center_i;
    g.j_faces.center = m.face_center_j;
    const int ni = m.ni, nj = m.nj;
    FaceFamily& fi_ = g.i_faces;
    fi_.area = m.area_i;
    fi_.delta.resize(fi_.area.size());
    fi_.physical.assign(fi_.area.size(), 0);
    fi_.velocity_dirichlet.assign(fi_.area.size(), 0);
    FaceFamily& fj_ = g.j_faces;
    fj_.area = m.area_j;
    fj_.delta.resize(fj_.area.size());
    fj_.physical.assign(fj_.area.size(), 0);
    fj_.velocity_dirichlet.assign(fj_.area.size(), 0);
    // Interior and connected faces: centroid to centroid (ghost centroids where connected).
    for (int j = 0; j < nj; ++j)
        for (int f = 0; f <= ni; ++f)
            if ((f > 0 && f < ni) || c.periodic_i)
                fi_.delta[g.face_i(f, j)] =
                    neighbour_centroid(m, c, f, j) - neighbour_centroid(m, c, f - 1, j);
    for (int f = 0; f <= nj; ++f)
        for (int i = 0; i < ni; ++i)
            if ((f > 0 && f < nj) || c.periodic_j)
                fj_.delta[g.face_j(i, f)] =
                    neighbour_centroid(m, c, i, f) - neighbour_centroid(m, c, i, f - 1);
    for (int i : c.wake_cut_i)
        fj_.delta[g.face_j(i, 0)] = m.centroid[m.cell(i, 0)] - m.centroid[m.cell(ni - 1 - i, 0)];
    // Interpolation weights from the +side centroid (a ghost's where connected).
    fi_.weight.assign(fi_.area.size(), 0.5);
    fj_.weight.assign(fj_.area.size(), 0.5);
    for (int j = 0; j < nj; ++j)
        for (int f = 0; f <= ni; ++f)
            if ((f > 0 && f < ni) || c.periodic_i) {
                const std::size_t k = g.face_i(f, j);
                fi_.weight[k] =
                    left_weight(neighbour_centroid(m, c, f, j), fi_.delta[k], m.face_center_i[k]);
            }
    for (int f = 0; f <= nj; ++f)
        for (int i = 0; i < ni; ++i)
            if ((f > 0 && f < nj) || c.periodic_j) {
                const std::size_t k = g.face_j(i, f);
                fj_.weight[k] =
                    left_weight(neighbour_centroid(m, c, i, f), fj_.delta[k], m.face_center_j[k]);
            }
    for (int i : c.wake_cut_i) {
        const std::size_t k = g.face_j(i, 0);
        fj_.weight[k] = left_weight(m.centroid[m.cell(i, 0)], fj_.delta[k], m.face_center_j[k]);
    }
    // Physical faces: the ghost centroid mirrors the interior one through the face midpoint.
    for (const BoundaryFace& b : faces) {
        FaceFamily& fam = b.i_face ? fi_ : fj_;
        const Vec2 to_face = b.center - m.centroid[m.cell(b.i, b.j)];
        fam.delta[b.face] = (2.0 * b.outward) * to_face;
        fam.physical[b.face] = 1;
        fam.velocity_dirichlet[b.face] =
            conditions_for(b.role).velocity == Condition::dirichlet ? 1 : 0;
    }
    finish_family(fi_);
    finish_family(fj_);
    return g;
}

}  // namespace veer
