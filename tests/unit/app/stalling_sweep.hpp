#pragma once
/// The tiny case as a sweep whose steady attempt stalls at step 20 (a residual drop of 1e30 over
/// 20 steps, which no iteration meets), with room for 500 steps and a short time-accurate run:
/// the set-up the plateau and bounded-cycle tests share.
#include <string>

#include "app/sweep_point.hpp"
#include "app_test_support.hpp"
#include "io/case_file.hpp"

namespace veer::test {

inline SweepCase stalling_tiny_sweep(const AppScratch& tmp) {
    std::string text = tiny_case_text();
    text.replace(text.find("steps = 5"), 9, "steps = 500\nend_time = 0.05");
    write_text(tmp / "c.toml", text);
    SweepCase sweep{read_case_source(tmp / "c.toml"), {}, 0, 0.0, false};
    sweep.plateau = {20, 1e30, 0.0, 10};
    return sweep;
}

}  // namespace veer::test
