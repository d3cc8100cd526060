#include "io/json_writer.hpp"

#include "io/atomic_file.hpp"
#include "io/input_file.hpp"
#include "mesh/errors.hpp"

namespace veer {

void write_json_file(const std::filesystem::path& path, const nlohmann::json& value) {
    std::string text = value.dump(2, ' ', false, nlohmann::json::error_handler_t::replace);
    text += '\n';
    write_text_atomically(path, text);
}

nlohmann::json read_json_file(const std::filesystem::path& path) {
    const std::string text = read_input_file(path, "JSON file", record_file_cap);
    try {
        return nlohmann::json::parse(text);
    } catch (const nlohmann::json::parse_error& e) {
        throw InputError(path.string() + ": not valid JSON (at byte " + std::to_string(e.byte) +
                         ")");
    }
}

}  // namespace veer
