#include "solver/boundary_faces.hpp"

#include <sstream>

namespace veer {

VelocityOverride moving_wall(std::string segment, Vec2 wall_velocity) {
    return {std::move(segment), [wall_velocity](Vec2, double) { return wall_velocity; }};
}

VelocityOverride spinning_wall(std::string segment, Vec2 centre,
                               std::function<double(double t)> surface_speed) {
    return {std::move(segment), [centre, speed = std::move(surface_speed)](Vec2 x, double t) {
                const Vec2 r = x - centre;
                const double length = norm(r);
                return length > 0.0 ? (speed(t) / length) * rotate_ccw(r) : Vec2{};
            }};
}

namespace {

int side_length(const StructuredGrid& g, Side s) {
    return (s == Side::i_min || s == Side::i_max) ? g.nj() : g.ni();
}

int find_override(const BoundarySegment& s, const std::vector<VelocityOverride>& overrides) {
    for (std::size_t k = 0; k < overrides.size(); ++k)
        if (overrides[k].segment == s.name) return static_cast<int>(k);
    return -1;
}

/// The face at position `n` along side `s`, with its interior cell and ghost.
BoundaryFace face_on_side(const StructuredGrid& g, const GridMetrics& m, Side s, int n) {
    BoundaryFace f;
    const int ni = g.ni(), nj = g.nj();
    const bool on_i = s == Side::i_min || s == Side::i_max;
    f.i_face = on_i;
    f.i = on_i ? (s == Side::i_min ? 0 : ni - 1) : n;
    f.j = on_i ? n : (s == Side::j_min ? 0 : nj - 1);
    f.gi = on_i ? (s == Side::i_min ? -1 : ni) : n;
    f.gj = on_i ? n : (s == Side::j_min ? -1 : nj);
    f.outward = (s == Side::i_min || s == Side::j_min) ? -1.0 : 1.0;
    f.face = on_i ? m.face_i(s == Side::i_min ? 0 : ni, n) : m.face_j(n, s == Side::j_min ? 0 : nj);
    const Vec2 a = f.i_face ? m.area_i[f.face] : m.area_j[f.face];
    f.area_out = f.outward * a;
    f.center = f.i_face ? m.face_center_i[f.face] : m.face_center_j[f.face];
    return f;
}

void check_coverage(const StructuredGrid& g, const std::vector<int>& count, Side s) {
    for (std::size_t n = 0; n < count.size(); ++n)
        if (count[n] != 1) {
            std::ostringstream msg;
            msg << "boundary face " << n << " of side " << static_cast<int>(s) << " is covered by "
                << count[n] << " segments (" << g.segments().size() << " segments in the grid)";
            VEER_VERIFY(false, msg.str());
        }
}

}  // namespace

std::vector<BoundaryFace> collect_boundary_faces(const StructuredGrid& grid,
                                                 const GridMetrics& metrics, Vec2 free_stream,
                                                 const std::vector<VelocityOverride>& overrides) {
    for (const VelocityOverride& o : overrides) {
        bool found = false;
        std::ostringstream names;
        for (const BoundarySegment& s : grid.segments()) {
            found = found || s.name == o.segment;
            names << (names.tellp() > 0 ? ", " : "") << s.name;
        }
        if (!found)
            throw InputError("velocity override names segment '" + o.segment +
                             "', which the grid does not have (segments: " + names.str() + ")");
    }
    std::vector<BoundaryFace> faces;
    for (Side side : {Side::i_min, Side::i_max, Side::j_min, Side::j_max}) {
        std::vector<int> count(static_cast<std::size_t>(side_length(grid, side)), 0);
        for (const BoundarySegment& s : grid.segments()) {
            if (s.side != side) continue;
            VEER_VERIFY(s.begin >= 0 && s.end <= side_length(grid, side) && s.begin < s.end,
                        "segment '" + s.name + "' runs outside its side");
            const int ov = find_override(s, overrides);
            for (int n = s.begin; n < s.end; ++n) {
                ++count[static_cast<std::size_t>(n)];
                BoundaryFace f = face_on_side(grid, metrics, side, n);
                const auto role = resolve_role(s.kind, dot(free_stream, f.area_out) < 0.0, ov >= 0);
                if (!role) continue;
                f.role = *role;
                f.override_index = ov;
                faces.push_back(f);
            }
        }
        check_coverage(grid, count, side);
    }
    return faces;
}

}  // namespace veer
