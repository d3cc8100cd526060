#pragma once
/// Escaping of text placed in XML or HTML (attribute values and element text alike).
#include <string>

namespace veer {

/// `text` with &, <, > and " replaced by their entities, safe inside an element or a
/// double-quoted attribute of an XML or HTML document.
std::string markup_escaped(const std::string& text);

}  // namespace veer
