#include "io/coordinate_file.hpp"

#include <fmt/format.h>

#include <charconv>
#include <cmath>
#include <optional>
#include <string>
#include <vector>

#include "io/coordinate_layout.hpp"
#include "io/input_file.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

std::string trim(const std::string& text) {
    const auto first = text.find_first_not_of(" \t\r\f\v");
    if (first == std::string::npos) return {};
    const auto last = text.find_last_not_of(" \t\r\f\v");
    return text.substr(first, last - first + 1);
}

/// The two finite numbers of a line "x y" or "x, y"; empty if the line is anything else.
std::optional<Vec2> parse_pair(const std::string& line) {
    std::string text = line;
    for (char& c : text) {
        if (c == ',' || c == '\t') c = ' ';
    }
    double values[2] = {0.0, 0.0};
    const char* at = text.data();
    const char* end = text.data() + text.size();
    for (double& v : values) {
        while (at < end && *at == ' ') ++at;
        if (at < end && *at == '+') ++at;  // from_chars does not take a leading '+'
        const auto result = std::from_chars(at, end, v);
        if (result.ec != std::errc() || !std::isfinite(v)) return std::nullopt;
        at = result.ptr;
        if (at < end && *at != ' ') return std::nullopt;  // e.g. "0.5abc"
    }
    while (at < end && *at == ' ') ++at;
    if (at != end) return std::nullopt;
    return Vec2{values[0], values[1]};
}

/// The lines of a file, split at LF, CRLF or a lone CR.
std::vector<std::string> file_lines(const std::string& text) {
    std::vector<std::string> lines(1);
    for (std::size_t at = 0; at < text.size(); ++at) {
        const char c = text[at];
        if (c == '\r' && at + 1 < text.size() && text[at + 1] == '\n')
            continue;  // CRLF: the LF ends the line
        if (c == '\n' || c == '\r')
            lines.emplace_back();
        else
            lines.back() += c;
    }
    return lines;
}

}  // namespace

RawOutline read_coordinate_file(const std::filesystem::path& path) {
    const std::string name = path.string();
    const std::string text_of_file = read_input_file(path, "coordinate file", coordinate_file_cap);
    FileBlocks b{name, {}};
    bool title_allowed = true, had_title = false, gap = true;
    int number = 0;
    for (const std::string& line : file_lines(text_of_file)) {
        ++number;
        const std::string text = trim(line);
        if (text.empty()) {
            gap = true;
            continue;
        }
        if (text.front() == '#') continue;
        const std::optional<Vec2> point = parse_pair(text);
        if (!point) {
            if (title_allowed) {
                title_allowed = false;
                had_title = true;
                continue;
            }
            throw InputError(fmt::format("{}:{}: expected two numbers \"x y\", found \"{}\"", name,
                                         number, text));
        }
        title_allowed = false;
        if (gap) b.blocks.emplace_back();
        gap = false;
        b.blocks.back().push_back({*point, number});
    }
    if (b.blocks.empty()) {
        throw InputError(name + (had_title ? ": no coordinates found (only a title line)"
                                           : ": no coordinates found (empty file)"));
    }
    return assemble_outline(b);
}

}  // namespace veer
