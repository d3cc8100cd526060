// The spline through a coarse table adds no shape the table does not have: near the nose it
// neither bulges outside the section the table was taken from nor puts a turn the other way
// into the convex nose, and the grid's wall nodes lie on that section.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>

#include "mesh/section_builder.hpp"
#include "mesh/spline.hpp"
#include "mesh/surface_sampling.hpp"
#include "tests/support/naca_tables.hpp"

namespace veer {
namespace {

// NACA 4-digit sections from the formula (Abbott & von Doenhoff 1959, section 6.4 [T]).
const test::NacaDigits k_4412{0.04, 0.4, 0.12}, k_0012{0.0, 0.4, 0.12};

/// The section itself near the nose (x < 0.2), densely: lower trailing side -> nose -> upper,
/// clockwise like a Section.
std::vector<Vec2> analytic_nose(const test::NacaDigits& d) {
    std::vector<double> x;
    for (int k = 0; k <= 4000; ++k) x.push_back(0.2 * std::pow(k / 4000.0, 2));
    std::vector<Vec2> p;
    for (std::size_t k = x.size(); k-- > 1;) p.push_back(test::naca_point(d, x[k], false));
    for (double xk : x) p.push_back(test::naca_point(d, xk, true));
    return p;
}

/// Signed distance of q from the clockwise polyline p: positive outside the section.
double signed_distance(const std::vector<Vec2>& p, Vec2 q) {
    double best = HUGE_VAL, sign = 1.0;
    for (std::size_t k = 0; k + 1 < p.size(); ++k) {
        const Vec2 ab = p[k + 1] - p[k];
        const double t = std::clamp(dot(q - p[k], ab) / dot(ab, ab), 0.0, 1.0);
        const double d = norm(q - (p[k] + t * ab));
        if (d < best) {
            best = d;
            sign = cross(ab, q - p[k]) > 0.0 ? 1.0 : -1.0;  // left of a clockwise run: outside
        }
    }
    return sign * best;
}

struct NoseShape {
    double outside = 0.0;  ///< farthest outside the section (chords)
    double inside = 0.0;   ///< farthest inside it (chords)
    int reversed_turns =
        0;  ///< samples in x < 0.05 where the spline turns the convex nose's other way
};

/// The spline make_section's outline gives the surface sampler, sampled at 20 points between
/// knots wherever x < 0.1.
NoseShape nose_shape(const test::NacaDigits& d, const std::vector<double>& stations) {
    RawOutline raw;
    raw.source = "table";
    raw.points = test::loop_of(test::naca_surfaces(d, stations));
    const Section s = make_section(raw, "t");
    const ParametricSpline spline(s.points);
    const std::vector<Vec2> truth = analytic_nose(d);
    NoseShape shape;
    for (std::size_t k = 0; k + 1 < spline.knots().size(); ++k) {
        for (int q = 0; q < 20; ++q) {
            const double at =
                spline.knots()[k] + (spline.knots()[k + 1] - spline.knots()[k]) * q / 20.0;
            const Vec2 p = spline.position(at);
            if (p.x >= 0.1) continue;
            const double e = signed_distance(truth, p);
            shape.outside = std::max(shape.outside, e);
            shape.inside = std::max(shape.inside, -e);
            if (p.x < 0.05 && spline.curvature(at) > 0.0) ++shape.reversed_turns;
        }
    }
    return shape;
}

TEST(SplineShape, CoarseTablesOfAKnownSectionGainNoShapeAtTheNose) {
    // 18 stations typical of published tables (nose at 0, 1.25, 2.5 % chord) and 35 cosine
    // stations. A clockwise outline turns clockwise (negative curvature) round a convex nose.
    // Measured (4412 / 0012): 18 stations 9.5e-5 / 8.7e-5 chords outside the section and
    // 3.0e-4 / 2.7e-4 inside (the table cannot show more of the nose); 35 stations 1.8e-5 /
    // 1.6e-5 outside, 2.2e-5 / 2.0e-5 inside. Bounds about 1.5 to 2 times those: a spline in
    // even parameter steps bulges 4.6e-4 outside the 18-station nose and turns the wrong way
    // there (tried).
    for (const test::NacaDigits& d : {k_4412, k_0012}) {
        const NoseShape report = nose_shape(d, test::report_stations());
        EXPECT_LT(report.outside, 2e-4) << d.m;
        EXPECT_LT(report.inside, 4.5e-4) << d.m;
        EXPECT_EQ(report.reversed_turns, 0) << d.m;
        const NoseShape cosine = nose_shape(d, test::cosine_stations(35));
        EXPECT_LT(cosine.outside, 3e-5) << d.m;
        EXPECT_LT(cosine.inside, 3.5e-5) << d.m;
        EXPECT_EQ(cosine.reversed_turns, 0) << d.m;
    }
}

TEST(SplineShape, WallNodesFromA35StationTableLieOnTheSection) {
    // the 256 wall nodes of the demo grid, from the 35-station 4412 table, against the section
    // itself: within 4e-5 chords near the nose (the spline's own error above, 2.2e-5) and
    // everywhere within 1e-4 of the formula's 2001-station outline
    RawOutline raw;
    raw.source = "table";
    raw.points = test::loop_of(test::naca_surfaces(k_4412, test::cosine_stations(35)));
    const std::vector<Vec2> nodes = sample_surface(make_section(raw, "t"), 256);
    const std::vector<Vec2> truth = analytic_nose(k_4412);
    const std::vector<Vec2> whole =
        test::loop_of(test::naca_surfaces(k_4412, test::cosine_stations(2001)));
    std::vector<Vec2> clockwise(whole.rbegin(), whole.rend());
    ASSERT_EQ(nodes.size(), 257u);
    for (std::size_t i = 1; i + 1 < nodes.size(); ++i) {  // the ends are the wedge's tip
        if (nodes[i].x > 1.0) continue;
        EXPECT_LT(std::abs(signed_distance(clockwise, nodes[i])), 1e-4) << i;
        if (nodes[i].x < 0.1) {
            EXPECT_LT(std::abs(signed_distance(truth, nodes[i])), 4e-5) << i;
        }
    }
}

}  // namespace
}  // namespace veer
