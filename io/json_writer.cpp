#include "io/json_writer.hpp"

#include <fstream>
#include <sstream>

#include "io/atomic_file.hpp"
#include "mesh/errors.hpp"

namespace veer {

void write_json_file(const std::filesystem::path& path, const nlohmann::json& value) {
    std::string text = value.dump(2, ' ', false, nlohmann::json::error_handler_t::replace);
    text += '\n';
    write_text_atomically(path, text);
}

nlohmann::json read_json_file(const std::filesystem::path& path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) throw InputError(path.string() + ": cannot open; expected a JSON file");
    std::ostringstream text;
    text << in.rdbuf();
    try {
        return nlohmann::json::parse(text.str());
    } catch (const nlohmann::json::parse_error& e) {
        throw InputError(path.string() + ": not valid JSON (at byte " + std::to_string(e.byte) +
                         ")");
    }
}

}  // namespace veer
