#pragma once
/// How a section was read and placed, in words and as JSON: printed by `veer check`, `veer mesh`,
/// `veer run` and `veer sweep`, kept in mesh.json and section.json, shown on the report page.
#include <nlohmann/json.hpp>
#include <string>
#include <vector>

#include "mesh/section.hpp"

namespace veer {

/// One line each (without the leading label column): the layout read, the chord line with the
/// scale and rotation applied to the source, and the trailing edge (gap and how it was closed).
struct SectionNotes {
    std::string layout;  ///< empty for a generated section
    std::string chord_line;
    std::string trailing_edge;
};

SectionNotes section_notes(const Section& s);

/// The figures of section_notes and its sentences ("notes"), for mesh.json and section.json.
nlohmann::json section_placement_json(const Section& s);

/// Prints the notes as indented "label  text" lines under a command's heading.
void print_section_notes(const Section& s, int label_width);

}  // namespace veer
