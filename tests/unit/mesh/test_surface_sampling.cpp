// sample_surface: node count and placement, exact mirror symmetry, smooth clustered spacing.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <iostream>

#include "mesh/errors.hpp"
#include "mesh/naca.hpp"
#include "mesh/section_builder.hpp"
#include "mesh/spline.hpp"
#include "mesh/surface_sampling.hpp"

namespace veer {
namespace {

Section naca(const char* digits, TrailingEdge te) {
    return make_section(naca_outline(digits, te), digits);
}

double spacing(const std::vector<Vec2>& n, std::size_t i) { return norm(n[i + 1] - n[i]); }

double worst_neighbour_ratio(const std::vector<Vec2>& n) {
    double worst = 1.0;
    for (std::size_t i = 1; i + 1 < n.size(); ++i) {
        const double r = spacing(n, i) / spacing(n, i - 1);
        worst = std::max({worst, r, 1.0 / r});
    }
    return worst;
}

TEST(SurfaceSampling, NodeCountAndFixedNodes) {
    for (int around : {8, 64, 256, 400}) {
        const Section s = naca("4412", TrailingEdge::closed);
        const std::vector<Vec2> n = sample_surface(s, around);
        ASSERT_EQ(n.size(), static_cast<std::size_t>(around) + 1);
        EXPECT_EQ(n.front().x, 1.0);
        EXPECT_EQ(n.front().y, 0.0);
        EXPECT_EQ(n.back().x, 1.0);
        EXPECT_EQ(n.back().y, 0.0);
        const Vec2 le = n[static_cast<std::size_t>(around / 2)];
        EXPECT_EQ(le.x, 0.0);
        EXPECT_EQ(le.y, 0.0);
        // lower surface first: the node a quarter of the way round is below the one three quarters
        EXPECT_LT(n[static_cast<std::size_t>(around / 4)].y,
                  n[static_cast<std::size_t>(3 * around / 4)].y);
        // a blunt source: the first and last nodes are the tip of its closure, behind x = 1
        const Section blunt = naca("4412", TrailingEdge::open);
        const std::vector<Vec2> b = sample_surface(blunt, around);
        EXPECT_EQ(b.front().x, blunt.points.front().x);
        EXPECT_EQ(b.front().y, blunt.points.front().y);
        EXPECT_EQ(b.back().x, b.front().x);
        EXPECT_GT(b.front().x, 1.0);
    }
}

TEST(SurfaceSampling, SymmetricSectionGivesAnExactMirrorImage) {
    // both halves go through the same operations on mirrored data: equality, not a tolerance
    for (TrailingEdge te : {TrailingEdge::open, TrailingEdge::closed}) {
        const std::vector<Vec2> n = sample_surface(naca("0012", te), 256);
        for (std::size_t i = 0; i < n.size(); ++i) {
            const Vec2 mirror = n[n.size() - 1 - i];
            EXPECT_EQ(n[i].x, mirror.x) << i;
            EXPECT_EQ(n[i].y, -mirror.y) << i;
        }
    }
}

TEST(SurfaceSampling, NodesLieOnTheSectionSpline) {
    // each node is a point of the spline through the section points; the lower half is computed
    // on the reversed outline, the same spline up to round-off: 1e-9 is far above that (1e-15)
    for (const char* digits : {"0012", "4412", "23012"}) {
        const Section s = naca(digits, TrailingEdge::open);
        const ParametricSpline spline(s.points);
        double worst = 0.0;
        const std::vector<Vec2> nodes = sample_surface(s, 256);
        ASSERT_EQ(nodes.size(), 257u) << digits;  // around + 1 nodes
        for (const Vec2& p : nodes) {
            worst = std::max(worst, norm(spline.position(spline.nearest_parameter(p)) - p));
        }
        EXPECT_LT(worst, 1e-9) << digits;
    }
}

TEST(SurfaceSampling, SpacingIsSmoothAndClustered) {
    // the rule limits the spacing slope to 0.1, so neighbouring spacings differ by about 10%
    // (measured 1.105-1.107); the bound is the ~20% asked of a wall grid (common practice)
    for (const char* digits : {"0012", "4412", "23012", "0006", "0024"}) {
        for (int around : {128, 256, 512}) {
            const std::vector<Vec2> n = sample_surface(naca(digits, TrailingEdge::open), around);
            EXPECT_LT(worst_neighbour_ratio(n), 1.2) << digits << " around " << around;
            for (std::size_t i = 0; i + 1 < n.size(); ++i) EXPECT_GT(spacing(n, i), 0.0);
        }
    }
    // 0012 at 256: leading- and trailing-edge spacings of 0.002-0.004 chord (common practice);
    // measured 0.0025 at the leading edge and 0.0026 at the trailing edge
    const std::vector<Vec2> n = sample_surface(naca("0012", TrailingEdge::open), 256);
    for (std::size_t i : {std::size_t{0}, std::size_t{127}, std::size_t{128}, std::size_t{255}}) {
        EXPECT_GT(spacing(n, i), 0.002) << i;
        EXPECT_LT(spacing(n, i), 0.004) << i;
    }
    // clustered: the largest spacing, mid-chord, is several times the edge spacings
    double largest = 0.0;
    for (std::size_t i = 0; i + 1 < n.size(); ++i) largest = std::max(largest, spacing(n, i));
    EXPECT_GT(largest, 2.5 * spacing(n, 128));
}

TEST(SurfaceSampling, RoundedCoordinatesStillGiveSmoothSpacing) {
    // a dense file written to 6 decimals (301 stations: 3e-5 chord apart at the edges, so the
    // rounding is 2% of a spacing there) must not make curvature noise cluster nodes: same bounds
    // as the exact section (measured ratio 1.105, edge spacings 0.0026)
    RawOutline raw = naca_outline("2412", TrailingEdge::open, 301);
    raw.leading_edge.reset();
    for (Vec2& p : raw.points) p = {std::round(p.x * 1e6) / 1e6, std::round(p.y * 1e6) / 1e6};
    const std::vector<Vec2> n = sample_surface(make_section(raw, "rounded"), 256);
    EXPECT_LT(worst_neighbour_ratio(n), 1.2);
    for (std::size_t i : {std::size_t{0}, std::size_t{127}, std::size_t{128}, std::size_t{255}}) {
        EXPECT_GT(spacing(n, i), 0.002) << i;
        EXPECT_LT(spacing(n, i), 0.004) << i;
    }
}

TEST(SurfaceSampling, ThinnerNoseGetsFinerSpacing) {
    // clustering follows curvature: the 0006 nose (radius 0.004) gets finer cells than the 0024
    // nose (radius 0.063)
    const std::vector<Vec2> thin = sample_surface(naca("0006", TrailingEdge::closed), 256);
    const std::vector<Vec2> thick = sample_surface(naca("0024", TrailingEdge::closed), 256);
    EXPECT_LT(spacing(thin, 128), 0.5 * spacing(thick, 128));
}

TEST(SurfaceSampling, OddOrTinyCountIsRefused) {
    const Section s = naca("0012", TrailingEdge::closed);
    for (int bad : {255, 6, 0, -4}) {
        try {
            sample_surface(s, bad);
            ADD_FAILURE() << "accepted around = " << bad;
        } catch (const InputError& e) {
            const std::string what = e.what();
            EXPECT_EQ(what.rfind("around = " + std::to_string(bad) + ":", 0), 0u) << what;
            EXPECT_NE(what.find("even"), std::string::npos) << what;
        }
    }
}

/// Largest distance of coarse node k from fine node 2k, in coarse spacings: zero for a fine grid
/// that halves every coarse cell (one spacing distribution at both counts).
double worst_nesting_gap(const std::vector<Vec2>& coarse, const std::vector<Vec2>& fine) {
    EXPECT_EQ(fine.size(), 2 * coarse.size() - 1);
    double worst = 0.0;
    for (std::size_t k = 0; k + 1 < coarse.size(); ++k)
        worst = std::max(worst, norm(fine[2 * k] - coarse[k]) / spacing(coarse, k));
    return worst;
}

TEST(SurfaceSampling, SlopeCapScaledWithTheCellSizeGivesOneSpacingDistribution) {
    // A grid study's members must share one spacing distribution (Celik et al. 2008: systematic
    // refinement). With one slope cap the cap binds at 192 cells around a NACA 0012 and less at
    // 384, so the halved grid does not nest (measured: coarse nodes 2.8 coarse spacings off the
    // fine grid's even nodes); with the cap doubled on the coarse member it does, up to the
    // sampled spacing function and the bisection (measured 9e-5 spacings). Bounds: ten times the
    // measured gap of the scaled family, and a third of the measured gap of the fixed cap.
    const Section s = naca("0012", TrailingEdge::closed);
    const std::vector<Vec2> fine = sample_surface(s, 384, default_surface_slope);
    const double scaled =
        worst_nesting_gap(sample_surface(s, 192, 2 * default_surface_slope), fine);
    const double fixed = worst_nesting_gap(sample_surface(s, 192, default_surface_slope), fine);
    std::cout << "coarse node k against fine node 2k, in coarse spacings: cap scaled " << scaled
              << ", one cap " << fixed << "\n";
    EXPECT_LT(scaled, 1e-3);
    EXPECT_GT(fixed, 1.0);
}

TEST(SurfaceSampling, RefusesACapThatIsNotPositive) {
    const Section s = naca("0012", TrailingEdge::closed);
    EXPECT_THROW(sample_surface(s, 64, 0.0), InputError);
    EXPECT_THROW(sample_surface(s, 64, -0.1), InputError);
}

}  // namespace
}  // namespace veer
