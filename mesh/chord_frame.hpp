#pragma once
/// The chord line of an outline read from a file: the file's own axes when the file is already in
/// chord units, otherwise the line from the nose to the trailing-edge centre.
#include <string>

#include "mesh/section.hpp"
#include "mesh/trailing_edge.hpp"

namespace veer {

/// Tolerances of the chord-line decision, in chords.
struct ChordFrameLimits {
    /// `automatic` keeps the file's axes when the trailing-edge centre lies within this of (1, 0)
    /// and the foremost point's x within this of 0.
    static constexpr double automatic_fit = 0.005;
    /// `file_axes` refuses a file whose trailing-edge centre or foremost x is farther off.
    static constexpr double file_axes_fit = 0.05;
    /// In both, the foremost point may lie this far above or below the x axis (a drooped nose).
    static constexpr double nose_offset = 0.05;
};

/// Chooses the chord line of `w` (source units, clockwise, base points set aside) as `choice`
/// asks and sets `w.nose`: with the file's axes, the foremost point (least x); from the outline,
/// the point of its spline farthest from the trailing-edge centre (inserted as an added point,
/// unless an outline point lies within 1e-7 chords of it). Throws InputError naming `source`
/// when `file_axes` is asked of a file that is not in chord units.
SectionFrame choose_frame(OutlineWork& w, ChordLineChoice choice, const std::string& source);

/// Moves the points of `w` into chord units: leading edge of `f` to (0, 0), trailing-edge centre
/// to (1, 0). The file's axes leave every point as it is, bit for bit.
void apply_frame(OutlineWork& w, const SectionFrame& f);

}  // namespace veer
