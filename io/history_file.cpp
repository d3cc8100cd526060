#include "io/history_file.hpp"

#include <fmt/format.h>

#include <sstream>

#include "mesh/errors.hpp"

namespace veer {
namespace {

/// The columns every history starts with.
constexpr const char* fixed_header = "step,time,residual_u,residual_v,residual_continuity,cl,cd,cm";
constexpr std::size_t fixed_columns = 8;

std::vector<std::string> split(const std::string& line) {
    std::vector<std::string> cells;
    std::stringstream s(line);
    for (std::string cell; std::getline(s, cell, ',');) cells.push_back(cell);
    return cells;
}

std::string header_of(const std::vector<std::string>& variables) {
    std::string h = fixed_header;
    for (const std::string& v : variables) h += ",residual_" + v;
    return h;
}

/// The rows of an earlier history whose step is at most `last_step`, in the layout of
/// `variables`; their time and forces go to `kept`.
std::vector<std::string> rows_through(const std::filesystem::path& path, long last_step,
                                      const std::vector<std::string>& variables,
                                      ForceRecord& kept) {
    std::ifstream in(path);
    std::string line;
    std::getline(in, line);
    if (!line.empty() && line.back() == '\r') line.pop_back();
    if (line.rfind(fixed_header, 0) != 0)
        throw InputError(path.string() + ": not a veer history (header \"" + line +
                         "\"; expected it to start with \"" + fixed_header + "\")");
    const std::vector<std::string> names = split(line);
    std::vector<std::size_t> column(variables.size(), 0);  // 0: not recorded
    for (std::size_t v = 0; v < variables.size(); ++v)
        for (std::size_t c = fixed_columns; c < names.size(); ++c)
            if (names[c] == "residual_" + variables[v]) column[v] = c;
    std::vector<std::string> rows;
    for (int number = 2; std::getline(in, line); ++number) {
        if (line.empty()) continue;
        const std::vector<std::string> cells = split(line);
        if (cells.size() != names.size())
            throw InputError(fmt::format("{}:{}: {} values; the header names {}", path.string(),
                                         number, cells.size(), names.size()));
        if (std::stol(cells[0]) > last_step) break;
        std::string row = cells[0];
        for (std::size_t c = 1; c < fixed_columns; ++c) row += "," + cells[c];
        for (std::size_t c : column) row += "," + (c ? cells[c] : std::string("nan"));
        rows.push_back(row);
        kept.time.push_back(std::stod(cells[1]));
        kept.cl.push_back(std::stod(cells[5]));
        kept.cd.push_back(std::stod(cells[6]));
        kept.cm.push_back(std::stod(cells[7]));
    }
    return rows;
}

}  // namespace

HistoryFile::HistoryFile(const std::filesystem::path& path, std::vector<std::string> variables,
                         bool resume, long keep_through_step)
    : m_variables(std::move(variables)) {
    std::vector<std::string> kept;
    if (resume && std::filesystem::exists(path))
        kept = rows_through(path, keep_through_step, m_variables, m_kept);
    m_out.open(path, std::ios::trunc);
    if (!m_out) throw InputError(path.string() + ": cannot write the history file");
    m_out << header_of(m_variables) << "\n";
    for (const std::string& r : kept) m_out << r << "\n";
    m_out.flush();
}

void HistoryFile::append(const HistoryRow& r) {
    VEER_VERIFY(r.model_residuals.size() == m_variables.size(),
                "one residual per model variable in a history row");
    std::string row =
        fmt::format("{},{:.10g},{:.6e},{:.6e},{:.6e},{:.8f},{:.8f},{:.8f}", r.step, r.time,
                    r.residual_u, r.residual_v, r.residual_continuity, r.cl, r.cd, r.cm);
    for (double x : r.model_residuals) row += fmt::format(",{:.6e}", x);
    m_out << row << "\n";
    m_out.flush();
}

}  // namespace veer
