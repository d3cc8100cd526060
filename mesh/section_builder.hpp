#pragma once
/// From a raw outline (a file or a generator) to a checked Section in chord units.
#include <string>

#include "mesh/raw_outline.hpp"
#include "mesh/section.hpp"

namespace veer {

/// Checks `raw` and turns it into a Section named `name` (see section.hpp for its form). Either
/// direction of `raw` is accepted. Points at either end that only draw the trailing-edge base (a
/// repeated closing point, a closing segment) are set aside; a blunt trailing edge is closed by
/// a wedge or a fairing (trailing_edge.hpp). The chord line is the generator's own when `raw`
/// marks its leading edge (a NACA section: nothing is moved), else as `chord_line` asks
/// (chord_frame.hpp). Throws a one-line InputError naming `raw.source` and the file line where
/// known for every outline the checks refuse (outline_checks.hpp, outline_smoothness.hpp).
Section make_section(const RawOutline& raw, const std::string& name,
                     ChordLineChoice chord_line = ChordLineChoice::automatic);

}  // namespace veer
