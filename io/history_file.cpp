#include "io/history_file.hpp"

#include <fmt/format.h>

#include <charconv>
#include <optional>
#include <sstream>

#include "io/atomic_file.hpp"
#include "io/input_file.hpp"
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

/// What a restart says when the earlier history cannot be trusted.
constexpr const char* history_remedy =
    "restore history.csv as the run wrote it, or start the run afresh without --restart";

/// The lines of `text`, without their LF or CRLF ends.
std::vector<std::string> lines_of(const std::string& text) {
    std::vector<std::string> lines;
    std::stringstream s(text);
    for (std::string line; std::getline(s, line);) {
        if (!line.empty() && line.back() == '\r') line.pop_back();
        lines.push_back(line);
    }
    return lines;
}

/// The number a history cell holds ("nan" marks a residual not recorded); empty when the cell
/// is anything else (garbage, NUL bytes, a line cut short).
std::optional<double> cell_number(const std::string& cell) {
    double v = 0.0;
    const auto r = std::from_chars(cell.data(), cell.data() + cell.size(), v);
    if (cell.empty() || r.ec != std::errc() || r.ptr != cell.data() + cell.size())
        return std::nullopt;
    return v;
}

/// One data row checked: every cell a number, the step the one after `previous`.
std::vector<double> checked_row(const std::vector<std::string>& cells, std::size_t columns,
                                long previous, const std::string& where) {
    if (cells.size() != columns)
        throw InputError(fmt::format("{}: {} values; the header names {}; {}", where, cells.size(),
                                     columns, history_remedy));
    std::vector<double> values;
    for (const std::string& cell : cells) {
        const std::optional<double> v = cell_number(cell);
        if (!v)
            throw InputError(fmt::format("{}: \"{}\" is not a number; {}", where,
                                         cell.substr(0, 40), history_remedy));
        values.push_back(*v);
    }
    if (values[0] != static_cast<double>(previous + 1))
        throw InputError(
            fmt::format("{}: step {} follows step {} (rows are missing or out of "
                        "order); {}",
                        where, cells[0], previous, history_remedy));
    return values;
}

/// The rows of an earlier history whose step is at most `last_step`, in the layout of
/// `variables`; their time and forces go to `kept`. The rows must run without a gap from the
/// first step to `last_step` (the checkpoint's step): a damaged or shortened history is refused.
std::vector<std::string> rows_through(const std::filesystem::path& path, long last_step,
                                      const std::vector<std::string>& variables,
                                      ForceRecord& kept) {
    const std::vector<std::string> lines =
        lines_of(read_input_file(path, "history file", record_file_cap));
    const std::string header = lines.empty() ? std::string() : lines.front();
    if (header.rfind(fixed_header, 0) != 0)
        throw InputError(path.string() + ": not a veer history (header \"" + header.substr(0, 60) +
                         "\"; expected it to start with \"" + fixed_header + "\")");
    const std::vector<std::string> names = split(header);
    std::vector<std::size_t> column(variables.size(), 0);  // 0: not recorded
    for (std::size_t v = 0; v < variables.size(); ++v)
        for (std::size_t c = fixed_columns; c < names.size(); ++c)
            if (names[c] == "residual_" + variables[v]) column[v] = c;
    std::vector<std::string> rows;
    long step = 0;
    for (std::size_t number = 2; number <= lines.size() && step < last_step; ++number) {
        const std::string& line = lines[number - 1];
        if (line.empty()) continue;
        const std::vector<std::string> cells = split(line);
        const std::vector<double> values =
            checked_row(cells, names.size(), step, fmt::format("{}:{}", path.string(), number));
        step += 1;
        std::string row = cells[0];
        for (std::size_t c = 1; c < fixed_columns; ++c) row += "," + cells[c];
        for (std::size_t c : column) row += "," + (c ? cells[c] : std::string("nan"));
        rows.push_back(row);
        kept.time.push_back(values[1]);
        kept.cl.push_back(values[5]);
        kept.cd.push_back(values[6]);
        kept.cm.push_back(values[7]);
    }
    if (step < last_step)
        throw InputError(
            fmt::format("{}: ends at step {}, but the checkpoint is at step {} (the "
                        "history was cut short); {}",
                        path.string(), step, last_step, history_remedy));
    return rows;
}

}  // namespace

HistoryFile::HistoryFile(const std::filesystem::path& path, std::vector<std::string> variables,
                         bool resume, long keep_through_step)
    : m_path(path), m_variables(std::move(variables)) {
    std::vector<std::string> kept;
    if (resume && std::filesystem::exists(path))
        kept = rows_through(path, keep_through_step, m_variables, m_kept);
    // The kept rows replace the file whole (tmp + rename): a crash here keeps the old history.
    std::string start = header_of(m_variables) + "\n";
    for (const std::string& r : kept) start += r + "\n";
    write_text_atomically(path, start);
    m_out.open(path, std::ios::app);
    if (!m_out) throw InputError(path.string() + ": cannot write the history file");
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
    if (!m_out)  // a full disk: stop now rather than run on with a history that lost its rows
        throw InputError(m_path.string() + ": cannot append step " + std::to_string(r.step) +
                         " to the history (disk full?); the last checkpoint is kept");
}

}  // namespace veer
