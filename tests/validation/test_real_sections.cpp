/// Real-world section tables through the `veer run` chain (../verification/run_pipeline.hpp).
///
/// A NACA 4412 table of 35 cosine-spaced stations per surface, written to 5 decimals from the
/// formula (Abbott & von Doenhoff 1959, Theory of Wing Sections, section 6.4, [T]; the table is
/// generated in tests/support/naca_tables.hpp) must give the Cl and Cm of veer's analytic section
/// (`naca = "4412"`) within 0.5 % at alpha 0 and 6 deg, laminar at Re 1000 on the demo grid and
/// with Spalart-Allmaras at Re 3e6, with the file's own chord line (rotation 0). This compares
/// two routes to one shape, not veer with an outside result: the tolerance is the acceptance of
/// the issue that asked for it (a table must not change the answer by more than that).
///
/// Blunt trailing edges of 0.5 to 4.9 % chord, a repeated closing point and a base drawn across
/// the gap mesh on the demo grid and run to convergence.
#include <gtest/gtest.h>

#include <cmath>
#include <filesystem>
#include <iostream>

#include "../verification/run_pipeline.hpp"
#include "tests/support/naca_tables.hpp"

namespace veer {
namespace {

namespace fs = std::filesystem;

fs::path scratch() {
    const fs::path dir =
        fs::temp_directory_path() / ("veer_real_sections_" + std::to_string(::getpid()));
    fs::create_directories(dir);
    return dir;
}

fs::path write_4412_table(const fs::path& dir) {
    const test::Surfaces s = test::naca_surfaces({0.04, 0.4, 0.12}, test::cosine_stations(35));
    return test::write_table(dir / "table_4412.dat",
                             "NACA 4412 at 35 stations\n" + test::table_text(test::loop_of(s), 5));
}

struct Outcome {
    double cl = 0.0, cm = 0.0, cl_momentum = 0.0;
    RunStatus status = RunStatus::step_cap;
    double rotation_deg = 0.0;
};

/// `geometry` is the [geometry] body; the demo grid (cases/indoor-flyer-laminar.toml) or, for
/// the turbulent runs, 256 x 96 at y+ 1 with the far field at 40 chords.
Outcome run(const std::string& geometry, double alpha, bool turbulent) {
    const std::string mesh = turbulent ? "around = 256\nnormal = 96\nwake = 48\nfar_field = 40\n"
                                         "y_plus = 1\n"
                                       : "around = 256\nnormal = 64\nwake = 48\nfar_field = 30\n"
                                         "first_cell = 2e-3\n";
    const std::string flow = turbulent ? "reynolds = 3e6\nmodel = \"spalart-allmaras\"\n"
                                       : "reynolds = 1000\nmodel = \"laminar\"\n";
    const std::string text = "[geometry]\n" + geometry + "[mesh]\n" + mesh + "[flow]\n" + flow +
                             "alpha = " + std::to_string(alpha) +
                             "\n[run]\nsteps = 6000\ncheckpoint_every = 100000\n";
    Outcome o;
    o.rotation_deg = build_section(parse_case_text(text, "test case", ".")).frame.rotation_deg;
    const test::PipelineRun r = test::run_pipeline(text);
    o.cl = r.analysis.forces.cl.total;
    o.cm = r.analysis.forces.cm.total;
    o.cl_momentum = r.analysis.momentum.back().cl.total;
    o.status = r.result.status;
    std::cout << geometry.substr(0, geometry.find('\n')) << " alpha " << alpha << ": cl " << o.cl
              << ", cm " << o.cm << ", control volume cl " << o.cl_momentum << ", "
              << r.result.steps << " steps\n";
    return o;
}

void compare_table_with_analytic(bool turbulent) {
    const fs::path dir = scratch();
    const std::string table = "coordinates = \"" + write_4412_table(dir).string() + "\"\n";
    for (double alpha : {0.0, 6.0}) {
        const Outcome a = run("naca = \"4412\"\n", alpha, turbulent);
        const Outcome t = run(table, alpha, turbulent);
        EXPECT_EQ(a.status, RunStatus::converged) << alpha;
        EXPECT_EQ(t.status, RunStatus::converged) << alpha;
        EXPECT_EQ(t.rotation_deg, 0.0);  // the file's own chord line: nothing turned
        EXPECT_LT(std::abs(t.cl - a.cl), 0.005 * std::abs(a.cl)) << "alpha " << alpha;
        EXPECT_LT(std::abs(t.cm - a.cm), 0.005 * std::abs(a.cm)) << "alpha " << alpha;
        std::cout << "  table vs analytic at " << alpha << " deg: cl "
                  << 100.0 * (t.cl - a.cl) / a.cl << " %, cm " << 100.0 * (t.cm - a.cm) / a.cm
                  << " %\n";
    }
    fs::remove_all(dir);
}

TEST(RealSections, Table4412GivesTheAnalyticForcesLaminar) { compare_table_with_analytic(false); }

TEST(RealSections, Table4412GivesTheAnalyticForcesTurbulent) { compare_table_with_analytic(true); }

/// NACA 0012 (closed-edge formula, section 6.4 [T]) at 81 cosine stations with the trailing
/// edge opened to `gap` by adding gap / 2 * x to the half-thickness.
std::vector<Vec2> opened_0012(double gap) {
    return test::loop_of(test::opened_by(
        test::naca_surfaces({0.0, 0.4, 0.12, -0.1036}, test::cosine_stations(81)), gap));
}

TEST(RealSections, BluntTrailingEdgesMeshAndRunOnTheDemoGrid) {
    // laminar, Re 1000, alpha 4 (the demo case). Measured: every variant converges in about
    // 470 steps with the surface and control-volume lift 0.6 % apart; the bound of 2 % is the
    // demo's own route agreement with room for the longer fairings.
    const fs::path dir = scratch();
    const auto file = [&](const std::string& name, const std::vector<Vec2>& points) {
        return "coordinates = \"" +
               test::write_table(dir / name, "0012 variant\n" + test::table_text(points, 6))
                   .string() +
               "\"\n";
    };
    double plain_cl = 0.0;
    for (double gap : {0.005, 0.0125, 0.025, 0.049, 0.00252}) {
        const Outcome o = run(file("gap.dat", opened_0012(gap)), 4.0, false);
        EXPECT_EQ(o.status, RunStatus::converged) << gap;
        EXPECT_GT(o.cl, 0.15) << gap;
        EXPECT_LT(std::abs(o.cl_momentum - o.cl), 0.02 * o.cl) << gap;
        plain_cl = o.cl;
    }
    // the 0.252 % edge written with its first point repeated at the end, and with the base drawn
    // from its centre: the same section, so the same grid and the same answer to the last bit
    std::vector<Vec2> repeated = opened_0012(0.00252), drawn = opened_0012(0.00252);
    repeated.push_back(repeated.front());
    drawn.insert(drawn.begin(), {1.0, 0.0});
    drawn.push_back({1.0, 0.0});
    EXPECT_EQ(run(file("repeated.dat", repeated), 4.0, false).cl, plain_cl);
    EXPECT_EQ(run(file("drawn.dat", drawn), 4.0, false).cl, plain_cl);
    fs::remove_all(dir);
}

}  // namespace
}  // namespace veer
