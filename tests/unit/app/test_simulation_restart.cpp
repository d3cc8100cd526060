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

CaseSpec small_case(const std::string& mode, long steps, const std::string& model = "laminar",
                    const std::string& flow_keys = "") {
    return parse_case_text(
        "[geometry]\nnaca = \"0012\"\n[mesh]\naround = 64\nnormal = 16\nwake = 12\n"
        "far_field = 10\nfirst_cell = 1e-2\n[flow]\nreynolds = 200\nalpha = 3\nmodel = \"" +
            model + "\"\n" + flow_keys + "[run]\nmode = \"" + mode +
            "\"\nsteps = " + std::to_string(steps) + "\ncheckpoint_every = 1000\nend_time = 100\n",
        "small.toml", ".");
}

/// The convergence record of the checkpoint in DIR rewritten by `rewrite` from the current
/// layout: marker -3, count, n, n references, relative residual, then (Cl, Cd) pairs.
template <class Rewrite>
void rewrite_record(const std::filesystem::path& dir, Rewrite rewrite) {
    CheckpointData c = read_checkpoint(dir / "checkpoint.h5");
    for (NamedArray& a : c.arrays)
        if (a.name == "simulation_convergence") {
            const auto n = static_cast<std::size_t>(a.values[2]);
            const std::vector<double> refs(a.values.begin() + 3, a.values.begin() + 3 + n);
            const std::vector<double> pairs(a.values.begin() + 4 + static_cast<long>(n),
                                            a.values.end());
            a.values = rewrite(a.values[1], refs, a.values[3 + n], pairs);
        }
    write_checkpoint(dir / "checkpoint.h5", c);
}

/// history.csv of DIR with its last column dropped (all lines).
void drop_last_history_column(const std::filesystem::path& dir) {
    std::string text = test::read_text(dir / "history.csv"), out;
    std::size_t at = 0;
    while (at < text.size()) {
        const std::size_t end = text.find('\n', at);
        const std::string line = text.substr(at, end - at);
        out += line.substr(0, line.rfind(',')) + "\n";
        at = end + 1;
    }
    test::write_text(dir / "history.csv", out);
}

/// The checkpoint and history of a run as the oldest veer wrote them: the convergence record
/// without the model's reference (count, three references, relative residual, Cl/Cd pairs)
/// and history.csv without the model's column.
void make_legacy(const std::filesystem::path& dir) {
    rewrite_record(dir, [](double count, const std::vector<double>& refs, double relative,
                           const std::vector<double>& pairs) {
        std::vector<double> old = {count, refs[0], refs[1], refs[2], relative};
        old.insert(old.end(), pairs.begin(), pairs.end());
        return old;
    });
    const std::string history = test::read_text(dir / "history.csv");
    if (history.substr(0, history.find('\n')).ends_with(",residual_nu_tilde"))
        drop_last_history_column(dir);
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

/// Runs `part` to its step cap into `dir`, as a run interrupted there (its checkpoint and
/// history.csv stay for the resume that follows).
void run_first_part(const CaseSpec& part, const std::filesystem::path& dir) {
    SimulationOptions quiet;
    quiet.progress = false;
    Simulation first(part, build_mesh(part).grid, dir, quiet);
    ASSERT_EQ(first.run().steps, part.run.steps);
}

/// Resumes the run in `dir` from its checkpoint as `whole` and runs it to its step cap.
void resume_to_end(const CaseSpec& whole, const std::filesystem::path& dir) {
    SimulationOptions quiet;
    quiet.progress = false;
    const CheckpointData saved = read_checkpoint(dir / "checkpoint.h5");
    Simulation resumed(whole, saved.grid, dir, quiet);
    resumed.resume(saved);
    EXPECT_EQ(resumed.run().steps, whole.run.steps);
}

TEST(SimulationRestart, SteadyRunContinuesBitForBit) { restart_reproduces("steady"); }

TEST(SimulationRestart, UnsteadyRunContinuesBitForBit) { restart_reproduces("unsteady"); }

/// A steady run of `model` interrupted at step 11 and resumed to 24 ends on the bits of the run
/// straight to 24, and history.csv carries a residual column per model variable.
void model_restart_reproduces(const std::string& model, const std::string& flow_keys,
                              const std::vector<std::string>& variables) {
    test::AppScratch scratch;
    SimulationOptions quiet;
    quiet.progress = false;
    const CaseSpec whole = small_case("steady", 24, model, flow_keys);
    Simulation straight(whole, build_mesh(whole).grid, scratch / "straight", quiet);
    std::filesystem::create_directories(scratch / "straight");
    straight.run();
    const CaseSpec part = small_case("steady", 11, model, flow_keys);
    std::filesystem::create_directories(scratch / "pieces");
    {
        Simulation interrupted(part, build_mesh(part).grid, scratch / "pieces", quiet);
        ASSERT_EQ(interrupted.run().steps, 11);
    }
    const CheckpointData saved = read_checkpoint(scratch / "pieces" / "checkpoint.h5");
    Simulation resumed(whole, saved.grid, scratch / "pieces", quiet);
    resumed.resume(saved);
    EXPECT_EQ(resumed.run().steps, 24);
    EXPECT_TRUE(same_bits(straight.solver().state(), resumed.solver().state()));
    const std::string history = test::read_text(scratch / "pieces" / "history.csv");
    EXPECT_EQ(test::read_text(scratch / "straight" / "history.csv"), history);
    ASSERT_FALSE(variables.empty());
    for (const std::string& v : variables)
        EXPECT_NE(history.find(",residual_" + v), std::string::npos) << v;
}

TEST(SimulationRestart, SpalartAllmarasRunContinuesBitForBit) {
    model_restart_reproduces("spalart-allmaras", "", {"nu_tilde"});
}

TEST(SimulationRestart, TransitionRunWithATripContinuesBitForBit) {
    // SA-AFT2017b's three variables (nu_tilde, n~, g~) and a trip on one surface.
    model_restart_reproduces("sa-aft", "trip_lower = 0.4\ncritical_amplification = 3\n",
                             {"nu_tilde", "amplification", "log_intermittency"});
}

TEST(SimulationRestart, AlgebraicTransitionRunContinuesBitForBit) {
    // SA-BCM: nu_tilde alone; its intermittency is recomputed from the restored state.
    model_restart_reproduces("sa-bcm", "trip_upper = 0.5\n", {"nu_tilde"});
}

TEST(SimulationRestart, OlderLaminarCheckpointResumes) {
    test::AppScratch scratch;
    const CaseSpec part = small_case("steady", 30);
    run_first_part(part, scratch.path());
    make_legacy(scratch.path());
    const CaseSpec whole = small_case("steady", 33);
    resume_to_end(whole, scratch.path());
    // A laminar run has no model column; rows 1-30 are kept, 31-33 appended.
    const std::string history = test::read_text(scratch / "history.csv");
    EXPECT_EQ(history.substr(0, history.find('\n')),
              "step,time,residual_u,residual_v,residual_continuity,cl,cd,cm");
    EXPECT_NE(history.find("\n30,"), std::string::npos);
    EXPECT_NE(history.find("\n33,"), std::string::npos);
}

TEST(SimulationRestart, LaminarCheckpointOfTheFourSlotMonitorResumes) {
    // The layout of the release before the model interface: the record's fourth reference (the
    // model's, 0 when laminar) after marker -2, and history.csv with a zero residual_nu_tilde
    // column, which a laminar run no longer writes.
    test::AppScratch scratch;
    const CaseSpec part = small_case("steady", 30);
    run_first_part(part, scratch.path());
    rewrite_record(scratch.path(), [](double count, const std::vector<double>& refs,
                                      double relative, const std::vector<double>& pairs) {
        std::vector<double> old = {-2.0, count, refs[0], refs[1], refs[2], 0.0, relative};
        old.insert(old.end(), pairs.begin(), pairs.end());
        return old;
    });
    std::string text = test::read_text(scratch / "history.csv"), padded;
    for (std::size_t at = 0; at < text.size();) {
        const std::size_t end = text.find('\n', at);
        padded += text.substr(at, end - at) + (at == 0 ? ",residual_nu_tilde\n" : ",0.0\n");
        at = end + 1;
    }
    test::write_text(scratch / "history.csv", padded);
    resume_to_end(small_case("steady", 33), scratch.path());
    const std::string history = test::read_text(scratch / "history.csv");
    EXPECT_EQ(history.substr(0, history.find('\n')),
              "step,time,residual_u,residual_v,residual_continuity,cl,cd,cm");
    EXPECT_EQ(history.find(",0.0\n"), std::string::npos);  // the old column is left out
    EXPECT_NE(history.find("\n30,"), std::string::npos);
}

TEST(SimulationRestart, HistoryWithoutTheModelColumnIsPadded) {
    // An SA run whose history lacks the model's column (written before it was recorded):
    // the kept rows read "nan" there (not recorded), the new ones the residual.
    test::AppScratch scratch;
    const CaseSpec part = small_case("steady", 15, "spalart-allmaras");
    run_first_part(part, scratch.path());
    drop_last_history_column(scratch.path());
    resume_to_end(small_case("steady", 18, "spalart-allmaras"), scratch.path());
    const std::string history = test::read_text(scratch / "history.csv");
    EXPECT_EQ(history.substr(0, history.find('\n')),
              "step,time,residual_u,residual_v,residual_continuity,cl,cd,cm,residual_nu_tilde");
    EXPECT_NE(history.find("\n15,"), std::string::npos);
    EXPECT_NE(history.substr(history.find("\n15,")).find(",nan\n16,"), std::string::npos);
    const std::string row_16 = history.substr(history.find("\n16,") + 1);
    EXPECT_NE(row_16.substr(0, row_16.find('\n')).find("e-"), std::string::npos) << row_16;
    EXPECT_EQ(row_16.substr(0, row_16.find('\n')).find("nan"), std::string::npos) << row_16;
}

TEST(SimulationRestart, OlderSpalartAllmarasCheckpointIsRefusedClearly) {
    test::AppScratch scratch;
    SimulationOptions quiet;
    quiet.progress = false;
    const CaseSpec part = small_case("steady", 30, "spalart-allmaras");
    run_first_part(part, scratch.path());
    make_legacy(scratch.path());
    const CheckpointData saved = read_checkpoint(scratch / "checkpoint.h5");
    Simulation resumed(small_case("steady", 40, "spalart-allmaras"), saved.grid, scratch.path(),
                       quiet);
    try {
        resumed.resume(saved);
        FAIL() << "an SA checkpoint without the nu_tilde reference was resumed";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("nu_tilde"), std::string::npos) << e.what();
    }
}

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
