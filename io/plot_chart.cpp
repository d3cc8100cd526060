#include "io/plot_chart.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

#include "io/plot_ticks.hpp"

namespace veer {
namespace {

constexpr Colour ink{0.15, 0.15, 0.15};
constexpr Colour grid_ink{0.88, 0.88, 0.88};
constexpr Colour mark_ink{0.55, 0.10, 0.10};

struct Frame {
    double left, top, width, height;  // plot area in pixels
    AxisTicks x, y;
    bool log_y, reversed;
    double px(double v) const { return left + (v - x.lo) / (x.hi - x.lo) * width; }
    double py(double v) const {
        const double f =
            log_y ? (std::log10(v) - std::log10(y.lo)) / (std::log10(y.hi) - std::log10(y.lo))
                  : (v - y.lo) / (y.hi - y.lo);
        return reversed ? top + f * height : top + (1 - f) * height;
    }
};

/// The error bar's half-length at point k along one axis; 0 when there is none.
double error_at(const std::vector<double>& error, std::size_t k) {
    return k < error.size() && std::isfinite(error[k]) ? std::abs(error[k]) : 0.0;
}

/// The error bars of series `n` of a chart, or none.
const ChartErrorBars* bars_of(const Chart& c, std::size_t n) {
    for (const ChartErrorBars& b : c.error_bars)
        if (b.series == n) return &b;
    return nullptr;
}

void data_range(const Chart& c, bool along_x, double& lo, double& hi) {
    lo = std::numeric_limits<double>::infinity();
    hi = -lo;
    static const std::vector<double> none;
    for (std::size_t n = 0; n < c.series.size(); ++n) {
        const ChartSeries& s = c.series[n];
        const ChartErrorBars* bars = bars_of(c, n);
        const std::vector<double>& error = bars ? (along_x ? bars->x_error : bars->y_error) : none;
        for (std::size_t k = 0; k < s.x.size() && k < s.y.size(); ++k) {
            const double v = along_x ? s.x[k] : s.y[k];
            if (!std::isfinite(s.x[k]) || !std::isfinite(s.y[k])) continue;
            if (!along_x && c.y_scale == AxisScale::logarithmic && v <= 0) continue;
            const double e = error_at(error, k);
            const bool log_axis = !along_x && c.y_scale == AxisScale::logarithmic;
            lo = std::min(lo, log_axis && v - e <= 0 ? v : v - e), hi = std::max(hi, v + e);
        }
    }
    if (along_x)
        for (const ChartMark& m : c.marks) lo = std::min(lo, m.x), hi = std::max(hi, m.x);
}

Frame make_frame(const Chart& c, int width, int height) {
    Frame f{};
    f.left = 72, f.top = c.title.empty() ? 24 : 44;
    f.width = width - f.left - 24, f.height = height - f.top - 56;
    double x0, x1, y0, y1;
    data_range(c, true, x0, x1);
    data_range(c, false, y0, y1);
    f.log_y = c.y_scale == AxisScale::logarithmic;
    f.reversed = c.y_reversed;
    if (c.equal_aspect && std::isfinite(x0) && std::isfinite(y0)) {
        // Widen the shorter extent so one unit spans the same pixels both ways.
        const double per_px = std::max((x1 - x0) / f.width, (y1 - y0) / f.height) * 1.1;
        const double xc = 0.5 * (x0 + x1), yc = 0.5 * (y0 + y1);
        x0 = xc - 0.5 * per_px * f.width, x1 = xc + 0.5 * per_px * f.width;
        y0 = yc - 0.5 * per_px * f.height, y1 = yc + 0.5 * per_px * f.height;
    }
    // A margin of 4 % keeps markers at the extremes clear of the frame.
    auto pad = [](double& lo, double& hi) {
        if (!std::isfinite(lo) || !std::isfinite(hi)) return;
        const double m = 0.04 * (hi - lo);
        lo -= m, hi += m;
    };
    if (!c.equal_aspect) {
        pad(x0, x1);
        if (!f.log_y) pad(y0, y1);
        if (c.x_from_zero && x0 < 0.0) x0 = 0.0;  // no iteration -100 on a history axis
    }
    f.x = nice_ticks(x0, x1);
    f.y = f.log_y ? decade_ticks(y0, y1) : nice_ticks(y0, y1);
    if (c.equal_aspect) {
        f.x.lo = x0, f.x.hi = x1, f.y.lo = y0, f.y.hi = y1;
        auto inside = [](AxisTicks& t) {
            std::erase_if(t.values, [&](double v) { return v < t.lo || v > t.hi; });
        };
        inside(f.x), inside(f.y);
    }
    return f;
}

void draw_axes(Canvas& cv, const Chart& c, const Frame& f) {
    for (double v : f.x.values) {
        cv.line(f.px(v), f.top, f.px(v), f.top + f.height, grid_ink);
        cv.text(tick_label(v, f.x.step), f.px(v), f.top + f.height + 16, 11, TextAnchor::centre,
                ink);
    }
    for (double v : f.y.values) {
        cv.line(f.left, f.py(v), f.left + f.width, f.py(v), grid_ink);
        const std::string label = f.log_y ? tick_label(v, v) : tick_label(v, f.y.step);
        cv.text(label, f.left - 6, f.py(v) + 4, 11, TextAnchor::right, ink);
    }
    cv.rectangle(f.left, f.top, f.width, f.height, ink);
    cv.text(c.x_label, f.left + 0.5 * f.width, f.top + f.height + 40, 13, TextAnchor::centre, ink);
    cv.text(c.y_label, 18, f.top + 0.5 * f.height, 13, TextAnchor::centre, ink, true);
    if (!c.title.empty())
        cv.text(c.title, f.left + 0.5 * f.width, 26, 15, TextAnchor::centre, ink, false, true);
}

/// Whiskers with end caps of 4 px; on a logarithmic axis the lower end stays above zero.
void draw_error_bars(Canvas& cv, const ChartSeries& s, const ChartErrorBars& bars, Colour col,
                     const Frame& f) {
    constexpr double cap = 4.0;
    for (std::size_t k = 0; k < s.x.size() && k < s.y.size(); ++k) {
        if (!std::isfinite(s.x[k]) || !std::isfinite(s.y[k])) continue;
        const double px = f.px(s.x[k]), py = f.py(s.y[k]);
        if (const double e = error_at(bars.y_error, k); e > 0.0) {
            const double lower = f.log_y && s.y[k] - e <= 0 ? s.y[k] : s.y[k] - e;
            const double y0 = f.py(lower), y1 = f.py(s.y[k] + e);
            cv.line(px, y0, px, y1, col, 1.2);
            cv.line(px - cap, y0, px + cap, y0, col, 1.2);
            cv.line(px - cap, y1, px + cap, y1, col, 1.2);
        }
        if (const double e = error_at(bars.x_error, k); e > 0.0) {
            const double x0 = f.px(s.x[k] - e), x1 = f.px(s.x[k] + e);
            cv.line(x0, py, x1, py, col, 1.2);
            cv.line(x0, py - cap, x0, py + cap, col, 1.2);
            cv.line(x1, py - cap, x1, py + cap, col, 1.2);
        }
    }
}

void draw_series(Canvas& cv, const ChartSeries& s, const ChartErrorBars* bars, Colour col,
                 const Frame& f) {
    cairo_t* cr = cv.context();
    cairo_save(cr);
    cairo_rectangle(cr, f.left, f.top, f.width, f.height);
    cairo_clip(cr);
    auto ok = [&](std::size_t k) {
        return std::isfinite(s.x[k]) && std::isfinite(s.y[k]) && (!f.log_y || s.y[k] > 0);
    };
    const std::size_t n = std::min(s.x.size(), s.y.size());
    if (s.line) {
        const double dash[] = {6.0, 4.0};
        cairo_set_dash(cr, dash, s.dashed ? 2 : 0, 0.0);
        cairo_set_source_rgb(cr, col.r, col.g, col.b);
        cairo_set_line_width(cr, 1.8);
        cairo_set_line_join(cr, CAIRO_LINE_JOIN_ROUND);
        bool pen_down = false;
        for (std::size_t k = 0; k < n; ++k) {
            if (!ok(k)) {
                pen_down = false;
                continue;
            }
            if (pen_down)
                cairo_line_to(cr, f.px(s.x[k]), f.py(s.y[k]));
            else
                cairo_move_to(cr, f.px(s.x[k]), f.py(s.y[k]));
            pen_down = true;
        }
        cairo_stroke(cr);
        cairo_set_dash(cr, dash, 0, 0.0);
    }
    if (bars) draw_error_bars(cv, s, *bars, col, f);
    if (s.markers)
        for (std::size_t k = 0; k < n; ++k)
            if (ok(k)) cv.marker(f.px(s.x[k]), f.py(s.y[k]), col);
    cairo_restore(cr);
}

void draw_legend(Canvas& cv, const Chart& c, const Frame& f) {
    double widest = 0;
    int entries = 0;
    for (const ChartSeries& s : c.series)
        if (!s.label.empty()) widest = std::max(widest, cv.text_width(s.label, 11)), ++entries;
    if (entries == 0) return;
    const double w = widest + 44, h = 18.0 * entries + 8;
    // The corner whose box covers the fewest data points.
    double x = f.left + f.width - w - 8, y = f.top + 8;
    int fewest = -1;
    for (const auto& [cx, cy] :
         {std::pair{f.left + f.width - w - 8, f.top + 8}, std::pair{f.left + 8, f.top + 8},
          std::pair{f.left + f.width - w - 8, f.top + f.height - h - 8},
          std::pair{f.left + 8, f.top + f.height - h - 8}}) {
        int covered = 0;
        for (const ChartSeries& s : c.series)
            for (std::size_t k = 0; k < std::min(s.x.size(), s.y.size()); ++k) {
                if (!std::isfinite(s.x[k]) || !std::isfinite(s.y[k])) continue;
                if (f.log_y && s.y[k] <= 0) continue;
                const double px = f.px(s.x[k]), py = f.py(s.y[k]);
                covered += px >= cx - 4 && px <= cx + w + 4 && py >= cy - 4 && py <= cy + h + 4;
            }
        if (fewest < 0 || covered < fewest) fewest = covered, x = cx, y = cy;
    }
    cv.fill_rectangle(x, y, w, h, {1, 1, 1});
    cv.rectangle(x, y, w, h, grid_ink);
    int row = 0;
    for (std::size_t k = 0; k < c.series.size(); ++k) {
        const ChartSeries& s = c.series[k];
        if (s.label.empty()) continue;
        const Colour col = series_colour(s.colour >= 0 ? s.colour : static_cast<int>(k));
        const double yy = y + 14 + 18.0 * row++;
        if (s.line) cv.line(x + 6, yy - 4, x + 30, yy - 4, col, 1.8, s.dashed);
        if (s.markers) cv.marker(x + 18, yy - 4, col);
        cv.text(s.label, x + 36, yy, 11, TextAnchor::left, ink);
    }
}

/// Mark labels last, on white, along the bottom of the plot (the legend keeps the top): those on
/// the right half read leftwards, and each mark has its own row.
void draw_mark_labels(Canvas& cv, const Chart& c, const Frame& f) {
    for (std::size_t k = 0; k < c.marks.size(); ++k) {
        const ChartMark& m = c.marks[k];
        const double x = f.px(m.x), y = f.top + f.height - 10 - 16.0 * static_cast<double>(k);
        const bool right_half = x > f.left + 0.5 * f.width;
        const double w = cv.text_width(m.label, 11) + 6;
        cv.fill_rectangle(right_half ? x - 2 - w : x + 2, y - 11, w, 15, {1, 1, 1});
        cv.text(m.label, right_half ? x - 5 : x + 5, y, 11,
                right_half ? TextAnchor::right : TextAnchor::left, mark_ink);
    }
}

}  // namespace

void write_chart(const Chart& chart, const std::filesystem::path& path, int width, int height) {
    Canvas cv(path, width, height);
    const Frame f = make_frame(chart, width, height);
    draw_axes(cv, chart, f);
    for (const ChartMark& m : chart.marks)
        cv.line(f.px(m.x), f.top, f.px(m.x), f.top + f.height, mark_ink, 1.2, true);
    for (std::size_t k = 0; k < chart.series.size(); ++k) {
        const ChartSeries& s = chart.series[k];
        draw_series(cv, s, bars_of(chart, k),
                    series_colour(s.colour >= 0 ? s.colour : static_cast<int>(k)), f);
    }
    draw_legend(cv, chart, f);
    draw_mark_labels(cv, chart, f);
    cv.finish();
}

}  // namespace veer
