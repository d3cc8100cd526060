#pragma once
/// A drawing surface for veer's pictures (cairo): a PNG image or an SVG file of a given size in
/// pixels, with the few drawing calls the charts and flow pictures need. y grows downwards.
#include <cairo.h>

#include <filesystem>
#include <string>

namespace veer {

/// An RGB colour, components 0..1.
struct Colour {
    double r = 0.0, g = 0.0, b = 0.0;
};

/// The colours of lines in a chart, in order (our own palette, distinguishable in grey too).
Colour series_colour(int index);

enum class PictureFormat { png, svg };

/// The format a file name asks for (".svg" gives SVG, anything else PNG).
PictureFormat format_for(const std::filesystem::path& path);

enum class TextAnchor { left, centre, right };

class Canvas {
public:
    /// A white canvas; the picture is written to `path` by finish().
    Canvas(const std::filesystem::path& path, int width, int height);
    ~Canvas();
    Canvas(const Canvas&) = delete;
    Canvas& operator=(const Canvas&) = delete;

    int width() const { return m_width; }
    int height() const { return m_height; }
    cairo_t* context() { return m_cr; }

    void line(double x0, double y0, double x1, double y1, Colour c, double width = 1.0,
              bool dashed = false);
    void rectangle(double x, double y, double w, double h, Colour stroke, double width = 1.0);
    void fill_rectangle(double x, double y, double w, double h, Colour fill);
    /// A marker (a filled circle with a white rim) centred on (x, y).
    void marker(double x, double y, Colour c, double radius = 3.5);
    /// Text whose baseline starts, centres or ends at (x, y); `vertical` turns it a quarter left.
    void text(const std::string& s, double x, double y, double size, TextAnchor anchor,
              Colour c = {}, bool vertical = false, bool bold = false);
    double text_width(const std::string& s, double size);

    /// Writes the picture (PNG through a temporary file; SVG when the surface closes). Throws
    /// InputError naming the file when it cannot be written.
    void finish();

private:
    std::filesystem::path m_path;
    PictureFormat m_format;
    int m_width, m_height;
    cairo_surface_t* m_surface = nullptr;
    cairo_t* m_cr = nullptr;
    bool m_finished = false;
};

}  // namespace veer
