#include "solver/connectivity.hpp"

namespace veer {

namespace {

bool side_is_periodic(const StructuredGrid& grid, Side side, int faces) {
    int covered = 0;
    for (const BoundarySegment& s : grid.segments())
        if (s.side == side && s.kind == SegmentKind::periodic) covered += s.end - s.begin;
    VEER_VERIFY(covered == 0 || covered == faces,
                "a periodic side must be periodic along its length");
    return covered == faces;
}

}  // namespace

Connectivity make_connectivity(const StructuredGrid& grid, const GridMetrics& metrics) {
    Connectivity c;
    c.ni = grid.ni();
    c.nj = grid.nj();
    for (const BoundarySegment& s : grid.segments()) {
        if (s.kind != SegmentKind::wake_cut) continue;
        VEER_VERIFY(s.side == Side::j_min, "a wake cut lies on the j = 0 side");
        for (int i = s.begin; i < s.end; ++i) c.wake_cut_i.push_back(i);
    }
    c.periodic_i = side_is_periodic(grid, Side::i_min, c.nj);
    VEER_VERIFY(c.periodic_i == side_is_periodic(grid, Side::i_max, c.nj),
                "periodic i sides come in pairs");
    c.periodic_j = side_is_periodic(grid, Side::j_min, c.ni);
    VEER_VERIFY(c.periodic_j == side_is_periodic(grid, Side::j_max, c.ni),
                "periodic j sides come in pairs");
    if (c.periodic_i)
        c.period_i = metrics.face_center_i[metrics.face_i(c.ni, 0)] -
                     metrics.face_center_i[metrics.face_i(0, 0)];
    if (c.periodic_j)
        c.period_j = metrics.face_center_j[metrics.face_j(0, c.nj)] -
                     metrics.face_center_j[metrics.face_j(0, 0)];
    return c;
}

void fill_connected_ghosts(const Connectivity& c, CellView f) {
    const int ni = c.ni, nj = c.nj;
    for (int i : c.wake_cut_i)
        for (int g = 0; g < ghost_width; ++g) f(i, -1 - g) = f(ni - 1 - i, g);
    if (c.periodic_i)
        for (int j = 0; j < nj; ++j)
            for (int g = 0; g < ghost_width; ++g) {
                f(-1 - g, j) = f(ni - 1 - g, j);
                f(ni + g, j) = f(g, j);
            }
    if (c.periodic_j)
        for (int i = 0; i < ni; ++i)
            for (int g = 0; g < ghost_width; ++g) {
                f(i, -1 - g) = f(i, nj - 1 - g);
                f(i, nj + g) = f(i, g);
            }
}

}  // namespace veer
