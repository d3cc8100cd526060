#pragma once
/// A small reader for the comma-separated tables veer writes (history.csv, surface.csv,
/// polar.csv): a header row of names, then rows of values.
#include <filesystem>
#include <string>
#include <vector>

namespace veer {

class CsvTable {
public:
    /// Reads `path`. Throws InputError naming the file when it is missing or has no header,
    /// or naming the line when a row has the wrong number of fields.
    static CsvTable read(const std::filesystem::path& path);

    const std::vector<std::string>& names() const { return m_names; }
    std::size_t rows() const { return m_cells.size(); }
    bool has(const std::string& name) const;
    /// A column as numbers (empty or non-numeric cells, e.g. "null", become NaN). Throws
    /// InputError naming the file and the column when there is no such column.
    std::vector<double> numbers(const std::string& name) const;
    /// A column as text.
    std::vector<std::string> text(const std::string& name) const;

private:
    std::size_t column(const std::string& name) const;
    std::filesystem::path m_path;
    std::vector<std::string> m_names;
    std::vector<std::vector<std::string>> m_cells;
};

}  // namespace veer
