#pragma once
/// What the user asks of a C-grid (the [mesh] table of a case file).
namespace veer {

/// Default cap on the growth of the surface spacing along the section (|d spacing / d arc
/// length|: neighbouring spacings differ by about 10 %, common practice for a smooth stretching).
inline constexpr double default_surface_slope = 0.1;

struct CGridSpec {
    int around = 256;          ///< cells along the section surface
    int normal = 64;           ///< cells from the wall (and wake cut) to the far field
    int wake = 48;             ///< cells along the wake cut, each side
    double far_field = 40.0;   ///< far-field distance from the section, chords
    double first_cell = 1e-3;  ///< wall-normal height of the first cell, chords
    double max_growth = 1.2;   ///< cap on the wall-normal growth ratio (beyond it: a warning)
    /// Cap on the growth of the surface spacing along the section (surface_sampling.hpp); a grid
    /// study can scale it with the cell size so that its members share one distribution.
    double surface_slope = default_surface_slope;
    /// Cap on the streamwise-to-normal aspect ratio of the first cells over the wake cut: their
    /// height grows from first_cell where the wake cells are that long (wake_spacing.hpp).
    double wake_aspect = 1000.0;
};

}  // namespace veer
