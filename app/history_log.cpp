#include "app/history_log.hpp"

#include <fmt/format.h>

#include <sstream>
#include <string>
#include <vector>

#include "mesh/errors.hpp"

namespace veer {
namespace {
constexpr const char* legacy_header =
    "step,time,residual_u,residual_v,residual_continuity,cl,cd,cm";
constexpr const char* header =
    "step,time,residual_u,residual_v,residual_continuity,cl,cd,cm,residual_nu_tilde";

/// The rows of an earlier history whose step is at most `last_step`, in the current layout.
std::vector<std::string> rows_through(const std::filesystem::path& path, long last_step) {
    std::ifstream in(path);
    std::vector<std::string> rows;
    std::string line;
    std::getline(in, line);  // header
    if (!line.empty() && line.back() == '\r') line.pop_back();
    const bool legacy = line == legacy_header;
    if (!legacy && line != header)
        throw InputError(path.string() + ": not a veer history (header \"" + line + "\")");
    while (std::getline(in, line)) {
        if (line.empty()) continue;
        if (std::stol(line.substr(0, line.find(','))) > last_step) break;
        rows.push_back(legacy ? line + ",nan" : line);
    }
    return rows;
}
}  // namespace

HistoryLog::HistoryLog(const std::filesystem::path& path, bool resume, long keep_through_step) {
    std::vector<std::string> kept;
    if (resume && std::filesystem::exists(path)) kept = rows_through(path, keep_through_step);
    m_out.open(path, std::ios::trunc);
    if (!m_out) throw InputError(path.string() + ": cannot write the history file");
    m_out << header << "\n";
    for (const std::string& r : kept) m_out << r << "\n";
    m_out.flush();
}

void HistoryLog::append(const HistoryRow& r) {
    m_out << fmt::format("{},{:.10g},{:.6e},{:.6e},{:.6e},{:.8f},{:.8f},{:.8f},{:.6e}\n", r.step,
                         r.time, r.residual_u, r.residual_v, r.residual_continuity, r.cl, r.cd,
                         r.cm, r.residual_nu_tilde);
    m_out.flush();
}

}  // namespace veer
