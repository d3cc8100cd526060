#pragma once
/// DIR/history.csv: one row per step (step, time, residuals of u, v and continuity, Cl, Cd, Cm,
/// residual of nu_tilde), flushed as it goes so a crash keeps everything up to the last step.
/// The nu_tilde column came last and later: rows kept from an older history without it get
/// "nan" there (not recorded).
#include <filesystem>
#include <fstream>

namespace veer {

struct HistoryRow {
    long step = 0;
    double time = 0.0;
    double residual_u = 0.0, residual_v = 0.0, residual_continuity = 0.0;
    double cl = 0.0, cd = 0.0, cm = 0.0;
    double residual_nu_tilde = 0.0;  ///< 0 when laminar
};

class HistoryLog {
public:
    /// Starts a new history, or (restart) keeps the rows up to `keep_through_step` and appends.
    HistoryLog(const std::filesystem::path& path, bool resume, long keep_through_step);
    void append(const HistoryRow& row);

private:
    std::ofstream m_out;
};

}  // namespace veer
