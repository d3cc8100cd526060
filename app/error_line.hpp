#pragma once
/// The one line an error becomes on stderr: whatever the message holds (a 2 MB value, a newline
/// in a TOML string, a NUL byte), the user sees one line of bounded length.
#include <cstddef>
#include <string>
#include <string_view>

namespace veer {

/// Longest error line veer prints, in bytes, its "veer: error: " prefix included.
inline constexpr std::size_t error_line_limit = 300;

/// `message` as one printable line of at most `limit` bytes: control characters become spaces and
/// a longer message keeps its start (the file and line) and its end (what is allowed), joined by
/// an ellipsis. Never splits a UTF-8 character.
std::string one_line(std::string_view message, std::size_t limit);

}  // namespace veer
