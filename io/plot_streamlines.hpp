#pragma once
/// Evenly spaced streamlines on an image grid, after the seeding-and-stopping idea of Jobard &
/// Lefer (1997, "Creating evenly-spaced streamlines of arbitrary density", Visualization in
/// Scientific Computing): seeds first along the upstream edge, then on a regular lattice; each
/// line is traced both ways with fixed-length midpoint steps along the normalised velocity and
/// stops where it leaves the fluid, comes closer than a set distance to another line, stalls,
/// or closes on itself.
#include <vector>

#include "io/plot_image_grid.hpp"

namespace veer {

/// A streamline in pixel coordinates (x right, y down), in the flow direction.
struct Streamline {
    std::vector<double> x, y;
};

struct StreamlineSpacing {
    double separation = 14.0;  ///< pixels between seeds and between neighbouring lines
    double closest = 0.5;      ///< a line stops at this fraction of `separation` from another
    double step = 0.5;         ///< pixels per integration step
    double shortest = 10.0;    ///< lines shorter than this (pixels) are dropped
};

std::vector<Streamline> trace_streamlines(const ImageGrid& grid, const StreamlineSpacing& s = {});

}  // namespace veer
