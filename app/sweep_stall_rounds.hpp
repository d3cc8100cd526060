#pragma once
/// The stall search of a sweep (app/stall_search.hpp plans it) run round by round after the
/// requested points: each round planned on rank 0 from every record so far, broadcast, and run
/// like the requested points (spread over the ranks, each block from the nearest finished angle).
#include <string>
#include <vector>

#include "app/commands.hpp"
#include "app/sweep_plan.hpp"
#include "app/sweep_point.hpp"
#include "app/sweep_ranks.hpp"

namespace veer {

/// Whether the search runs: asked for, or "auto" from Reynolds number 1e4 up; never for a
/// job-array point.
bool stall_search_on(const SweepOptions& o, const CaseSpec& base);

/// Runs the search; `records` (rank 0's) gains the added points with their `added_for`, `plan`
/// (rank 0's, written after each round) their angles and, at the end, how the search ended.
/// Returns true when interrupted.
bool run_stall_search(const SweepOptions& o, const SweepCase& sweep, SweepPlan& plan,
                      std::vector<PointRecord>& records, const StructuredGrid& grid,
                      const SweepRanks& ranks);

/// --gather: the search's points, as far as they are finished (rank 0 only, runs nothing).
void gather_stall_points(const SweepOptions& o, const SweepCase& sweep, SweepPlan& plan,
                         std::vector<PointRecord>& records);

}  // namespace veer
