/// Spalart-Allmaras validation: the zero-pressure-gradient flat plate at Re = 5e6 per unit length
/// (the NASA Turbulence Modeling Resource case "2D Zero Pressure Gradient Flat Plate", SA
/// results; values in tests/reference/tmr_flat_plate_sa.csv), with a three-grid convergence
/// study by the grid convergence index (Celik et al. 2008, J. Fluids Eng. 130, 078001).
///
/// Our set-up: plate from x = 0 to 2, domain height 1; upstream of the plate (x from -0.33 to 0)
/// the lower side carries the free stream (u = 1, v = 0, nu_tilde = 3 nu) in place of the
/// resource's symmetry plane; inflow on the left, outflow on the right, the top a far field.
/// The resource's case is at M = 0.2 and warns that an incompressible code will be close to,
/// not exactly on, its result: the 2% band of the issue is kept as it is.
///
/// Grids are modest for CI (finest 170 x 113 cells, first cell 3.5e-6, y+ ~ 0.3): the resource's
/// own 137 x 97-node grid is already within 0.3% of its finest (gci.md worked check).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <iostream>

#include "app/convergence.hpp"
#include "mesh/grid_metrics.hpp"
#include "solver/flow_solver.hpp"
#include "solver/spalart_allmaras_model.hpp"
#include "test_sa_gci.hpp"

namespace veer {
namespace {

constexpr double reynolds = 5e6;
// NASA TMR flat plate, SA, finest grid 545 x 385, Cf at x = 0.970084071: 0.0027056 and 0.0027054
// from two codes [P] (tmr_naca0012_sa.md).
constexpr double tmr_station = 0.970084071;
constexpr double tmr_cf = 0.0027056;

/// Node coordinates of a plate grid: `upstream` + `on_plate` cells along x, `normal` across.
struct PlateNodes {
    std::vector<double> x, y;
    int upstream = 0;  ///< cells ahead of the leading edge
};

PlateNodes plate_nodes(int upstream, int on_plate, int normal, double first_cell) {
    PlateNodes n;
    n.upstream = upstream;
    const double beta = 4.0;  // exponential clustering towards the leading edge
    n.x.assign(static_cast<std::size_t>(upstream + on_plate + 1), 0.0);
    for (int i = 0; i <= on_plate; ++i)
        n.x[static_cast<std::size_t>(upstream + i)] =
            2.0 * std::expm1(beta * i / on_plate) / std::expm1(beta);
    auto geometric = [](double first, int cells, double length) {  // growth ratio by bisection
        double lo = 1.0 + 1e-12, hi = 3.0;
        for (int it = 0; it < 200; ++it) {
            const double r = 0.5 * (lo + hi);
            (first * (std::pow(r, cells) - 1.0) / (r - 1.0) > length ? hi : lo) = r;
        }
        return 0.5 * (lo + hi);
    };
    const double dx0 = n.x[static_cast<std::size_t>(upstream) + 1];
    const double rx = geometric(dx0, upstream, 0.33);
    double d = dx0;
    for (int k = 1; k <= upstream; ++k, d *= rx)
        n.x[static_cast<std::size_t>(upstream - k)] =
            n.x[static_cast<std::size_t>(upstream - k + 1)] - d;
    const double ry = geometric(first_cell, normal, 1.0);
    n.y.assign(static_cast<std::size_t>(normal) + 1, 0.0);
    d = first_cell;
    for (int j = 1; j <= normal; ++j, d *= ry)
        n.y[static_cast<std::size_t>(j)] = n.y[static_cast<std::size_t>(j) - 1] + d;
    for (double& y : n.y) y /= n.y.back();
    return n;
}

/// The grid of every `step`-th node of `n`.
StructuredGrid plate_grid(const PlateNodes& n, int step) {
    const int ni = static_cast<int>(n.x.size() - 1) / step,
              nj = static_cast<int>(n.y.size() - 1) / step;
    const int up = n.upstream / step;
    StructuredGrid g(ni, nj);
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i)
            g.node(i, j) = {n.x[static_cast<std::size_t>(i * step)],
                            n.y[static_cast<std::size_t>(j * step)]};
    g.segments() = {{Side::i_min, 0, nj, SegmentKind::far_field, "inlet"},
                    {Side::i_max, 0, nj, SegmentKind::outflow, "outlet"},
                    {Side::j_min, 0, up, SegmentKind::far_field, "upstream"},
                    {Side::j_min, up, ni, SegmentKind::wall, "plate"},
                    {Side::j_max, 0, ni, SegmentKind::far_field, "top"}};
    return g;
}

struct PlateResult {
    bool converged = false;
    long steps = 0;
    std::vector<double> x, cf;  ///< wall stations (cell centroids) on the plate and their Cf
    double cf_at(double station) const {
        auto it = std::upper_bound(x.begin(), x.end(), station);
        const std::size_t k = static_cast<std::size_t>(
            std::clamp<long>(it - x.begin(), 1, static_cast<long>(x.size()) - 1));
        const double t = (station - x[k - 1]) / (x[k] - x[k - 1]);
        return (1.0 - t) * cf[k - 1] + t * cf[k];
    }
};

/// Steady run until every residual (u, v, continuity, nu_tilde) is 1e-6 of its reference (the
/// largest of the first 20 steps: veer run's own ConvergenceMonitor); Cf from the wall shear
/// (one-sided, second order with the first two cells).
PlateResult run_plate(const StructuredGrid& grid, int upstream) {
    SolverSettings s;
    s.mode = TimeMode::steady;
    SpalartAllmarasSettings sa;
    sa.prescribed_value = [](Vec2) { return 3.0 / reynolds; };
    s.model = spalart_allmaras_descriptor(sa);
    s.velocity_overrides.push_back(moving_wall("upstream", {1.0, 0.0}));
    FlowSolver solver(grid, {reynolds, 0.0}, s);
    PlateResult out;
    // veer run's monitor; the plate has no lift or drag to settle, so only the residuals decide.
    ConvergenceMonitor monitor{ConvergenceCriteria{}};
    for (long n = 0; n < 3000 && !out.converged; ++n) {
        const StepReport r = solver.advance_pseudo_time();
        if (!r.finite) {
            std::cout << "non-finite " << r.worst_variable << " at (" << r.worst_i << ", "
                      << r.worst_j << "), step " << n << "\n";
            break;
        }
        out.steps = n + 1;
        out.converged = monitor.add({step_residuals(r), 0.0, 0.0});
    }
    const GridMetrics m = compute_metrics(grid);
    const FlowFields f = solver.fields();
    for (int i = upstream; i < grid.ni(); ++i) {
        const double d1 = m.centroid[m.cell(i, 0)].y, d2 = m.centroid[m.cell(i, 1)].y;
        const double u1 = f.u[m.cell(i, 0)], u2 = f.u[m.cell(i, 1)];
        const double dudy = (u1 * d2 * d2 - u2 * d1 * d1) / (d1 * d2 * (d2 - d1));
        out.x.push_back(m.centroid[m.cell(i, 0)].x);
        out.cf.push_back(2.0 / reynolds * dudy);
    }
    return out;
}

/// Turbulent flat-plate skin friction, the 1/5-power law Cf = 0.0592 Re_x^(-1/5) (Prandtl;
/// Schlichting, Boundary-Layer Theory, chapter on the turbulent flat plate, for
/// 5e5 < Re_x < 1e7) (memory).
double power_law_cf(double re_x) { return 0.0592 * std::pow(re_x, -0.2); }

TEST(SaFlatPlate, SkinFrictionAgainstTmrAndCorrelationWithGridConvergence) {
    const PlateResult r1 = run_plate(plate_grid(plate_nodes(34, 136, 113, 5e-6 / 1.41), 1), 34);
    ASSERT_TRUE(r1.converged) << "finest grid not converged in " << r1.steps << " steps";
    const double cf1 = r1.cf_at(tmr_station);
    std::cout << "flat plate 170x113: " << r1.steps << " steps, Cf(0.97) = " << cf1 << " (TMR "
              << tmr_cf << ", " << 100.0 * (cf1 / tmr_cf - 1.0) << "%)\n";
    // The band: within 2% of the resource's value (incompressible vs M = 0.2 kept inside).
    EXPECT_NEAR(cf1 / tmr_cf, 1.0, 0.02);

    // Cf(Re_x) against the power law, within 5% (the band) where the law holds for a
    // boundary layer turbulent from the leading edge: 2e6 <= Re_x <= 1e7. Nearer the leading
    // edge the SA boundary layer is still growing out of the free-stream nu_tilde; those
    // stations are printed, not checked.
    for (std::size_t k = 0; k < r1.x.size(); k += 8) {
        const double re_x = reynolds * r1.x[k], law = power_law_cf(re_x);
        std::cout << "  Re_x " << re_x << " Cf " << r1.cf[k] << " power law " << law << " ("
                  << 100.0 * (r1.cf[k] / law - 1.0) << "%)\n";
        if (re_x >= 2e6 && re_x <= 1e7) {
            EXPECT_NEAR(r1.cf[k] / law, 1.0, 0.05) << "Re_x " << re_x;
        }
    }

    // Three grids of the same construction, cell counts divided by about sqrt(2) each way
    // (ratio >= 1.3 as Celik et al. 2008 ask) and the first cell grown by the same factor:
    // GCI of Cf(0.97). (A 60 x 40 grid of the same family settles into a limit cycle instead of
    // converging; see the SA notes in solver/README.)
    const PlateResult r2 = run_plate(plate_grid(plate_nodes(24, 96, 80, 5e-6), 1), 24);
    const PlateResult r3 = run_plate(plate_grid(plate_nodes(17, 68, 57, 5e-6 * 1.41), 1), 17);
    ASSERT_TRUE(r2.converged && r3.converged)
        << "coarser grids: " << r2.steps << " and " << r3.steps << " steps";
    // h = (area / N)^(1/2) with the same area on every grid.
    const test::GciResult g = test::grid_convergence_index(
        {std::sqrt(1.0 / (120.0 * 80.0)), std::sqrt(1.0 / (85.0 * 57.0)),
         std::sqrt(1.0 / (60.0 * 40.0))},
        {cf1, r2.cf_at(tmr_station), r3.cf_at(tmr_station)});
    std::cout << "  GCI: Cf " << r3.cf_at(tmr_station) << " " << r2.cf_at(tmr_station) << " " << cf1
              << ", p = " << g.order << ", extrapolated " << g.extrapolated
              << ", GCI_fine = " << 100.0 * g.gci_fine << "%"
              << (g.oscillatory ? " (oscillatory)" : "") << "\n";
    // The fine grid's numerical uncertainty must be well inside the 2% validation band, and the
    // extrapolated value within it too.
    EXPECT_LT(g.gci_fine, 0.01);
    EXPECT_NEAR(g.extrapolated / tmr_cf, 1.0, 0.02);
}

}  // namespace
}  // namespace veer
