// Wall shear of the Blasius boundary layer written onto a flat-plate block: the two-cell
// reconstruction must return Cf = 0.664 / sqrt(Re_x), and the surface force integration the
// plate's friction drag, 1.328 / sqrt(Re) over the whole length (Blasius 1908, f''(0) = 0.332057;
// values from tests/reference/blasius1908_flat_plate.csv).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <iostream>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "postprocess/surface_forces.hpp"
#include "postprocess/wall_faces.hpp"
#include "tests/reference_table.hpp"

namespace veer {
namespace {

/// f'(eta) of the Blasius equation f''' + f f'' / 2 = 0, f(0) = f'(0) = 0, f''(0) given,
/// tabulated by classical Runge-Kutta with step h (error O(h^4), far below what is tested).
class BlasiusProfile {
public:
    BlasiusProfile(double wall_curvature, double eta_max, double h) : m_h(h) {
        double f = 0.0, fp = 0.0, fpp = wall_curvature;
        auto rhs = [](double a, double b, double c, double& da, double& db, double& dc) {
            da = b;
            db = c;
            dc = -0.5 * a * c;
        };
        for (double eta = 0.0; eta <= eta_max + h; eta += h) {
            m_fp.push_back(fp);
            double k[4][3];
            rhs(f, fp, fpp, k[0][0], k[0][1], k[0][2]);
            rhs(f + 0.5 * h * k[0][0], fp + 0.5 * h * k[0][1], fpp + 0.5 * h * k[0][2], k[1][0],
                k[1][1], k[1][2]);
            rhs(f + 0.5 * h * k[1][0], fp + 0.5 * h * k[1][1], fpp + 0.5 * h * k[1][2], k[2][0],
                k[2][1], k[2][2]);
            rhs(f + h * k[2][0], fp + h * k[2][1], fpp + h * k[2][2], k[3][0], k[3][1], k[3][2]);
            f += h / 6.0 * (k[0][0] + 2 * k[1][0] + 2 * k[2][0] + k[3][0]);
            fp += h / 6.0 * (k[0][1] + 2 * k[1][1] + 2 * k[2][1] + k[3][1]);
            fpp += h / 6.0 * (k[0][2] + 2 * k[1][2] + 2 * k[2][2] + k[3][2]);
        }
    }
    /// f'(eta) by linear interpolation in the table (error h^2 f'''/8 < 1e-8 for h = 1e-3).
    double fp(double eta) const {
        const double s = eta / m_h;
        const auto k = static_cast<std::size_t>(s);
        if (k + 1 >= m_fp.size()) return 1.0;
        return m_fp[k] + (s - static_cast<double>(k)) * (m_fp[k + 1] - m_fp[k]);
    }

private:
    double m_h;
    std::vector<double> m_fp;
};

/// A flat plate from x = 0.1 to 1 at Re = 1e4 carrying the Blasius profile: 45 cells along, 20
/// normal with the first cell 2e-3 high (eta of the first centroid about 0.1 at x = 1, a usual
/// laminar wall spacing: common practice).
struct BlasiusPlate {
    static constexpr int ni = 45, nj = 20;
    static constexpr double re = 1e4, x0 = 0.1;
    StructuredGrid grid{ni, nj};
    GridMetrics metrics;
    FlowFields fields;

    explicit BlasiusPlate(double wall_curvature) {
        const double first = 2e-3, growth = 1.15;
        for (int j = 0; j <= nj; ++j) {
            const double y = first * (std::pow(growth, j) - 1.0) / (growth - 1.0);
            for (int i = 0; i <= ni; ++i) grid.node(i, j) = {x0 + (1.0 - x0) * i / ni, y};
        }
        grid.segments() = {{Side::j_min, 0, ni, SegmentKind::wall, "wall"}};
        metrics = compute_metrics(grid);
        const BlasiusProfile blasius(wall_curvature, 12.0, 1e-3);
        fields.ni = ni;
        fields.nj = nj;
        fields.u.resize(metrics.volume.size());
        fields.v.assign(metrics.volume.size(), 0.0);  // the normal component does not enter
        fields.pressure.assign(metrics.volume.size(), 0.0);
        fields.eddy_viscosity.assign(metrics.volume.size(), 0.0);
        for (std::size_t c = 0; c < metrics.volume.size(); ++c) {
            const Vec2 x = metrics.centroid[c];
            fields.u[c] = blasius.fp(x.y * std::sqrt(re / x.x));
        }
    }
};

const test::ReferenceTable& blasius_reference() {
    static const test::ReferenceTable t =
        test::ReferenceTable::read("blasius1908_flat_plate.csv", 3);
    return t;
}

TEST(BlasiusShear, TwoCellReconstructionGivesTheBlasiusSkinFriction) {
    const double f2 = blasius_reference().value("wall_curvature_f2");
    // The derived coefficient [D] of the file is 2 f''(0) to the three digits it is given with.
    EXPECT_NEAR(blasius_reference().value("local_cf_coefficient"), 2.0 * f2, 5e-4);
    const BlasiusPlate plate(f2);
    const auto wall = evaluate_wall_faces(plate.grid, plate.metrics, plate.fields,
                                          {BlasiusPlate::re, 0.0}, WallPressure::extrapolated);
    ASSERT_EQ(wall.size(), static_cast<std::size_t>(BlasiusPlate::ni)) << "one face per wall cell";
    double worst = 0.0;
    for (const WallFaceState& w : wall) {
        const double cf = 2.0 * w.shear;
        const double blasius_cf = 2.0 * f2 / std::sqrt(BlasiusPlate::re * w.center.x);
        worst = std::max(worst, std::abs(cf / blasius_cf - 1.0));
    }
    std::cout << "compared " << wall.size() << " wall faces with Blasius, largest deviation "
              << worst << "\n";
    // The third and fourth derivatives of f vanish on the wall, so f' = a eta - a^2 eta^4 / 48
    // + ... and the quadratic fit through two cells is off by O(a eta^2) relative: measured
    // 2.5e-3 at most (at x = 0.1, where the first centroids lie deepest in eta, 0.32 and
    // 0.69); 0.5% allows twice that.
    EXPECT_LT(worst, 5e-3) << worst;
}

TEST(BlasiusShear, SurfaceIntegrationGivesTheBlasiusFrictionDrag) {
    // The force route every run report uses (integrate_surface_forces) on the same plate: the
    // friction drag of one side from x0 to 1 is the integral of Cf = 0.664 / sqrt(Re_x),
    // 1.328 (1 - sqrt(x0)) / sqrt(Re) (Blasius 1908; 1.328 / sqrt(Re_L) for the whole plate [D],
    // blasius1908_flat_plate.csv). Its sign says the shear drags the plate downstream.
    const BlasiusPlate plate(blasius_reference().value("wall_curvature_f2"));
    const FlowConditions conditions{BlasiusPlate::re, 0.0};
    const SurfaceForces f =
        integrate_surface_forces(plate.grid, plate.metrics, plate.fields, conditions);
    const double expected = blasius_reference().value("one_side_drag_coefficient") *
                            (1.0 - std::sqrt(BlasiusPlate::x0)) / std::sqrt(BlasiusPlate::re);
    std::cout << "friction drag " << f.cd.friction << ", Blasius " << expected << "\n";
    // Measured 0.06% high. The face shears are within 0.25% of Blasius (test above) and the
    // midpoint rule over 45 faces of the smooth Cf adds less than 0.1% (common practice: O(h^2),
    // h = 0.02, with Cf'' / Cf = 0.75 / x^2): 0.5% still tells a halved or doubled shear and any
    // sign slip.
    EXPECT_NEAR(f.cd.friction / expected, 1.0, 5e-3);
    EXPECT_NEAR(f.cd.pressure, 0.0, 1e-15);  // no pressure on the plate
    EXPECT_NEAR(f.cd.total, f.cd.friction, 1e-15);
    EXPECT_NEAR(f.cl.friction, 0.0, 1e-12);  // wall-parallel shear on a flat wall: no lift
}

}  // namespace
}  // namespace veer
