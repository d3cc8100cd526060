#pragma once
/// A flow frame resampled onto a Cartesian image grid (one sample per pixel centre), for
/// pictures and streamlines: every pixel centre is located in the curvilinear grid by binning
/// the grid's cells (each cell split into two triangles) over the pixels their bounding boxes
/// cover, and interpolated linearly within its triangle from node values (the average of the
/// cells around a node; zero velocity on the wall).
#include <vector>

#include "io/plot_frame.hpp"

namespace veer {

/// The part of the plane a picture shows, in chords.
struct PictureWindow {
    double x0 = -0.6, x1 = 1.9, y0 = -0.6, y1 = 0.6;
};

struct ImageGrid {
    int nx = 0, ny = 0;  ///< pixels; row 0 is the top of the picture (largest y)
    PictureWindow window;
    std::vector<double> u, v, cp;
    std::vector<unsigned char> fluid;  ///< 1 where a grid cell covers the pixel centre
    std::size_t at(int px, int py) const { return static_cast<std::size_t>(py * nx + px); }
    double pixel_size() const { return (window.x1 - window.x0) / nx; }
    double x_of(double px) const { return window.x0 + px * pixel_size(); }
    double y_of(double py) const { return window.y1 - py * pixel_size(); }
};

/// Resamples `frame` onto nx pixels across the window (ny follows from its aspect ratio).
ImageGrid resample_frame(const FlowFrame& frame, const PictureWindow& window, int nx);

/// The wall of a C-grid frame (the j = 0 nodes that are not on the wake cut), in order.
std::vector<std::pair<double, double>> wall_outline(const FlowFrame& frame);

}  // namespace veer
