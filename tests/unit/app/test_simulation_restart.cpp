// The Simulation end to end on a small C-grid: an interrupted-then-restarted run reproduces an
// uninterrupted one bit for bit, the history is continued rather than lost, and a diverging run
// stops with a diagnosis naming the cell and keeps its last good checkpoint.
#include <gtest/gtest.h>

#include <cmath>
#include <cstring>

#include "app/mesh_pipeline.hpp"
#include "app/simulation.hpp"
#include "app_test_support.hpp"
#include "io/case_file.hpp"
#include "io/checkpoint.hpp"

namespace veer {
namespace {

CaseSpec small_case(const std::string& mode, long steps) {
    return parse_case_text(
        "[geometry]\nnaca = \"0012\"\n[mesh]\naround = 64\nnormal = 16\nwake = 12\n"
        "far_field = 10\nfirst_cell = 1e-2\n[flow]\nreynolds = 200\nalpha = 3\n[run]\nmode = \"" +
            mode + "\"\nsteps = " + std::to_string(steps) +
            "\ncheckpoint_every = 1000\nend_time = 100\n",
        "small.toml", ".");
}

bool same_bits(const std::vector<NamedArray>& a, const std::vector<NamedArray>& b) {
    if (a.size() != b.size()) return false;
    for (std::size_t k = 0; k < a.size(); ++k) {
        if (a[k].name != b[k].name || a[k].values.size() != b[k].values.size()) return false;
        if (std::memcmp(a[k].values.data(), b[k].values.data(),
                        a[k].values.size() * sizeof(double)) != 0)
            return false;
    }
    return true;
}

void restart_reproduces(const std::string& mode) {
    test::AppScratch scratch;
    const long total = 24, first = 11;
    SimulationOptions quiet;
    quiet.progress = false;

    const CaseSpec whole = small_case(mode, total);
    Simulation straight(whole, build_mesh(whole).grid, scratch / "straight", quiet);
    std::filesystem::create_directories(scratch / "straight");
    straight.run();

    const CaseSpec part = small_case(mode, first);
    std::filesystem::create_directories(scratch / "pieces");
    {
        Simulation interrupted(part, build_mesh(part).grid, scratch / "pieces", quiet);
        const RunResult r = interrupted.run();
        ASSERT_EQ(r.steps, first);
    }
    const CheckpointData saved = read_checkpoint(scratch / "pieces" / "checkpoint.h5");
    Simulation resumed(whole, saved.grid, scratch / "pieces", quiet);
    resumed.resume(saved);
    const RunResult r = resumed.run();
    EXPECT_EQ(r.steps, total);
    // Bit for bit: the restart path may not change a single rounding.
    EXPECT_TRUE(same_bits(straight.solver().state(), resumed.solver().state()));
    EXPECT_EQ(test::read_text(scratch / "straight" / "history.csv"),
              test::read_text(scratch / "pieces" / "history.csv"));
}

TEST(SimulationRestart, SteadyRunContinuesBitForBit) { restart_reproduces("steady"); }

TEST(SimulationRestart, UnsteadyRunContinuesBitForBit) { restart_reproduces("unsteady"); }

TEST(SimulationRestart, DivergenceNamesTheCellAndKeepsTheLastGoodCheckpoint) {
    test::AppScratch scratch;
    SimulationOptions quiet;
    quiet.progress = false;
    CaseSpec c = small_case("steady", 6);
    c.run.checkpoint_every = 3;
    {
        Simulation good(c, build_mesh(c).grid, scratch.path(), quiet);
        ASSERT_EQ(good.run().steps, 6);
    }
    // The solver is too robust to blow up on demand, so the state it resumes from carries a
    // non-finite velocity in one cell: the next step must be caught, located and not saved.
    CheckpointData poisoned = read_checkpoint(scratch / "checkpoint.h5");
    const int bad_i = 40, bad_j = 3;
    for (NamedArray& a : poisoned.arrays)
        if (a.name == "velocity_u")
            a.values[static_cast<std::size_t>(bad_j * poisoned.grid.ni() + bad_i)] = std::nan("");
    c.run.steps = 20;
    Simulation sim(c, poisoned.grid, scratch.path(), quiet);
    sim.resume(poisoned);
    const RunResult r = sim.run();
    ASSERT_EQ(r.status, RunStatus::diverged);
    EXPECT_EQ(r.steps, 7);
    EXPECT_NE(r.diagnosis.find("step 7"), std::string::npos) << r.diagnosis;
    EXPECT_NE(r.diagnosis.find("cell ("), std::string::npos) << r.diagnosis;
    EXPECT_NE(r.diagnosis.find("checkpoint.h5 (step 6)"), std::string::npos) << r.diagnosis;
    const CheckpointData kept = read_checkpoint(scratch / "checkpoint.h5");
    EXPECT_EQ(kept.step, 6);
    for (const NamedArray& a : kept.arrays)
        for (double v : a.values) ASSERT_TRUE(std::isfinite(v)) << a.name;
}

}  // namespace
}  // namespace veer
