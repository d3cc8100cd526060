#pragma once
/// DIR/history.csv: one row per step: step, time, the residuals of u, v and continuity, Cl, Cd,
/// Cm, then the residual of each transported variable of the model (column residual_NAME),
/// flushed as it goes so a crash keeps everything up to the last step.
///
/// A restart keeps the rows of the earlier history up to its checkpoint. Their model columns are
/// matched by name: a column the earlier history did not have reads "nan" (not recorded), one
/// the model no longer has is left out.
#include <filesystem>
#include <fstream>
#include <string>
#include <vector>

#include "postprocess/time_average.hpp"

namespace veer {

struct HistoryRow {
    long step = 0;
    double time = 0.0;
    double residual_u = 0.0, residual_v = 0.0, residual_continuity = 0.0;
    double cl = 0.0, cd = 0.0, cm = 0.0;
    std::vector<double> model_residuals;  ///< one per model variable, in the header's order
};

class HistoryFile {
public:
    /// Starts a new history with one residual column per name in `model_variables`, or
    /// (restart) keeps the rows up to `keep_through_step` and appends. Throws InputError naming
    /// the file when it cannot be written or an earlier history is not one veer wrote.
    HistoryFile(const std::filesystem::path& path, std::vector<std::string> model_variables,
                bool resume, long keep_through_step);
    /// Appends and flushes one row; throws InputError naming the file when it cannot be written.
    void append(const HistoryRow& row);

    /// Time and forces of the rows kept from the earlier history (empty for a new one).
    const ForceRecord& kept_forces() const { return m_kept; }

private:
    std::filesystem::path m_path;
    std::vector<std::string> m_variables;
    std::ofstream m_out;
    ForceRecord m_kept;
};

}  // namespace veer
