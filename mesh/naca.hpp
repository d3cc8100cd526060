#pragma once
/// NACA 4-digit and 5-digit (mean lines 210-250) sections from their published formulas:
/// Abbott & von Doenhoff 1959, Theory of Wing Sections, sections 6.4-6.5; Jacobs, Ward & Pinkerton
/// 1933, NACA Report 460; Jacobs & Pinkerton 1935, NACA Report 537.
#include <string>

#include "mesh/raw_outline.hpp"

namespace veer {

/// Trailing-edge form of the thickness distribution: `open` uses the published last coefficient
/// -0.1015 (a gap of 0.252% chord for 12% thickness); `closed` uses -0.1036 (zero gap).
enum class TrailingEdge { open, closed };

/// Half-thickness y_t at chord station x in [0, 1] (chords) for thickness ratio t.
double naca_half_thickness(double x, double t, TrailingEdge te);

/// Camber line of a designation: ordinate y_c and slope dy_c/dx at chord station x in [0, 1].
struct CamberPoint {
    double y = 0.0;
    double slope = 0.0;
};

/// The camber line of `digits` at chord station x (chords); throws InputError for a bad
/// designation.
CamberPoint naca_camber(const std::string& digits, double x);

/// Thickness ratio (chords) of `digits`; throws InputError for a bad designation.
double naca_thickness(const std::string& digits);

/// The outline of the section `digits` (e.g. "0012", "4412", "23012") at cosine-spaced chord
/// stations, `stations_per_side` of them from leading to trailing edge. Points run from the lower
/// trailing edge along the lower surface to the leading edge (0, 0) and back along the upper
/// surface to the upper trailing edge; `leading_edge` is set to the nose point. Chord 1.
/// Throws InputError for a designation that is not four digits or a five-digit code with mean
/// line 210-250, for zero thickness, or for stations_per_side < 3.
RawOutline naca_outline(const std::string& digits, TrailingEdge te, int stations_per_side = 161);

}  // namespace veer
