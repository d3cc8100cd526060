#include "postprocess/vorticity.hpp"

#include <algorithm>
#include <array>

namespace veer {

namespace {

enum class FaceRule { own_value, no_slip, mirror_cut, periodic };

/// The rule of every boundary face on one side (face index along that side).
std::vector<FaceRule> side_rules(const StructuredGrid& grid, Side side) {
    const bool along_i = side == Side::j_min || side == Side::j_max;
    std::vector<FaceRule> rules(static_cast<std::size_t>(along_i ? grid.ni() : grid.nj()),
                                FaceRule::own_value);
    const auto set = [&rules](int begin, int end, FaceRule r) {
        for (int k = std::max(begin, 0); k < std::min(end, static_cast<int>(rules.size())); ++k)
            rules[static_cast<std::size_t>(k)] = r;
    };
    if (grid.segments().empty() && grid.c_layout() && side == Side::j_min) {
        const CGridLayout c = *grid.c_layout();
        set(0, grid.ni(), FaceRule::mirror_cut);
        set(c.wake, c.wake + c.around, FaceRule::no_slip);
    }
    for (const BoundarySegment& s : grid.segments()) {
        if (s.side != side) continue;
        switch (s.kind) {
            case SegmentKind::wall:
                set(s.begin, s.end, FaceRule::no_slip);
                break;
            case SegmentKind::wake_cut:
                set(s.begin, s.end, FaceRule::mirror_cut);
                break;
            case SegmentKind::periodic:
                set(s.begin, s.end, FaceRule::periodic);
                break;
            case SegmentKind::far_field:
            case SegmentKind::outflow:
                set(s.begin, s.end, FaceRule::own_value);
                break;
        }
    }
    return rules;
}

struct CellRef {
    int i = 0;
    int j = 0;
};

// Linear interpolation along the line joining the two centroids, at the face centre's projection.
Vec2 interpolate(const GridMetrics& m, const FlowFields& f, CellRef a, CellRef b, Vec2 face) {
    const std::size_t ca = m.cell(a.i, a.j), cb = m.cell(b.i, b.j);
    const Vec2 d = m.centroid[cb] - m.centroid[ca];
    const double t = std::clamp(dot(face - m.centroid[ca], d) / dot(d, d), 0.0, 1.0);
    return {(1.0 - t) * f.u[ca] + t * f.u[cb], (1.0 - t) * f.v[ca] + t * f.v[cb]};
}

// Velocity on a boundary face of `inside` whose partner across the boundary (if any) is `across`.
Vec2 boundary_value(const GridMetrics& m, const FlowFields& f, FaceRule rule, CellRef inside,
                    CellRef across, Vec2 face) {
    switch (rule) {
        case FaceRule::no_slip:
            return {0.0, 0.0};
        case FaceRule::mirror_cut:
        case FaceRule::periodic:
            return interpolate(m, f, inside, across, face);
        case FaceRule::own_value:
            break;
    }
    const std::size_t c = m.cell(inside.i, inside.j);
    return {f.u[c], f.v[c]};
}

// Adds the face's (S x u) to the cell behind it and subtracts it from the cell in front.
void add_face(std::vector<double>& circulation, std::size_t behind, std::size_t front,
              bool has_behind, bool has_front, Vec2 area, Vec2 vel) {
    const double flux = area.x * vel.y - area.y * vel.x;
    if (has_behind) circulation[behind] += flux;
    if (has_front) circulation[front] -= flux;
}

}  // namespace

std::vector<double> compute_vorticity(const StructuredGrid& grid, const GridMetrics& m,
                                      const FlowFields& f) {
    const int ni = m.ni, nj = m.nj;
    VEER_VERIFY(
        f.ni == ni && f.nj == nj && f.u.size() == m.volume.size() && f.v.size() == m.volume.size(),
        "flow fields and metrics differ in size");
    const std::array<std::vector<FaceRule>, 4> rules{
        side_rules(grid, Side::i_min), side_rules(grid, Side::i_max), side_rules(grid, Side::j_min),
        side_rules(grid, Side::j_max)};
    std::vector<double> circulation(m.volume.size(), 0.0);
    for (int j = 0; j < nj; ++j)
        for (int fi = 0; fi <= ni; ++fi) {
            const Vec2 c = m.face_center_i[m.face_i(fi, j)];
            Vec2 vel;
            if (fi == 0)
                vel = boundary_value(m, f, rules[0][static_cast<std::size_t>(j)], {0, j},
                                     {ni - 1, j}, c);
            else if (fi == ni)
                vel = boundary_value(m, f, rules[1][static_cast<std::size_t>(j)], {ni - 1, j},
                                     {0, j}, c);
            else
                vel = interpolate(m, f, {fi - 1, j}, {fi, j}, c);
            add_face(circulation, m.cell(std::max(fi - 1, 0), j), m.cell(std::min(fi, ni - 1), j),
                     fi > 0, fi < ni, m.area_i[m.face_i(fi, j)], vel);
        }
    for (int fj = 0; fj <= nj; ++fj)
        for (int i = 0; i < ni; ++i) {
            const Vec2 c = m.face_center_j[m.face_j(i, fj)];
            Vec2 vel;
            if (fj == 0)
                vel = boundary_value(m, f, rules[2][static_cast<std::size_t>(i)], {i, 0},
                                     rules[2][static_cast<std::size_t>(i)] == FaceRule::periodic
                                         ? CellRef{i, nj - 1}
                                         : CellRef{ni - 1 - i, 0},
                                     c);
            else if (fj == nj)
                vel = boundary_value(m, f, rules[3][static_cast<std::size_t>(i)], {i, nj - 1},
                                     {i, 0}, c);
            else
                vel = interpolate(m, f, {i, fj - 1}, {i, fj}, c);
            add_face(circulation, m.cell(i, std::max(fj - 1, 0)), m.cell(i, std::min(fj, nj - 1)),
                     fj > 0, fj < nj, m.area_j[m.face_j(i, fj)], vel);
        }
    for (std::size_t c = 0; c < circulation.size(); ++c) circulation[c] /= m.volume[c];
    return circulation;
}

}  // namespace veer
