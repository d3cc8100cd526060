// A restart keeps the earlier history only when it is whole: every row numbers, the steps
// running without a gap up to the checkpoint. The trial of issue 19 saw "internal error: stol"
// for a garbage or NUL line and an unreported gap for a history cut short.
#include <gtest/gtest.h>

#include <fstream>
#include <string>

#include "io/history_file.hpp"
#include "io_test_support.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

const std::string header = "step,time,residual_u,residual_v,residual_continuity,cl,cd,cm\n";

std::string row(int step) {
    return std::to_string(step) + "," + std::to_string(0.01 * step) + ",1e-3,2e-3,3e-4,0.41" +
           std::to_string(step) + ",0.02,-0.05\n";
}

std::string history_of(int steps) {
    std::string text = header;
    for (int s = 1; s <= steps; ++s) text += row(s);
    return text;
}

/// The message of resuming `text` at `step`, or "" when the history was accepted.
std::string resume_refusal(const test::ScratchDir& dir, const std::string& text, long step) {
    std::ofstream(dir / "history.csv", std::ios::binary | std::ios::trunc) << text;
    try {
        HistoryFile h(dir / "history.csv", {}, true, step);
        EXPECT_EQ(h.kept_forces().cl.size(), static_cast<std::size_t>(step));
    } catch (const InputError& e) {
        return e.what();
    }
    return "";
}

TEST(HistoryRestart, KeepsAWholeHistoryUpToTheCheckpoint) {
    test::ScratchDir dir;
    EXPECT_EQ(resume_refusal(dir, history_of(6), 4), "");
    const std::string kept = test::read_file_text(dir / "history.csv");
    EXPECT_EQ(kept, history_of(4));  // rows after the checkpoint are dropped
}

TEST(HistoryRestart, RefusesDamagedRowsNamingTheLine) {
    test::ScratchDir dir;
    std::string nul = history_of(2) + std::string(12, '\0') + "\n" + row(3);
    std::string garbage = history_of(2) + "3,0.03,abc,1,1,1,1,1\n";
    std::string cut = history_of(2) + "3,0.03,1e-3\n";
    std::string gap = history_of(2) + row(4) + row(5);
    struct Damage {
        std::string text, words;
    };
    for (const auto& [text, words] :
         {Damage{nul, "history.csv:4: 1 values"}, Damage{garbage, "history.csv:4: \"abc\""},
          Damage{cut, "history.csv:4: 3 values"}, Damage{gap, "step 4 follows step 2"}}) {
        const std::string why = resume_refusal(dir, text, 5);
        EXPECT_NE(why.find(words), std::string::npos) << why;
        EXPECT_NE(why.find("start the run afresh"), std::string::npos) << why;
    }
}

TEST(HistoryRestart, RefusesAHistoryThatEndsBeforeTheCheckpoint) {
    test::ScratchDir dir;
    const std::string why = resume_refusal(dir, history_of(3), 5);
    EXPECT_NE(why.find("ends at step 3, but the checkpoint is at step 5"), std::string::npos)
        << why;
}

}  // namespace
}  // namespace veer
