#pragma once
/// What a finished run leaves in its folder beside the fields and checkpoint: summary.json and the
/// closing table on stdout (and, with the post-processing, the surface and wake files).
#include "app/simulation.hpp"

namespace veer {

/// Writes the run's report files into its folder and prints the closing table.
void write_run_report(const Simulation& sim, const RunResult& result);

}  // namespace veer
