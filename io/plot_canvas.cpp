#include "io/plot_canvas.hpp"

#include <cairo-svg.h>

#include <cmath>
#include <numbers>

#include "io/atomic_file.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {
constexpr const char* font = "sans-serif";
}

Colour series_colour(int index) {
    static const Colour palette[] = {
        {0.12, 0.30, 0.62},  // deep blue
        {0.85, 0.37, 0.05},  // burnt orange
        {0.15, 0.55, 0.30},  // green
        {0.60, 0.15, 0.45},  // plum
        {0.45, 0.45, 0.45},  // grey
        {0.80, 0.65, 0.05},  // ochre
        {0.05, 0.58, 0.62},  // teal (the bubbles' ends: index 6 no longer wraps to blue)
    };
    return palette[static_cast<unsigned>(index) % (sizeof(palette) / sizeof(palette[0]))];
}

PictureFormat format_for(const std::filesystem::path& path) {
    return path.extension() == ".svg" ? PictureFormat::svg : PictureFormat::png;
}

Canvas::Canvas(const std::filesystem::path& path, int width, int height)
    : m_path(path), m_format(format_for(path)), m_width(width), m_height(height) {
    if (m_format == PictureFormat::svg)
        m_surface = cairo_svg_surface_create(temporary_path_for(path).c_str(), width, height);
    else
        m_surface = cairo_image_surface_create(CAIRO_FORMAT_ARGB32, width, height);
    if (cairo_surface_status(m_surface) != CAIRO_STATUS_SUCCESS)
        throw InputError(path.string() + ": cannot start the picture");
    m_cr = cairo_create(m_surface);
    cairo_set_source_rgb(m_cr, 1, 1, 1);
    cairo_paint(m_cr);
}

Canvas::~Canvas() {
    if (m_cr) cairo_destroy(m_cr);
    if (m_surface) cairo_surface_destroy(m_surface);
}

void Canvas::line(double x0, double y0, double x1, double y1, Colour c, double width, bool dashed) {
    const double dash[] = {5.0, 3.0};
    cairo_set_dash(m_cr, dash, dashed ? 2 : 0, 0.0);
    cairo_set_source_rgb(m_cr, c.r, c.g, c.b);
    cairo_set_line_width(m_cr, width);
    cairo_move_to(m_cr, x0, y0);
    cairo_line_to(m_cr, x1, y1);
    cairo_stroke(m_cr);
    cairo_set_dash(m_cr, dash, 0, 0.0);
}

void Canvas::rectangle(double x, double y, double w, double h, Colour stroke, double width) {
    cairo_set_source_rgb(m_cr, stroke.r, stroke.g, stroke.b);
    cairo_set_line_width(m_cr, width);
    cairo_rectangle(m_cr, x, y, w, h);
    cairo_stroke(m_cr);
}

void Canvas::fill_rectangle(double x, double y, double w, double h, Colour fill) {
    cairo_set_source_rgb(m_cr, fill.r, fill.g, fill.b);
    cairo_rectangle(m_cr, x, y, w, h);
    cairo_fill(m_cr);
}

void Canvas::marker(double x, double y, Colour c, double radius) {
    cairo_arc(m_cr, x, y, radius, 0, 2 * std::numbers::pi);
    cairo_set_source_rgb(m_cr, c.r, c.g, c.b);
    cairo_fill_preserve(m_cr);
    cairo_set_source_rgb(m_cr, 1, 1, 1);
    cairo_set_line_width(m_cr, 1.0);
    cairo_stroke(m_cr);
}

double Canvas::text_width(const std::string& s, double size) {
    cairo_select_font_face(m_cr, font, CAIRO_FONT_SLANT_NORMAL, CAIRO_FONT_WEIGHT_NORMAL);
    cairo_set_font_size(m_cr, size);
    cairo_text_extents_t e;
    cairo_text_extents(m_cr, s.c_str(), &e);
    return e.x_advance;
}

void Canvas::text(const std::string& s, double x, double y, double size, TextAnchor anchor,
                  Colour c, bool vertical, bool bold) {
    cairo_select_font_face(m_cr, font, CAIRO_FONT_SLANT_NORMAL,
                           bold ? CAIRO_FONT_WEIGHT_BOLD : CAIRO_FONT_WEIGHT_NORMAL);
    cairo_set_font_size(m_cr, size);
    cairo_text_extents_t e;
    cairo_text_extents(m_cr, s.c_str(), &e);
    const double shift = anchor == TextAnchor::left     ? 0.0
                         : anchor == TextAnchor::centre ? -0.5 * e.x_advance
                                                        : -e.x_advance;
    cairo_save(m_cr);
    cairo_translate(m_cr, x, y);
    if (vertical) cairo_rotate(m_cr, -std::numbers::pi / 2);
    cairo_move_to(m_cr, shift, 0.0);
    cairo_set_source_rgb(m_cr, c.r, c.g, c.b);
    cairo_show_text(m_cr, s.c_str());
    cairo_restore(m_cr);
}

void Canvas::finish() {
    if (m_finished) return;
    m_finished = true;
    const std::filesystem::path tmp = temporary_path_for(m_path);
    cairo_destroy(m_cr);
    m_cr = nullptr;
    if (m_format == PictureFormat::png) {
        if (cairo_surface_write_to_png(m_surface, tmp.c_str()) != CAIRO_STATUS_SUCCESS)
            throw InputError(m_path.string() + ": cannot write the picture");
    } else {
        cairo_surface_finish(m_surface);
        if (cairo_surface_status(m_surface) != CAIRO_STATUS_SUCCESS)
            throw InputError(m_path.string() + ": cannot write the picture");
    }
    cairo_surface_destroy(m_surface);
    m_surface = nullptr;
    commit_temporary(tmp, m_path);
}

}  // namespace veer
