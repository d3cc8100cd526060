// The live progress line says "continuity" as every other output does, estimates the time left
// from the way done, and, once the residuals are down but Cl and Cd still move, says so instead
// of claiming 100 % with no time left.
#include <gtest/gtest.h>

#include <string>

#include "app/progress_line.hpp"

namespace veer {
namespace {

ProgressFigures steady_figures(double fraction_done, bool settling) {
    ProgressFigures f;
    f.step = 120;
    f.residual_u = 1e-5;
    f.residual_v = 2e-5;
    f.residual_continuity = 3e-6;
    f.cl = 0.5;
    f.cd = 0.01;
    f.fraction_done = fraction_done;
    f.steady = true;
    f.forces_settling = settling;
    return f;
}

TEST(ProgressText, NamesTheContinuityResidual) {
    const std::string line = progress_text(steady_figures(0.5, false), 10.0, "");
    EXPECT_NE(line.find("continuity 3.00e-06"), std::string::npos) << line;
    EXPECT_EQ(line.find(" div "), std::string::npos) << line;
}

TEST(ProgressText, TimeLeftFollowsTheWayDone) {
    // Half way after 10 s: 10 s left.
    const std::string line = progress_text(steady_figures(0.5, false), 10.0, "");
    EXPECT_NE(line.find(" 50%  left 10s"), std::string::npos) << line;
}

TEST(ProgressText, SettlingForcesReplaceTheFinishedClaim) {
    const std::string line = progress_text(steady_figures(1.0, true), 30.0, "");
    EXPECT_NE(line.find("Cl and Cd settling"), std::string::npos) << line;
    EXPECT_EQ(line.find("100%"), std::string::npos) << line;
    EXPECT_EQ(line.find("left 0s"), std::string::npos) << line;
}

TEST(ProgressText, ModelResidualsFollowContinuityWithTheirLabels) {
    ProgressFigures f = steady_figures(0.5, false);
    f.model_residuals = {{"nu~", 4e-7}};
    const std::string line = progress_text(f, 10.0, "a4 ");
    EXPECT_EQ(line.rfind("a4 iter", 0), 0U) << line;
    EXPECT_LT(line.find("continuity"), line.find("nu~ 4.00e-07")) << line;
}

}  // namespace
}  // namespace veer
