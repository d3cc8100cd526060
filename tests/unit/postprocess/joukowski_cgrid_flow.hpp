#pragma once
/// The Joukowski section's exact potential flow sampled on a test C-grid (normal stretching 5):
/// the set-up the contour, lift-route and Kutta tests share.
#include "analytic_flows.hpp"
#include "mesh/grid_metrics.hpp"
#include "test_cgrid.hpp"

namespace veer::test {

struct SampledFlow {
    StructuredGrid grid;
    GridMetrics metrics;
    FlowFields fields;
};

inline SampledFlow joukowski_on_cgrid(const Joukowski& section, int around, int wake, int nj) {
    TestCGridShape shape;
    shape.wake = wake;
    shape.nj = nj;
    shape.normal_stretch = 5.0;
    SampledFlow s{make_test_cgrid(section.surface(around), shape), {}, {}};
    s.metrics = compute_metrics(s.grid);
    s.fields = sample_potential_flow(s.metrics, [&](Vec2 p) { return section.velocity(p); });
    return s;
}

}  // namespace veer::test
