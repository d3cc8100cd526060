#include "app/report_csv.hpp"

#include <algorithm>
#include <cmath>
#include <fstream>
#include <sstream>

#include "mesh/errors.hpp"

namespace veer {
namespace {

std::vector<std::string> split_fields(const std::string& line) {
    std::vector<std::string> fields;
    std::stringstream in(line);
    std::string f;
    while (std::getline(in, f, ',')) {
        f.erase(0, f.find_first_not_of(" \t\r"));
        f.erase(f.find_last_not_of(" \t\r") + 1);
        fields.push_back(f);
    }
    if (!line.empty() && line.back() == ',') fields.emplace_back();
    return fields;
}

}  // namespace

CsvTable CsvTable::read(const std::filesystem::path& path) {
    std::ifstream in(path);
    if (!in) throw InputError(path.string() + ": cannot open the table");
    CsvTable t;
    t.m_path = path;
    std::string line;
    long number = 0;
    while (std::getline(in, line)) {
        ++number;
        if (line.empty() || line[0] == '#') continue;
        if (t.m_names.empty()) {
            t.m_names = split_fields(line);
            continue;
        }
        std::vector<std::string> row = split_fields(line);
        if (row.size() != t.m_names.size())
            throw InputError(path.string() + ":" + std::to_string(number) + ": " +
                             std::to_string(row.size()) + " fields, the header has " +
                             std::to_string(t.m_names.size()));
        t.m_cells.push_back(std::move(row));
    }
    if (t.m_names.empty()) throw InputError(path.string() + ": no header row");
    return t;
}

bool CsvTable::has(const std::string& name) const {
    return std::find(m_names.begin(), m_names.end(), name) != m_names.end();
}

std::size_t CsvTable::column(const std::string& name) const {
    const auto it = std::find(m_names.begin(), m_names.end(), name);
    if (it == m_names.end()) throw InputError(m_path.string() + ": no column \"" + name + "\"");
    return static_cast<std::size_t>(it - m_names.begin());
}

std::vector<double> CsvTable::numbers(const std::string& name) const {
    const std::size_t c = column(name);
    std::vector<double> out;
    out.reserve(m_cells.size());
    for (const auto& row : m_cells) {
        const std::string& cell = row[c];
        char* end = nullptr;
        const double v = std::strtod(cell.c_str(), &end);
        out.push_back(cell.empty() || end != cell.c_str() + cell.size() ? std::nan("") : v);
    }
    return out;
}

std::vector<std::string> CsvTable::text(const std::string& name) const {
    const std::size_t c = column(name);
    std::vector<std::string> out;
    for (const auto& row : m_cells) out.push_back(row[c]);
    return out;
}

}  // namespace veer
