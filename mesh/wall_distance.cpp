#include "mesh/wall_distance.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <utility>

#include "mesh/errors.hpp"

namespace veer {
namespace {

struct Segment {
    Vec2 a, b;
};

/// A run of consecutive wall faces and the box around them.
struct Run {
    std::size_t begin = 0, end = 0;
    Vec2 lo, hi;
};

std::vector<Segment> wall_segments(const StructuredGrid& grid) {
    std::vector<Segment> segs;
    for (const BoundarySegment& s : grid.segments()) {
        if (s.kind != SegmentKind::wall) continue;
        VEER_VERIFY(s.side == Side::j_min, "wall distance expects walls on the j_min side");
        for (int i = s.begin; i < s.end; ++i)
            segs.push_back({grid.node(i, 0), grid.node(i + 1, 0)});
    }
    if (segs.empty()) throw InputError("mesh: wall distance needs a grid with a wall segment");
    return segs;
}

std::vector<Run> group_runs(const std::vector<Segment>& segs, std::size_t run_length) {
    std::vector<Run> runs;
    for (std::size_t b = 0; b < segs.size(); b += run_length) {
        Run r{b, std::min(segs.size(), b + run_length), segs[b].a, segs[b].a};
        for (std::size_t k = r.begin; k < r.end; ++k)
            for (Vec2 p : {segs[k].a, segs[k].b}) {
                r.lo = {std::min(r.lo.x, p.x), std::min(r.lo.y, p.y)};
                r.hi = {std::max(r.hi.x, p.x), std::max(r.hi.y, p.y)};
            }
        runs.push_back(r);
    }
    return runs;
}

double box_distance(Vec2 p, const Run& r) {
    const double dx = std::max({r.lo.x - p.x, 0.0, p.x - r.hi.x});
    const double dy = std::max({r.lo.y - p.y, 0.0, p.y - r.hi.y});
    return std::hypot(dx, dy);
}

/// Opens the runs nearest box first and stops at the first box farther than the best distance.
double distance_to_runs(Vec2 p, const std::vector<Segment>& segs, const std::vector<Run>& runs,
                        std::vector<std::pair<double, std::size_t>>& order) {
    order.clear();
    for (std::size_t r = 0; r < runs.size(); ++r) order.emplace_back(box_distance(p, runs[r]), r);
    std::sort(order.begin(), order.end());
    double best = std::numeric_limits<double>::infinity();
    for (const auto& [bound, r] : order) {
        if (bound >= best) break;
        for (std::size_t k = runs[r].begin; k < runs[r].end; ++k)
            best = std::min(best, point_segment_distance(p, segs[k].a, segs[k].b));
    }
    return best;
}

}  // namespace

std::vector<double> wall_distance(const StructuredGrid& grid, const GridMetrics& metrics) {
    const std::vector<Segment> segs = wall_segments(grid);
    // Runs of about sqrt(n) faces balance the box tests against the segment tests.
    const auto run_length =
        static_cast<std::size_t>(std::max(4.0, std::sqrt(static_cast<double>(segs.size()))));
    const std::vector<Run> runs = group_runs(segs, run_length);
    std::vector<double> distance(metrics.centroid.size());
#pragma omp parallel for schedule(static)
    for (int j = 0; j < metrics.nj; ++j) {
        std::vector<std::pair<double, std::size_t>> order;
        order.reserve(runs.size());
        for (int i = 0; i < metrics.ni; ++i) {
            const std::size_t c = metrics.cell(i, j);
            distance[c] = distance_to_runs(metrics.centroid[c], segs, runs, order);
        }
    }
    return distance;
}

}  // namespace veer
