// The closing table of a run: the lift of each route and the largest disagreement.
#include <gtest/gtest.h>

#include <cstdio>
#include <string>

#include "app/closing_table.hpp"
#include "app/run_report.hpp"

namespace veer {
namespace {

std::string printed_table(const RunAnalysis& a) {
    CaseSpec spec;
    spec.geometry.name = "NACA 0012";
    testing::internal::CaptureStdout();
    print_closing_table(spec, a);
    std::fflush(stdout);
    return testing::internal::GetCapturedStdout();
}

RunAnalysis with_lift(double surface_cl, double contour_cl) {
    RunAnalysis a;
    a.forces.cl.total = surface_cl;
    RouteComparison m;
    m.contour.distance = 4.0;
    m.cl_momentum = contour_cl;
    m.cl_momentum_difference = contour_cl - surface_cl;
    a.routes.push_back(m);
    a.max_lift_disagreement = largest_lift_disagreement(a.routes);
    return a;
}

TEST(ClosingTable, GivesTheDisagreementAsAPercentageOfTheLift) {
    const std::string out = printed_table(with_lift(0.5, 0.49));
    EXPECT_NE(out.find("control volume at 4.00 chords"), std::string::npos) << out;
    EXPECT_NE(out.find("disagreement: 0.01000 (2.00% of Cl)"), std::string::npos) << out;
}

TEST(ClosingTable, NoPercentageOfALiftNearZero) {
    // A symmetric section at zero incidence: Cl is round-off, a percentage of it is noise.
    const std::string out = printed_table(with_lift(2e-11, 3e-6));
    EXPECT_EQ(out.find("% of Cl"), std::string::npos) << out;
    EXPECT_NE(out.find("(Cl near zero)"), std::string::npos) << out;
}

}  // namespace
}  // namespace veer
