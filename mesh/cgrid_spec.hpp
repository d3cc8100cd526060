#pragma once
/// What the user asks of a C-grid (the [mesh] table of a case file).
namespace veer {

struct CGridSpec {
    int around = 256;          ///< cells along the section surface
    int normal = 64;           ///< cells from the wall (and wake cut) to the far field
    int wake = 48;             ///< cells along the wake cut, each side
    double far_field = 40.0;   ///< far-field distance from the section, chords
    double first_cell = 1e-3;  ///< wall-normal height of the first cell, chords
    double max_growth = 1.2;   ///< cap on the wall-normal growth ratio (beyond it: a warning)
    /// Cap on the streamwise-to-normal aspect ratio of the first cells over the wake cut: their
    /// height grows from first_cell where the wake cells are that long (wake_spacing.hpp).
    double wake_aspect = 1000.0;
};

}  // namespace veer
