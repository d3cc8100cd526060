#include "app/error_line.hpp"

namespace veer {
namespace {

bool continuation_byte(char c) { return (static_cast<unsigned char>(c) & 0xC0) == 0x80; }

}  // namespace

std::string one_line(std::string_view message, std::size_t limit) {
    std::string line(message);
    for (char& c : line)
        if (static_cast<unsigned char>(c) < 0x20 || c == 0x7f) c = ' ';
    if (line.size() <= limit) return line;
    const std::string ellipsis = " \u2026 ";
    const std::size_t room = limit > ellipsis.size() ? limit - ellipsis.size() : 0;
    std::size_t head = room * 2 / 3;  // the start says where; the end says what would be right
    std::size_t tail_from = line.size() - (room - head);
    while (head > 0 && continuation_byte(line[head])) --head;
    while (tail_from < line.size() && continuation_byte(line[tail_from])) ++tail_from;
    return line.substr(0, head) + ellipsis + line.substr(tail_from);
}

}  // namespace veer
