#pragma once
/// From a raw outline (a file or a generator) to a checked, normalised Section.
#include <string>

#include "mesh/raw_outline.hpp"
#include "mesh/section.hpp"

namespace veer {

/// Checks `raw` and turns it into a Section named `name`: unit chord, leading edge at the origin,
/// trailing edge at (1, 0), points from the trailing edge along the lower surface to the leading
/// edge and back along the upper surface, sharp trailing edge (a blunt one is closed with a short
/// wedge; its gap in chords is kept in `source_te_gap`). Either direction of `raw` is accepted.
/// Throws a one-line InputError naming `raw.source` (and the file line where known) for fewer than
/// 20 points, duplicate consecutive points, an outline that does not close (first and last points
/// more than 5% of the chord apart), a self-intersecting outline or a sharp reversal away from the
/// trailing edge.
Section make_section(const RawOutline& raw, const std::string& name);

}  // namespace veer
