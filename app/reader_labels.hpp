#pragma once
/// The words a reader sees around veer's figures, kept in one place so the screen, a sweep,
/// summary.json and the report page say the same thing the same way: the caution, the grid
/// size, the lift routes with the distance their contour actually lies at, the sign conventions
/// and the human labels (with units) of the summary's keys.
#include <optional>
#include <string>
#include <string_view>

#include "mesh/cgrid_spec.hpp"

namespace veer {

/// The caution that ends `veer run` and `veer sweep`, heads the report page and closes `--help`.
std::string_view reader_caution();

/// One grid-size convention everywhere (README: a grid A×N means around A, normal N): e.g.
/// "256 x 64 (around x normal; wake 48 cells each side), 352 x 64 cells".
std::string grid_words(const CGridSpec& mesh, bool circle, int ni, int nj);

/// The reference length's name: "chords", or "diameters" for the circle.
const char* length_words(bool circle);

/// "control volume at 0.53 chords": the route's name with its contour's distance as the grid
/// places it (GridContour::distance, not the distance asked for).
std::string control_volume_label(double placed_distance, bool circle);
/// "circulation at 0.53 chords", likewise.
std::string circulation_label(double placed_distance, bool circle);
/// "outermost contour at 29.6 chords": the far-boundary force check's row.
std::string outermost_label(double placed_distance, bool circle);

/// The header of a route's difference from the surface lift (not a slope).
inline constexpr const char* difference_header = "Cl - surface";

/// Why the circulation rows sit below the surface lift in viscous flow.
inline constexpr const char* circulation_note =
    "note: in viscous flow the circulation rows lie below the surface lift, because a contour "
    "leaves out the vorticity shed into the wake behind its wake crossing; that offset is "
    "expected and is not an error bar";

/// The pitching moment's reference point and sign.
inline constexpr const char* cm_convention = "about the quarter chord, nose-up positive";

/// The downward momentum flux of a wake profile: unit, sign and the band it is integrated over.
std::string downward_flux_words(double half_height_chords);

/// A summary.json key as a reader reads it: a label with its unit (empty when dimensionless).
struct FigureLabel {
    std::string_view label;
    std::string_view unit;
};
/// The label of a summary key (run or sweep); nullopt for a key with none (not shown).
std::optional<FigureLabel> figure_label(std::string_view key);

}  // namespace veer
