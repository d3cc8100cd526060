// The circle through the Simulation and the run report on a small O-grid: a run continues bit
// for bit from its checkpoint across the seam and the start spin, a symmetric start stays
// symmetric until the spin breaks it, and summary.json speaks of the circle (diameters, angles
// from the rear point, base pressure, the time means with their spread).
#include <gtest/gtest.h>

#include <cmath>
#include <cstring>

#include "app/commands.hpp"
#include "app/mesh_pipeline.hpp"
#include "app/run_report.hpp"
#include "app/simulation.hpp"
#include "app_test_support.hpp"
#include "io/case_file.hpp"
#include "io/checkpoint.hpp"
#include "io/json_writer.hpp"

namespace veer {
namespace {

CaseSpec circle_case(long steps, double spin, const std::string& mode = "unsteady") {
    return parse_case_text(
        "[geometry]\ncircle = true\n[mesh]\naround = 32\nnormal = 16\nfar_field = 20\n"
        "first_cell = 2e-2\n[flow]\nreynolds = 100\n[run]\nmode = \"" +
            mode + "\"\nsteps = " + std::to_string(steps) +
            "\ncheckpoint_every = 1000\nend_time = 1000\n" +
            (spin > 0 ? "start_spin = " + std::to_string(spin) + "\n" : std::string()) +
            "[post]\ncontours = [0.5, 2]\nwake_stations = [0.5, 2]\n",
        "circle.toml", ".");
}

bool same_bits(const std::vector<NamedArray>& a, const std::vector<NamedArray>& b) {
    if (a.size() != b.size()) return false;
    for (std::size_t k = 0; k < a.size(); ++k)
        if (a[k].name != b[k].name || a[k].values.size() != b[k].values.size() ||
            std::memcmp(a[k].values.data(), b[k].values.data(),
                        a[k].values.size() * sizeof(double)) != 0)
            return false;
    return true;
}

TEST(CircleRun, ContinuesBitForBitFromItsCheckpoint) {
    test::AppScratch scratch;
    SimulationOptions quiet;
    quiet.progress = false;
    const CaseSpec whole = circle_case(30, 0.3);
    std::filesystem::create_directories(scratch / "straight");
    Simulation straight(whole, build_mesh(whole).grid, scratch / "straight", quiet);
    straight.run();
    std::filesystem::create_directories(scratch / "pieces");
    {
        // Stopped inside the spin (t < 2): the restart must pick the spin up at its time.
        const CaseSpec part = circle_case(5, 0.3);
        Simulation first(part, build_mesh(part).grid, scratch / "pieces", quiet);
        const RunResult r = first.run();
        ASSERT_EQ(r.steps, 5);
        ASSERT_LT(r.time, 2.0);
    }
    const CheckpointData saved = read_checkpoint(scratch / "pieces" / "checkpoint.h5");
    ASSERT_TRUE(saved.grid.c_layout().has_value());
    EXPECT_TRUE(saved.grid.c_layout()->closed());
    int periodic = 0;
    for (const BoundarySegment& s : saved.grid.segments())
        periodic += s.kind == SegmentKind::periodic ? 1 : 0;
    EXPECT_EQ(periodic, 2);
    Simulation resumed(whole, saved.grid, scratch / "pieces", quiet);
    resumed.resume(saved);
    EXPECT_EQ(resumed.run().steps, 30);
    EXPECT_TRUE(same_bits(straight.solver().state(), resumed.solver().state()));
    EXPECT_EQ(test::read_text(scratch / "straight" / "history.csv"),
              test::read_text(scratch / "pieces" / "history.csv"));
}

TEST(CircleRun, SymmetricUntilTheStartSpin) {
    test::AppScratch scratch;
    SimulationOptions quiet;
    quiet.progress = false;
    double lift[2] = {};
    for (int spin = 0; spin < 2; ++spin) {
        const CaseSpec c = circle_case(5, spin ? 0.3 : 0.0);  // t about 1.3: in the spin
        const std::filesystem::path dir = scratch / std::to_string(spin);
        std::filesystem::create_directories(dir);
        Simulation sim(c, build_mesh(c).grid, dir, quiet);
        const RunResult r = sim.run();
        ASSERT_EQ(r.status, RunStatus::step_cap);
        ASSERT_LT(r.time, 2.0);
        lift[spin] = r.forces.cl.total;
        EXPECT_GT(r.forces.cd.total, 0.5);
        // Moments about the centre: every face normal of the wall polygon passes through it, so
        // the pressure gives none (about the quarter point it would give about Cl / 2).
        EXPECT_LT(std::abs(r.forces.cm.pressure), 1e-12);
    }
    // The O-grid and the flow along +x are mirror images to the last bit (mesh/ogrid.hpp); what
    // breaks the symmetry is the iterative solves, stopped at 1e-6 relative residual with an
    // ordering (red-black lines, the lagged seam coupling) that is not mirror-symmetric: 1e-7.
    EXPECT_LT(std::abs(lift[0]), 1e-5);
    // A counter-clockwise spin speeds the flow under the circle: lift downwards (Magnus).
    EXPECT_LT(lift[1], -1e-2);
}

TEST(CircleRun, SummarySpeaksOfTheCircle) {
    test::AppScratch scratch;
    SimulationOptions quiet;
    quiet.progress = false;
    const CaseSpec c = circle_case(400, 0.0, "steady");
    Simulation sim(c, build_mesh(c).grid, scratch.path(), quiet);
    const RunResult r = sim.run();
    write_run_report(sim, r, ClosingTable::omit);
    const nlohmann::json s = read_json_file(scratch / "summary.json");
    EXPECT_EQ(s.at("reference_length"), "diameter");
    EXPECT_FALSE(s.contains("trailing_edge_cp_upper"));
    // Re 100 held steady (pseudo-time damps the shedding): separated on both halves, the same
    // angle on each by symmetry, a closed recirculation behind the rear point.
    const double up = s.at("separation_angle_upper_deg"), low = s.at("separation_angle_lower_deg");
    EXPECT_GT(up, 30.0);
    EXPECT_LT(up, 90.0);
    EXPECT_NEAR(up, low, 1e-6);
    EXPECT_GT(s.at("recirculation_length").get<double>(), 0.5);
    EXPECT_LT(s.at("base_cp").get<double>(), 0.0);
    EXPECT_FALSE(s.contains("time_average"));
}

TEST(CircleRun, MeshReportNamesTheOGrid) {
    test::AppScratch scratch;
    test::write_text(scratch / "circle.toml", circle_case(1, 0.0).text);
    MeshOptions o;
    o.input.case_file = scratch / "circle.toml";
    o.out_dir = scratch / "mesh";
    ASSERT_EQ(run_mesh_command(o), 0);
    const nlohmann::json m = read_json_file(scratch / "mesh" / "mesh.json");
    EXPECT_EQ(m.at("grid"), "O-grid");
    EXPECT_EQ(m.at("reference_length"), "diameter");
    EXPECT_EQ(m.at("ni"), 32);
    EXPECT_FALSE(m.contains("wake"));
    EXPECT_FALSE(m.contains("trailing_edge_non_orthogonality_deg"));
    EXPECT_NEAR(m.at("far_field_distance").get<double>(), 20.0, 1e-9);
    EXPECT_TRUE(std::filesystem::exists(scratch / "mesh" / "mesh.vts"));
}

}  // namespace
}  // namespace veer
