#pragma once
/// The flow near the section as one picture: a speed (or Cp) field in colour, evenly spaced
/// streamlines over it, the section drawn solid, and a colour bar.
#include <filesystem>
#include <string>

#include "io/plot_frame.hpp"
#include "io/plot_image_grid.hpp"

namespace veer {

enum class FlowBackground { speed, pressure_coefficient };

struct FlowPictureOptions {
    PictureWindow window;
    int width = 960;  ///< pixels of the field (the colour bar adds to it)
    FlowBackground background = FlowBackground::speed;
    std::string title;
};

/// Draws the picture of `frame` into `path` (.png or .svg). Throws InputError naming the file
/// when it cannot be written.
void write_flow_picture(const FlowFrame& frame, const std::filesystem::path& path,
                        const FlowPictureOptions& options = {});

}  // namespace veer
