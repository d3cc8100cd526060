#include "mesh/grid_metrics.hpp"

namespace veer {

GridMetrics compute_metrics(const StructuredGrid& grid) {
    GridMetrics m;
    m.ni = grid.ni();
    m.nj = grid.nj();
    const int ni = m.ni, nj = m.nj;
    m.volume.resize(static_cast<std::size_t>(ni) * nj);
    m.centroid.resize(m.volume.size());
    for (int j = 0; j < nj; ++j)
        for (int i = 0; i < ni; ++i) {
            const Vec2 a = grid.node(i, j), b = grid.node(i + 1, j), c = grid.node(i + 1, j + 1),
                       d = grid.node(i, j + 1);
            // Quad split into triangles abc and acd: area-weighted centroid.
            const double t1 = 0.5 * cross(b - a, c - a), t2 = 0.5 * cross(c - a, d - a);
            const double area = t1 + t2;
            const Vec2 g1 = (1.0 / 3.0) * (a + b + c), g2 = (1.0 / 3.0) * (a + c + d);
            m.volume[m.cell(i, j)] = area;
            m.centroid[m.cell(i, j)] = (1.0 / area) * (t1 * g1 + t2 * g2);
        }
    m.area_i.resize(static_cast<std::size_t>(ni + 1) * nj);
    m.face_center_i.resize(m.area_i.size());
    for (int j = 0; j < nj; ++j)
        for (int fi = 0; fi <= ni; ++fi) {
            const Vec2 a = grid.node(fi, j), b = grid.node(fi, j + 1);
            // Edge a->b runs towards +j; rotating clockwise points towards +i.
            m.area_i[m.face_i(fi, j)] = {b.y - a.y, -(b.x - a.x)};
            m.face_center_i[m.face_i(fi, j)] = 0.5 * (a + b);
        }
    m.area_j.resize(static_cast<std::size_t>(ni) * (nj + 1));
    m.face_center_j.resize(m.area_j.size());
    for (int fj = 0; fj <= nj; ++fj)
        for (int i = 0; i < ni; ++i) {
            const Vec2 a = grid.node(i, fj), b = grid.node(i + 1, fj);
            // Edge a->b runs towards +i; rotating counter-clockwise points towards +j.
            m.area_j[m.face_j(i, fj)] = rotate_ccw(b - a);
            m.face_center_j[m.face_j(i, fj)] = 0.5 * (a + b);
        }
    return m;
}

}  // namespace veer
