#pragma once
/// Line charts for veer's reports: axes with ticks and labels, lines and markers, a legend, and
/// marked abscissae (e.g. the separation-onset and stall angles on a polar). Written as PNG or
/// SVG (by the file name) with cairo; no OpenGL and no display needed.
#include <filesystem>
#include <string>
#include <vector>

#include "io/plot_canvas.hpp"

namespace veer {

/// One curve. Non-finite points break the line (they are not drawn).
struct ChartSeries {
    std::string label;  ///< legend entry; empty: not listed
    std::vector<double> x, y;
    bool line = true;
    bool markers = true;
    bool dashed = false;
    int colour = -1;  ///< palette index (series_colour); -1: the series' position
};

/// Error bars of one series (Chart::series[series]): half-lengths along y (and x) at each of
/// its points, drawn as whiskers with end caps in the series' colour; empty for none, a
/// non-finite or zero entry for none at that point.
struct ChartErrorBars {
    std::size_t series = 0;
    std::vector<double> y_error, x_error;
};

/// A vertical line at an abscissa, labelled at the top of the plot.
struct ChartMark {
    double x = 0.0;
    std::string label;
};

enum class AxisScale { linear, logarithmic };

struct Chart {
    std::string title;
    std::string x_label, y_label;
    std::vector<ChartSeries> series;
    std::vector<ChartMark> marks;
    std::vector<ChartErrorBars> error_bars;
    AxisScale y_scale = AxisScale::linear;
    bool y_reversed = false;    ///< e.g. Cp, negative upwards
    bool equal_aspect = false;  ///< one unit on x as long as one on y (section outlines)
    bool x_from_zero = false;   ///< x is a count or a time: the axis never starts below 0
};

/// Draws `chart` into `path` (.png or .svg), `width` x `height` pixels. Throws InputError naming
/// the file when it cannot be written.
void write_chart(const Chart& chart, const std::filesystem::path& path, int width = 720,
                 int height = 480);

}  // namespace veer
