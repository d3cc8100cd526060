#pragma once
/// An airfoil section outline in chord units, with a record of how it was made from its source.
#include <string>
#include <vector>

#include "mesh/vec2.hpp"

namespace veer {

/// Which line is the chord line (the line angles of attack are measured from).
enum class ChordLineChoice {
    /// The file's own axes when the file is already in chord units (leading edge near x = 0,
    /// trailing-edge centre near (1, 0)); otherwise as nose_to_tail.
    automatic,
    /// The file's own axes, always: x along the chord, coordinates already in chords.
    file_axes,
    /// From the outline: the nose point farthest from the trailing-edge centre to that centre.
    nose_to_tail,
};

/// The chord line actually used and the transform that took the source to chord units.
struct SectionFrame {
    enum class Origin { analytic, file_axes, nose_to_tail };
    Origin origin = Origin::analytic;
    ChordLineChoice choice = ChordLineChoice::automatic;  ///< what was asked for
    Vec2 leading_edge{0.0, 0.0};   ///< start of the chord line, in source units
    Vec2 trailing_edge{1.0, 0.0};  ///< end of the chord line (trailing-edge centre), source units
    double scale = 1.0;            ///< chords per source unit
    /// Rotation applied to the source, degrees, counter-clockwise positive: +3 means the source's
    /// chord line pointed 3 degrees nose-up (trailing edge low) and was turned level.
    double rotation_deg = 0.0;
    /// What was measured on the source (source units): the trailing-edge centre and the
    /// foremost point (least x), on which the automatic choice decides.
    Vec2 found_trailing_edge{1.0, 0.0};
    Vec2 found_foremost{0.0, 0.0};
};

/// How the trailing edge of the source became the sharp edge a C-grid needs.
struct TrailingEdgeClosure {
    enum class Form { sharp, wedge, fairing };
    Form form = Form::sharp;
    double gap = 0.0;     ///< distance between the surfaces' last points, chords (0: sharp)
    double length = 0.0;  ///< how far the added tip lies behind the trailing-edge centre, chords
    /// Points of the source that described the base itself (a repeated closing point, a closing
    /// segment across the gap) and were set aside before closing.
    int base_points_set_aside = 0;
};

/// A closed section outline with a sharp trailing edge in chord units. Points run from the
/// trailing-edge tip along the lower surface to the nose and back along the upper surface; the tip
/// appears first and last. The chord line runs from (0, 0) to (1, 0); the nose point and, with a
/// blunt source, the added tip may lie a little off it (`frame` says how the source was placed).
struct Section {
    std::string name;
    std::vector<Vec2> points;
    /// Index of the nose point in `points`: where the grid's lower and upper halves meet.
    std::size_t leading_edge = 0;
    /// Source file line of each point; 0 for points veer added (the tip, a refined nose).
    std::vector<int> lines;
    /// How the source was read, e.g. "one closed loop", "two surfaces with a count line"; empty
    /// for a generated section.
    std::string layout;
    SectionFrame frame;
    TrailingEdgeClosure closure;
};

}  // namespace veer
