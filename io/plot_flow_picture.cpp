#include "io/plot_flow_picture.hpp"

#include <algorithm>
#include <cmath>
#include <cstdint>

#include "io/plot_canvas.hpp"
#include "io/plot_streamlines.hpp"
#include "io/plot_ticks.hpp"

namespace veer {
namespace {

constexpr int margin_top = 36, margin_left = 12, bar_width = 96, margin_bottom = 12;

/// Our sequential map: deep navy through teal to pale yellow (monotonic in lightness).
Colour field_colour(double f) {
    static const Colour stops[] = {{0.08, 0.10, 0.30},
                                   {0.10, 0.30, 0.58},
                                   {0.12, 0.55, 0.62},
                                   {0.45, 0.75, 0.50},
                                   {0.98, 0.93, 0.60}};
    f = std::clamp(f, 0.0, 1.0) * 4.0;
    const int k = std::min(static_cast<int>(f), 3);
    const double w = f - k;
    const Colour& a = stops[k];
    const Colour& b = stops[k + 1];
    return {a.r + w * (b.r - a.r), a.g + w * (b.g - a.g), a.b + w * (b.b - a.b)};
}

struct Scale {
    double lo, hi;
    double fraction(double v) const { return (v - lo) / (hi - lo); }
};

double background_value(const ImageGrid& g, std::size_t k, FlowBackground b) {
    return b == FlowBackground::speed ? std::hypot(g.u[k], g.v[k]) : g.cp[k];
}

Scale value_scale(const ImageGrid& g, FlowBackground b) {
    std::vector<double> v;
    for (std::size_t k = 0; k < g.u.size(); ++k)
        if (g.fluid[k]) v.push_back(background_value(g, k, b));
    if (v.empty()) return {0.0, 1.0};
    std::sort(v.begin(), v.end());
    // The 0.5 % tails are clipped so a suction peak does not wash out the rest of the field.
    const double lo = v[v.size() / 200], hi = v[v.size() - 1 - v.size() / 200];
    return {b == FlowBackground::speed ? 0.0 : lo, hi > lo ? hi : lo + 1.0};
}

void paint_field(Canvas& cv, const ImageGrid& g, FlowBackground b, const Scale& s) {
    cairo_surface_t* img = cairo_image_surface_create(CAIRO_FORMAT_RGB24, g.nx, g.ny);
    cairo_surface_flush(img);
    unsigned char* data = cairo_image_surface_get_data(img);
    const int stride = cairo_image_surface_get_stride(img);
    for (int j = 0; j < g.ny; ++j)
        for (int i = 0; i < g.nx; ++i) {
            const std::size_t k = g.at(i, j);
            const Colour c = g.fluid[k] ? field_colour(s.fraction(background_value(g, k, b)))
                                        : Colour{0.85, 0.85, 0.85};
            auto* px =
                reinterpret_cast<std::uint32_t*>(data + static_cast<std::ptrdiff_t>(j) * stride) +
                i;
            *px = (static_cast<std::uint32_t>(c.r * 255) << 16) |
                  (static_cast<std::uint32_t>(c.g * 255) << 8) |
                  static_cast<std::uint32_t>(c.b * 255);
        }
    cairo_surface_mark_dirty(img);
    cairo_set_source_surface(cv.context(), img, margin_left, margin_top);
    cairo_paint(cv.context());
    cairo_surface_destroy(img);
}

void draw_streamlines(Canvas& cv, const ImageGrid& g) {
    cairo_t* cr = cv.context();
    cairo_save(cr);
    cairo_translate(cr, margin_left, margin_top);
    cairo_set_source_rgba(cr, 1, 1, 1, 0.85);
    cairo_set_line_width(cr, 0.9);
    for (const Streamline& s : trace_streamlines(g)) {
        cairo_move_to(cr, s.x[0], s.y[0]);
        for (std::size_t k = 1; k < s.x.size(); ++k) cairo_line_to(cr, s.x[k], s.y[k]);
        cairo_stroke(cr);
        // An arrowhead halfway along shows the direction of the flow.
        const std::size_t m = s.x.size() / 2;
        if (m < 2) continue;
        const double dx = s.x[m] - s.x[m - 2], dy = s.y[m] - s.y[m - 2];
        const double l = std::hypot(dx, dy);
        if (l <= 0) continue;
        const double ux = dx / l, uy = dy / l;
        cairo_move_to(cr, s.x[m] + 4 * ux, s.y[m] + 4 * uy);
        cairo_line_to(cr, s.x[m] - 3 * ux + 2.5 * uy, s.y[m] - 3 * uy - 2.5 * ux);
        cairo_line_to(cr, s.x[m] - 3 * ux - 2.5 * uy, s.y[m] - 3 * uy + 2.5 * ux);
        cairo_close_path(cr);
        cairo_fill(cr);
    }
    cairo_restore(cr);
}

void draw_section(Canvas& cv, const FlowFrame& f, const ImageGrid& g) {
    const auto outline = wall_outline(f);
    if (outline.size() < 3) return;
    cairo_t* cr = cv.context();
    const double h = g.pixel_size();
    cairo_save(cr);
    cairo_translate(cr, margin_left, margin_top);
    for (std::size_t k = 0; k < outline.size(); ++k) {
        const double x = (outline[k].first - g.window.x0) / h;
        const double y = (g.window.y1 - outline[k].second) / h;
        k == 0 ? cairo_move_to(cr, x, y) : cairo_line_to(cr, x, y);
    }
    cairo_close_path(cr);
    cairo_set_source_rgb(cr, 0.25, 0.25, 0.25);
    cairo_fill_preserve(cr);
    cairo_set_source_rgb(cr, 0, 0, 0);
    cairo_set_line_width(cr, 1.0);
    cairo_stroke(cr);
    cairo_restore(cr);
}

void draw_colour_bar(Canvas& cv, const ImageGrid& g, const Scale& s, const std::string& name) {
    const double x = margin_left + g.nx + 18, top = margin_top + 10, height = g.ny - 20.0;
    for (int k = 0; k < static_cast<int>(height); ++k)
        cv.fill_rectangle(x, top + height - k - 1, 18, 1.0, field_colour(k / height));
    cv.rectangle(x, top, 18, height, {0.2, 0.2, 0.2});
    const AxisTicks t = nice_ticks(s.lo, s.hi, 5);
    for (double v : t.values) {
        if (v < s.lo || v > s.hi) continue;
        const double y = top + height * (1 - s.fraction(v));
        cv.line(x + 18, y, x + 22, y, {0.2, 0.2, 0.2});
        cv.text(tick_label(v, t.step), x + 25, y + 4, 11, TextAnchor::left);
    }
    cv.text(name, x, top - 4, 12, TextAnchor::left);
}

}  // namespace

void write_flow_picture(const FlowFrame& frame, const std::filesystem::path& path,
                        const FlowPictureOptions& o) {
    const ImageGrid g = resample_frame(frame, o.window, o.width);
    Canvas cv(path, margin_left + g.nx + bar_width, margin_top + g.ny + margin_bottom);
    const Scale s = value_scale(g, o.background);
    paint_field(cv, g, o.background, s);
    draw_streamlines(cv, g);
    draw_section(cv, frame, g);
    draw_colour_bar(cv, g, s, o.background == FlowBackground::speed ? "|u| / U" : "Cp");
    cv.text(o.title, margin_left, 24, 14, TextAnchor::left, {}, false, true);
    cv.finish();
}

}  // namespace veer
