/// The physics checks of issue 13's acceptance for free transition (SA-AFT2017b): with rising
/// alpha the upper-surface transition moves forward and the lower aft; with rising Reynolds
/// number (fixed alpha) it moves forward; with N_crit lowered it moves forward. These are the
/// directions of linear-stability (e^N) transition prediction (common practice: a favourable
/// pressure gradient and a lower Reynolds number delay the growth of the disturbances, a lower
/// N_crit is reached sooner); no published number gates them.
///
/// Runs: NACA 0012, 192 x 64 cells, far field 30 chords, y+ 1, steady, through `veer run`'s own
/// path (transition_runs.hpp), shared by the tests (computed_once.hpp). The base point is Re 1e6,
/// alpha 2, N_crit 9; each test changes one input. Measured on this grid (18:10 UTC, 2 threads,
/// a load average near 8 from other jobs): base upper 0.492, lower 0.840 (227 steps, 12 s);
/// alpha 5: 0.182, 0.949 (1050 steps, 39 s); Re 5e5: 0.571, 0.882 (268 steps); N_crit 5:
/// 0.334, 0.673 (242 steps). About 80 s in all on a lightly loaded machine.
///
/// The smallest shift asserted is two face pitches of the surface where transition lies (read from
/// the run's own surface.csv: about 0.012 chords here). The locator interpolates the turbulence
/// index between neighbouring faces, but the index itself changes on the scale of one face, so a
/// position can move by up to a pitch without the flow having changed; two pitches is a shift the
/// grid resolves. Each test also requires both surfaces to have a transition position at all.
///
/// Cautions: 2D, incompressible, and the model's correlations are fits to laminar-layer
/// stability; results are no substitute for testing and licensed engineering review.
#include <gtest/gtest.h>

#include <algorithm>
#include <iostream>
#include <sstream>

#include "app/report_csv.hpp"
#include "transition_runs.hpp"

namespace veer {
namespace {

struct TrendPoint {
    double reynolds = 1e6, alpha = 2.0, critical_amplification = 9.0;
};

std::string trend_case(const TrendPoint& p) {
    std::ostringstream s;
    s << "[geometry]\nnaca = \"0012\"\n[mesh]\naround = 192\nnormal = 64\nfar_field = 30\n"
         "y_plus = 1.0\n[flow]\nreynolds = "
      << p.reynolds << "\nalpha = " << p.alpha
      << "\nmodel = \"sa-aft\"\ncritical_amplification = " << p.critical_amplification
      << "\n[run]\nmode = \"steady\"\nsteps = 4000\n";
    return s.str();
}

test::SectionRun trend_run(const TrendPoint& p) {
    std::ostringstream name;
    name << "aft_trend_re" << p.reynolds << "_alpha" << p.alpha << "_n" << p.critical_amplification;
    const test::SectionRun r = test::section_run(name.str(), trend_case(p));
    std::cout << name.str() << ": " << r.iterations << " steps, Cl " << r.cl << ", Cd " << r.cd
              << ", transition upper "
              << (r.transition_upper ? std::to_string(*r.transition_upper) : "none") << ", lower "
              << (r.transition_lower ? std::to_string(*r.transition_lower) : "none") << "\n";
    return r;
}

/// The x/c distance between the two faces of `side` in the run's surface.csv that bracket x.
double face_pitch_at(const test::SectionRun& r, const std::string& side, double x) {
    const CsvTable t = CsvTable::read(r.run_dir / "surface.csv");
    const std::vector<double> xs = t.numbers("x_c");
    const std::vector<std::string> sides = t.text("side");
    std::vector<double> on_side;
    for (std::size_t k = 0; k < xs.size(); ++k)
        if (sides[k] == side) on_side.push_back(xs[k]);
    std::sort(on_side.begin(), on_side.end());
    for (std::size_t k = 1; k < on_side.size(); ++k)
        if (on_side[k - 1] <= x && x <= on_side[k]) return on_side[k] - on_side[k - 1];
    ADD_FAILURE() << "no faces of the " << side << " surface bracket x/c " << x;
    return 1.0;
}

/// `later` lies at least two face pitches (above) ahead of `earlier` on `side`: moved forward.
void expect_forward(const test::SectionRun& from, const test::SectionRun& to,
                    const std::string& side, const char* what) {
    const auto& a = side == "upper" ? from.transition_upper : from.transition_lower;
    const auto& b = side == "upper" ? to.transition_upper : to.transition_lower;
    ASSERT_TRUE(a && b) << side << ": no transition position in one of the runs (" << what << ")";
    const double least = 2.0 * std::max(face_pitch_at(from, side, *a), face_pitch_at(to, side, *b));
    std::cout << what << ", " << side << ": x/c " << *a << " -> " << *b << " (at least " << least
              << " forward asked)\n";
    EXPECT_LE(*b, *a - least) << what << ": the " << side << " transition did not move forward";
}

TEST(TransitionTrends, RisingAlphaMovesUpperForwardAndLowerAft) {
    const test::SectionRun low = trend_run({}), high = trend_run({.alpha = 5.0});
    EXPECT_TRUE(low.converged && high.converged);
    expect_forward(low, high, "upper", "alpha 2 -> 5");
    expect_forward(high, low, "lower", "alpha 5 -> 2 (aft with rising alpha)");
}

TEST(TransitionTrends, RisingReynoldsNumberMovesTransitionForward) {
    const test::SectionRun low = trend_run({.reynolds = 5e5}), high = trend_run({});
    EXPECT_TRUE(low.converged && high.converged);
    expect_forward(low, high, "upper", "Re 5e5 -> 1e6");
    expect_forward(low, high, "lower", "Re 5e5 -> 1e6");
}

TEST(TransitionTrends, LowerCriticalAmplificationMovesTransitionForward) {
    const test::SectionRun quiet = trend_run({}), noisy = trend_run({.critical_amplification = 5});
    EXPECT_TRUE(quiet.converged && noisy.converged);
    expect_forward(quiet, noisy, "upper", "N_crit 9 -> 5");
    expect_forward(quiet, noisy, "lower", "N_crit 9 -> 5");
}

}  // namespace
}  // namespace veer
