/// The steady schemes' numbers (their case-file words: io/case_choices, CaseFile and ChoiceKeys
/// tests), and the settings check that keeps the Rhie-Chow modes of either scheme decaying.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <stdexcept>
#include <string>
#include <vector>

#include "mesh/errors.hpp"
#include "solver/flow_solver.hpp"
#include "solver/laminar_model.hpp"
#include "solver/solver_settings.hpp"
#include "solver/spalart_allmaras_model.hpp"

namespace veer {
namespace {

TEST(SteadyScheme, ClassicIsTheDefaultAndKeepsTheModelsNumbers) {
    SolverSettings s;
    EXPECT_EQ(s.steady_scheme, SteadyScheme::classic);
    for (const ModelDescriptor& model : {laminar_descriptor(), spalart_allmaras_descriptor()}) {
        s.model = model;
        s.steady_scheme = SteadyScheme::fast;
        EXPECT_EQ(effective_pseudo_cfl(s), fast_pseudo_cfl);
        EXPECT_EQ(effective_momentum_sweeps(s), fast_momentum_sweeps);
        const SteadySchemeChoices fast = steady_choices(s);
        EXPECT_TRUE(fast.fold_wake_cut);
        EXPECT_EQ(fast.projection_fraction, fast_projection_fraction);
        EXPECT_EQ(fast.eddy_viscosity_relaxation, fast_eddy_viscosity_relaxation);
        s.steady_scheme = SteadyScheme::classic;
        const SteadySchemeChoices classic = steady_choices(s);
        EXPECT_EQ(effective_momentum_sweeps(s), 2);
        EXPECT_FALSE(classic.fold_wake_cut);
        EXPECT_EQ(classic.projection_fraction, 1.0);
        EXPECT_EQ(classic.eddy_viscosity_relaxation, 1.0);
    }
    s.model = laminar_descriptor();
    EXPECT_EQ(effective_pseudo_cfl(s), laminar_pseudo_cfl);
    s.model = spalart_allmaras_descriptor();
    EXPECT_EQ(effective_pseudo_cfl(s), spalart_allmaras_pseudo_cfl);
    s.pseudo_cfl = 7.5;  // an explicit number wins in either scheme
    s.momentum_sweeps = 3;
    EXPECT_EQ(effective_pseudo_cfl(s), 7.5);
    EXPECT_EQ(effective_momentum_sweeps(s), 3);
    s.steady_scheme = SteadyScheme::fast;
    EXPECT_EQ(effective_pseudo_cfl(s), 7.5);
    EXPECT_EQ(effective_momentum_sweeps(s), 3);
}

/// A one-cell-wide channel: the smallest grid a FlowSolver accepts.
StructuredGrid channel() {
    StructuredGrid g(4, 2);
    for (int j = 0; j <= 2; ++j)
        for (int i = 0; i <= 4; ++i) g.node(i, j) = {i * 0.25, j * 0.5};
    g.segments() = {{Side::i_min, 0, 2, SegmentKind::far_field, "in"},
                    {Side::i_max, 0, 2, SegmentKind::outflow, "out"},
                    {Side::j_min, 0, 4, SegmentKind::wall, "bottom"},
                    {Side::j_max, 0, 4, SegmentKind::wall, "top"}};
    return g;
}

TEST(SteadyScheme, PseudoCflTooSmallForTheProjectionFractionIsAnInputError) {
    // Rhie-Chow modes decay by 1 - rhie_chow_scale / (pseudo_cfl x fraction) per step; the
    // fast scheme's fraction 0.6 moves the bound from 0.25 to 0.25 / 0.6 = 0.417.
    SolverSettings s;
    s.pseudo_cfl = 0.4;
    s.steady_scheme = SteadyScheme::classic;
    EXPECT_NO_THROW(FlowSolver(channel(), {100.0, 0.0}, s));
    s.steady_scheme = SteadyScheme::fast;
    try {
        FlowSolver solver(channel(), {100.0, 0.0}, s);
        FAIL() << "no error";
    } catch (const InputError& e) {
        const std::string m = e.what();
        EXPECT_NE(m.find("pseudo_cfl = 0.4"), std::string::npos) << m;
        EXPECT_NE(m.find("projection fraction"), std::string::npos) << m;
    }
}

/// A flat plate (wall on j_min) in a free stream, 16 x 16 cells.
StructuredGrid plate() {
    StructuredGrid g(16, 16);
    for (int j = 0; j <= 16; ++j)
        for (int i = 0; i <= 16; ++i) g.node(i, j) = {i / 16.0, j / 16.0};
    g.segments() = {{Side::i_min, 0, 16, SegmentKind::far_field, "inlet"},
                    {Side::i_max, 0, 16, SegmentKind::outflow, "outlet"},
                    {Side::j_min, 0, 16, SegmentKind::wall, "plate"},
                    {Side::j_max, 0, 16, SegmentKind::far_field, "top"}};
    return g;
}

const std::vector<double>& array(const std::vector<NamedArray>& state, const std::string& name) {
    for (const NamedArray& a : state)
        if (a.name == name) return a.values;
    throw std::runtime_error("no array " + name);
}

TEST(SteadyScheme, FastMomentumSeesTheEddyViscosityHalfWayToTheModels) {
    // Step 1 takes the model's face eddy viscosity e1 of the start; step 2 uses
    // e2 = e1 + 0.5 (m1 - e1), m1 the model's value after step 1. A solver restored without the
    // relaxed values starts from the model's value, which gives m1.
    SolverSettings s;
    s.model = spalart_allmaras_descriptor();
    s.steady_scheme = SteadyScheme::fast;
    FlowSolver a(plate(), {1e5, 0.0}, s);
    ASSERT_TRUE(a.advance_pseudo_time().finite);
    std::vector<NamedArray> after_one = a.state();
    const std::vector<double> e1 = array(after_one, "eddy_viscosity_i");
    std::erase_if(after_one, [](const NamedArray& x) { return x.name.rfind("eddy_", 0) == 0; });
    FlowSolver b(plate(), {1e5, 0.0}, s);
    b.restore(after_one);
    const std::vector<double> m1 = array(b.state(), "eddy_viscosity_i");
    ASSERT_TRUE(a.advance_pseudo_time().finite);
    const std::vector<double> e2 = array(a.state(), "eddy_viscosity_i");
    ASSERT_EQ(e1.size(), e2.size());
    double moved = 0.0;
    for (std::size_t k = 0; k < e2.size(); ++k) {
        EXPECT_DOUBLE_EQ(e2[k], e1[k] + fast_eddy_viscosity_relaxation * (m1[k] - e1[k])) << k;
        moved = std::max(moved, std::abs(m1[k] - e1[k]));
    }
    EXPECT_GT(moved, 0.0);  // the model's value did change, so the check has teeth
}

}  // namespace
}  // namespace veer
