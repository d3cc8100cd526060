#pragma once
/// Published values the tests compare with, read from tests/reference/ (README there): `#` lines
/// with the source and provenance mark, one header row of column names, comma-separated rows.
/// Reading never passes quietly: a missing file, a malformed row, an unknown column or a row count
/// other than the one the test expects throws, and GoogleTest reports the exception as a failure.
#include <algorithm>
#include <cstddef>
#include <fstream>
#include <sstream>
#include <stdexcept>
#include <string>
#include <vector>

namespace veer::test {

class ReferenceTable {
public:
    /// Reads `name` (a file of tests/reference/) and checks that it holds `expected_rows` rows.
    static ReferenceTable read(const std::string& name, std::size_t expected_rows) {
        ReferenceTable t;
        t.m_path = std::string(VEER_REFERENCE_DIR) + "/" + name;
        std::ifstream in(t.m_path);
        if (!in) t.fail(0, "cannot be opened: the published values of this test are missing");
        int line_number = 0;
        for (std::string line; std::getline(in, line);) {
            ++line_number;
            if (!line.empty() && line.back() == '\r') line.pop_back();
            if (line.empty() || line[0] == '#') continue;
            std::vector<std::string> cells = split(line);
            if (t.m_columns.empty()) {
                t.m_columns = std::move(cells);
                continue;
            }
            if (cells.size() != t.m_columns.size())
                t.fail(line_number, "has " + std::to_string(cells.size()) + " cells, the header " +
                                        std::to_string(t.m_columns.size()));
            t.m_rows.push_back(std::move(cells));
            t.m_lines.push_back(line_number);
        }
        if (t.m_rows.size() != expected_rows)
            t.fail(line_number, "has " + std::to_string(t.m_rows.size()) +
                                    " rows, the test expects " + std::to_string(expected_rows));
        return t;
    }

    std::size_t rows() const { return m_rows.size(); }
    const std::string& path() const { return m_path; }

    const std::string& text(std::size_t row, const std::string& column) const {
        return m_rows.at(row).at(column_index(column));
    }

    double number(std::size_t row, const std::string& column) const {
        const std::string& cell = text(row, column);
        std::size_t used = 0;
        double value = 0.0;
        try {
            value = std::stod(cell, &used);
        } catch (const std::exception&) {
            used = 0;
        }
        if (used == 0 || used != cell.size())
            fail(m_lines[row], "column '" + column + "' holds '" + cell + "', not a number");
        return value;
    }

    /// Every value of a column, in file order.
    std::vector<double> numbers(const std::string& column) const {
        std::vector<double> out;
        for (std::size_t r = 0; r < m_rows.size(); ++r) out.push_back(number(r, column));
        return out;
    }

    /// The first row whose `column` holds `value` (text comparison); throws if there is none.
    std::size_t row_where(const std::string& column, const std::string& value) const {
        const std::size_t c = column_index(column);
        for (std::size_t r = 0; r < m_rows.size(); ++r)
            if (m_rows[r][c] == value) return r;
        fail(0, "has no row with " + column + " = '" + value + "'");
    }

    /// For `quantity,value[,mark]` tables: the value of the row named `quantity`.
    double value(const std::string& quantity) const {
        return number(row_where("quantity", quantity), "value");
    }

private:
    static std::vector<std::string> split(const std::string& line) {
        std::vector<std::string> cells;
        std::stringstream s(line);
        for (std::string cell; std::getline(s, cell, ',');) {
            const auto first = cell.find_first_not_of(" \t");
            const auto last = cell.find_last_not_of(" \t");
            cells.push_back(first == std::string::npos ? "" : cell.substr(first, last - first + 1));
        }
        return cells;
    }

    std::size_t column_index(const std::string& column) const {
        const auto it = std::find(m_columns.begin(), m_columns.end(), column);
        if (it == m_columns.end()) fail(0, "has no column '" + column + "'");
        return static_cast<std::size_t>(it - m_columns.begin());
    }

    [[noreturn]] void fail(int line, const std::string& what) const {
        throw std::runtime_error("reference file " + m_path +
                                 (line > 0 ? ":" + std::to_string(line) : std::string()) + " " +
                                 what);
    }

    std::string m_path;
    std::vector<std::string> m_columns;
    std::vector<std::vector<std::string>> m_rows;
    std::vector<int> m_lines;  ///< file line of each row, for the messages
};

}  // namespace veer::test
