#pragma once
/// A block of sweep points run in order on one process, each from the previous point's fields,
/// and the text their records travel in between MPI ranks.
#include <optional>
#include <string>
#include <vector>

#include "app/commands.hpp"
#include "app/sweep_point.hpp"
#include "app/sweep_ranks.hpp"

namespace veer {

struct BlockResult {
    std::vector<PointRecord> records;
    bool interrupted = false;
};

/// Runs (or finds finished, in `o.out_dir`) the points `mine` (indices into `angles`), each
/// starting from the previous one's fields, the first from `first_start` (the free stream when
/// none). Prints one line per point.
BlockResult run_block(const SweepOptions& o, const SweepCase& sweep,
                      const std::vector<double>& angles, const std::vector<std::size_t>& mine,
                      const StructuredGrid& grid, std::optional<FlowFields> first_start = {});

/// This rank's contiguous block of `count` points (rank_block) as indices.
std::vector<std::size_t> block_indices(std::size_t count, const SweepRanks& ranks);

/// Records as one JSON text, and back (all ranks' texts in order).
std::string records_text(const std::vector<PointRecord>& records);
std::vector<PointRecord> records_from_texts(const std::vector<std::string>& texts);

}  // namespace veer
