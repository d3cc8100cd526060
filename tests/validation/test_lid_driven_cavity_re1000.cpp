/// Lid-driven cavity at Re = 1000 on 128 x 128 against Ghia, Ghia & Shin 1982 (J. Comput. Phys.
/// 48(3), 387-411), Table I (u on the vertical centreline) and Table II (v on the horizontal
/// centreline), ../shared/reference/ghia1982_cavity.csv. In the validation suite: the steady
/// run takes minutes on two cores.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <fstream>
#include <iostream>
#include <sstream>
#include <string>
#include <vector>

#include "solver/flow_solver.hpp"

namespace veer {
namespace {

struct GhiaPoint {
    char table;
    double coord, re100, re1000;
};

std::vector<GhiaPoint> read_ghia() {
    std::ifstream in(std::string(VEER_REFERENCE_DIR) + "/ghia1982_cavity.csv");
    std::vector<GhiaPoint> pts;
    std::string line;
    while (std::getline(in, line)) {
        if (line.empty() || line[0] == '#' || line.rfind("table", 0) == 0) continue;
        std::replace(line.begin(), line.end(), ',', ' ');
        std::istringstream s(line);
        GhiaPoint p{};
        s >> p.table >> p.coord >> p.re100 >> p.re1000;
        pts.push_back(p);
    }
    return pts;
}

double along_line(const std::vector<double>& q, double wall_lo, double wall_hi, double x) {
    const int n = static_cast<int>(q.size());
    std::vector<double> xs{0.0}, ys{wall_lo};
    for (int k = 0; k < n; ++k) {
        xs.push_back((k + 0.5) / n);
        ys.push_back(q[static_cast<std::size_t>(k)]);
    }
    xs.push_back(1.0);
    ys.push_back(wall_hi);
    for (std::size_t k = 0; k + 1 < xs.size(); ++k)
        if (x <= xs[k + 1]) {
            const double w = (x - xs[k]) / (xs[k + 1] - xs[k]);
            return (1.0 - w) * ys[k] + w * ys[k + 1];
        }
    return wall_hi;
}

TEST(LidDrivenCavityValidation, Re1000MatchesGhia1982Table1And2) {
    const int n = 128;
    StructuredGrid grid(n, n);
    for (int j = 0; j <= n; ++j)
        for (int i = 0; i <= n; ++i)
            grid.node(i, j) = {static_cast<double>(i) / n, static_cast<double>(j) / n};
    grid.segments() = {{Side::i_min, 0, n, SegmentKind::wall, "left"},
                       {Side::i_max, 0, n, SegmentKind::wall, "right"},
                       {Side::j_min, 0, n, SegmentKind::wall, "bottom"},
                       {Side::j_max, 0, n, SegmentKind::wall, "lid"}};
    SolverSettings s;
    s.mode = TimeMode::steady;
    s.pseudo_cfl = 10.0;
    s.velocity_overrides = {moving_wall("lid", {1.0, 0.0})};
    FlowSolver solver(grid, {1000.0, 0.0}, s);
    FlowFields zero;
    zero.u.assign(static_cast<std::size_t>(n * n), 0.0);
    zero.v = zero.pressure = zero.u;
    solver.initialize(zero);
    StepReport r;
    for (long k = 0; k < 40000; ++k) {
        r = solver.advance_pseudo_time();
        if (!r.finite || std::max(r.residual_u, r.residual_v) < 1e-7) break;
    }
    ASSERT_TRUE(r.finite);
    EXPECT_LT(std::max(r.residual_u, r.residual_v), 1e-7) << "steps " << r.step;
    const FlowFields f = solver.fields();
    std::vector<double> u_mid(n), v_mid(n);
    for (int k = 0; k < n; ++k) {
        const auto at = [n](int i, int j) { return static_cast<std::size_t>(j * n + i); };
        u_mid[static_cast<std::size_t>(k)] = 0.5 * (f.u[at(n / 2 - 1, k)] + f.u[at(n / 2, k)]);
        v_mid[static_cast<std::size_t>(k)] = 0.5 * (f.v[at(k, n / 2 - 1)] + f.v[at(k, n / 2)]);
    }
    double worst = 0.0;
    for (const GhiaPoint& p : read_ghia()) {
        const double ours = p.table == 'u' ? along_line(u_mid, 0.0, 1.0, p.coord)
                                           : along_line(v_mid, 0.0, 0.0, p.coord);
        worst = std::max(worst, std::abs(ours - p.re1000));
    }
    std::cout << "cavity Re 1000, 128x128 (" << r.step
              << " steps): largest deviation from Ghia et al. 1982 " << worst << "\n";
    // 0.03: the bound at Re 1000 (thinner wall layers, Ghia's own 129x129 error).
    EXPECT_LT(worst, 0.03);
}

}  // namespace
}  // namespace veer
