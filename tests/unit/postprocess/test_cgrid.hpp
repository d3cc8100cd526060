#pragma once
/// Algebraic C-grids for the post-processing tests (until they can use the project's generator):
/// the wall line j = 0 is the wake cut plus the section outline, the far field a C of radius R
/// about the trailing edge, and every i line a straight ray from its wall node to its far-field
/// node with smooth stretching in j. Refinement by 2 keeps every coarse node (nested grids).
#include <cmath>
#include <numbers>
#include <vector>

#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"

namespace veer::test {

/// Smooth stretching on [0, 1] with w(0) = 0, w(1) = 1, clustered towards 0 for k > 0.
inline double stretch(double t, double k) { return std::expm1(k * t) / std::expm1(k); }

/// Shape of the test grid; `surface` runs from the trailing edge over the lower surface to the
/// leading edge and back over the upper surface, with the trailing edge first and last
/// (around + 1 points).
struct TestCGridShape {
    int wake = 16;
    int nj = 16;
    double radius = 6.0;        ///< far field distance from the trailing edge
    double wake_length = 6.0;   ///< trailing edge to outlet
    double wake_stretch = 2.5;  ///< clustering of wake nodes towards the trailing edge
    double normal_stretch = 3.0;
};

inline StructuredGrid make_test_cgrid(const std::vector<Vec2>& surface, const TestCGridShape& s) {
    const int around = static_cast<int>(surface.size()) - 1;
    const int ni = 2 * s.wake + around;
    const Vec2 te = surface.front();
    std::vector<Vec2> wall(static_cast<std::size_t>(ni + 1)), outer(wall.size());
    for (int i = 0; i <= ni; ++i) {
        const auto k = static_cast<std::size_t>(i);
        if (i <= s.wake || i >= s.wake + around) {
            const int from_te = i <= s.wake ? s.wake - i : i - s.wake - around;
            const double x = te.x + s.wake_length * stretch(static_cast<double>(from_te) / s.wake,
                                                            s.wake_stretch);
            wall[k] = {x, te.y};
            outer[k] = {x, te.y + (i <= s.wake ? -s.radius : s.radius)};
        } else {
            const int m = i - s.wake;
            const double phi = -0.5 * std::numbers::pi - std::numbers::pi * m / around;
            wall[k] = surface[static_cast<std::size_t>(m)];
            outer[k] = {te.x + s.radius * std::cos(phi), te.y + s.radius * std::sin(phi)};
        }
    }
    StructuredGrid grid(ni, s.nj);
    for (int j = 0; j <= s.nj; ++j) {
        const double t = stretch(static_cast<double>(j) / s.nj, s.normal_stretch);
        for (int i = 0; i <= ni; ++i) {
            const auto k = static_cast<std::size_t>(i);
            grid.node(i, j) = wall[k] + t * (outer[k] - wall[k]);
        }
    }
    grid.c_layout() = CGridLayout{s.wake, around};
    grid.segments() = {{Side::j_min, 0, s.wake, SegmentKind::wake_cut, "wake_cut_lower"},
                       {Side::j_min, s.wake, s.wake + around, SegmentKind::wall, "wall"},
                       {Side::j_min, s.wake + around, ni, SegmentKind::wake_cut, "wake_cut_upper"},
                       {Side::j_max, 0, ni, SegmentKind::far_field, "far_field"},
                       {Side::i_min, 0, s.nj, SegmentKind::outflow, "outflow_lower"},
                       {Side::i_max, 0, s.nj, SegmentKind::outflow, "outflow_upper"}};
    return grid;
}

/// Thin ellipse from (0, 0) to (1, 0), semi-thickness b; points clustered at both ends by the
/// angle parameter. around + 1 points, trailing edge first and last.
inline std::vector<Vec2> ellipse_surface(int around, double b) {
    std::vector<Vec2> pts;
    for (int m = 0; m <= around; ++m) {
        const double theta = -2.0 * std::numbers::pi * m / around;
        pts.push_back({0.5 + 0.5 * std::cos(theta), b * std::sin(theta)});
    }
    pts.back() = pts.front();
    return pts;
}

}  // namespace veer::test
