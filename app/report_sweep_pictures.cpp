// The pictures of a sweep: the polars with the separation-onset and stall angles marked, and the
// Cp and Cf of every point on one chart each.
#include <fmt/format.h>

#include <algorithm>
#include <cmath>

#include "app/reader_labels.hpp"
#include "app/report_csv.hpp"
#include "app/report_pictures.hpp"
#include "app/report_transition.hpp"
#include "io/plot_chart.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

std::vector<ChartMark> polar_marks(const PolarFigures& f) {
    std::vector<ChartMark> marks;
    if (f.alpha_separation_onset)
        marks.push_back({*f.alpha_separation_onset,
                         fmt::format("separation onset {:g}°", *f.alpha_separation_onset)});
    // Cl max is marked as the stall angle only when Cl falls again beyond it; otherwise the
    // largest Cl is only the end of the range swept.
    // A bracketed maximum carries the ± its angle spacing leaves (app/stall_search.hpp).
    const std::string spread = f.stall && f.stall->alpha_uncertainty
                                   ? fmt::format(" ± {:g}°", *f.stall->alpha_uncertainty)
                                   : std::string();
    if (f.alpha_cl_max)
        marks.push_back(
            {*f.alpha_cl_max,
             f.stall_in_range
                 ? fmt::format("stall, Cl max {:g}°{}", *f.alpha_cl_max, spread)
                 : fmt::format("largest Cl swept {:g}° (no stall in range)", *f.alpha_cl_max)});
    return marks;
}

/// The error band of a figure from the sweep's coarser grids (--error-bars); NaN: none.
double grid_band(const PointRecord& r, double PointRecord::*figure) {
    const auto& e = figure == &PointRecord::cl   ? r.cl_grid
                    : figure == &PointRecord::cd ? r.cd_grid
                                                 : std::optional<FigureGridError>();
    return e ? e->band : std::nan("");
}

/// Steady points joined by a line, unsteady (time-averaged) ones as markers on their own.
std::vector<ChartSeries> regime_series(const std::vector<PointRecord>& p, double PointRecord::*x,
                                       double PointRecord::*y, const std::string& quantity) {
    ChartSeries steady{quantity + ", surface: steady points", {}, {}, true, true, false, 0};
    ChartSeries unsteady{
        quantity + ", surface: time mean of unsteady points", {}, {}, false, true, false, 1};
    for (const PointRecord& r : p) {
        ChartSeries& s = r.regime == "unsteady" ? unsteady : steady;
        s.x.push_back(r.*x), s.y.push_back(r.*y);
    }
    std::vector<ChartSeries> out = {steady};
    if (!unsteady.x.empty()) out.push_back(unsteady);
    return out;
}

/// Error bars on the regime series (the first one or two of the chart) where the sweep ran its
/// coarser grids (--error-bars): ± the grid error band of Cl and Cd.
void add_grid_error_bars(Chart& c, const std::vector<PointRecord>& p, double PointRecord::*x,
                         double PointRecord::*y) {
    ChartErrorBars steady{0, {}, {}}, unsteady{1, {}, {}};
    bool any = false;
    for (const PointRecord& r : p) {
        ChartErrorBars& b = r.regime == "unsteady" ? unsteady : steady;
        b.x_error.push_back(grid_band(r, x)), b.y_error.push_back(grid_band(r, y));
        any = any || std::isfinite(b.x_error.back()) || std::isfinite(b.y_error.back());
    }
    if (!any) return;
    c.error_bars = {steady};
    if (c.series.size() > 1 && !unsteady.y_error.empty()) c.error_bars.push_back(unsteady);
    for (std::size_t k = 0; k < c.error_bars.size(); ++k)
        c.series[k].label += " (bars: grid error band)";
}

void draw_polar(const std::vector<PointRecord>& p, const PolarFigures& f, const fs::path& file,
                double PointRecord::*x, double PointRecord::*y, const std::string& x_label,
                const std::string& y_label, bool marks) {
    Chart c;
    c.title = y_label + " against " + x_label;
    c.x_label = x_label;
    c.y_label = y_label;
    c.series = regime_series(p, x, y, y_label);
    add_grid_error_bars(c, p, x, y);
    if (marks) c.marks = polar_marks(f);
    if (y == &PointRecord::cl && x == &PointRecord::alpha) {
        ChartSeries momentum{"Cl, control volume", {}, {}, false, true, false, 2};
        for (const PointRecord& r : p) {
            if (r.cl_momentum) momentum.x.push_back(r.alpha), momentum.y.push_back(*r.cl_momentum);
            if (r.contour_distance)
                momentum.label = "Cl, " + control_volume_label(*r.contour_distance, false);
        }
        if (!momentum.x.empty()) c.series.push_back(momentum);
        if (f.linear) {
            const double a0 = f.linear->alpha_min, a1 = f.linear->alpha_max;
            c.series.push_back({fmt::format("linear fit {:.4f}/deg", f.linear->slope_per_deg),
                                {a0, a1},
                                {f.linear->intercept + f.linear->slope_per_deg * a0,
                                 f.linear->intercept + f.linear->slope_per_deg * a1},
                                true,
                                false,
                                true,
                                4});
        }
    }
    write_chart(c, file);
}

/// One curve per point (upper surface solid, lower dashed) from each point's surface.csv.
void draw_all_surfaces(const fs::path& sweep_dir, const std::vector<PointRecord>& p,
                       const fs::path& file, bool pressure) {
    Chart c;
    c.title = pressure ? "Cp at each angle (upper solid, lower dashed)"
                       : "Cf at each angle (upper solid, lower dashed)";
    c.x_label = "x / c";
    c.y_label = pressure ? "Cp" : "Cf";
    c.y_reversed = pressure;
    int drawn = 0;
    for (const PointRecord& r : p) {
        const fs::path surface = sweep_dir / r.folder / r.final_run / "surface.csv";
        std::error_code ec;
        if (!fs::exists(surface, ec)) continue;
        const CsvTable t = CsvTable::read(surface);
        const std::string xs = t.has("x_c") ? "x_c" : "x/c";
        const std::string vs = pressure ? (t.has("cp") ? "cp" : "Cp") : (t.has("cf") ? "cf" : "Cf");
        const std::vector<double> x = t.numbers(xs), v = t.numbers(vs);
        const std::vector<std::string> side = t.text("side");
        for (const char* which : {"upper", "lower"}) {
            ChartSeries s;
            s.label = std::string(which) == "upper" ? fmt::format("{:g}°", r.alpha) : "";
            s.markers = false;
            s.dashed = std::string(which) == "lower";
            s.colour = drawn;
            for (std::size_t k = 0; k < x.size(); ++k)
                if (side[k] == which) s.x.push_back(x[k]), s.y.push_back(v[k]);
            c.series.push_back(s);
        }
        ++drawn;
    }
    if (drawn == 0) throw InputError("no point has a surface.csv yet");
    write_chart(c, file, 760, 520);
}

}  // namespace

PictureSet draw_sweep_pictures(const fs::path& sweep_dir, const std::vector<PointRecord>& points,
                               const PolarFigures& f) {
    fs::create_directories(sweep_dir / "pictures");
    std::vector<PointRecord> p;
    for (const PointRecord& r : points)
        if (r.regime != "failed" && std::isfinite(r.cl)) p.push_back(r);
    std::sort(p.begin(), p.end(), [](const auto& a, const auto& b) { return a.alpha < b.alpha; });
    PictureSet set;
    auto add = [&](const std::string& name, const std::string& caption, auto draw) {
        try {
            draw(sweep_dir / "pictures" / name);
            set.pictures.push_back({"pictures/" + name, caption});
        } catch (const InputError& e) {
            set.skipped.push_back(caption + ": " + e.what());
        }
    };
    add("polar_cl_alpha.png", "Lift against angle of attack", [&](const fs::path& file) {
        draw_polar(p, f, file, &PointRecord::alpha, &PointRecord::cl, "alpha (deg)", "Cl", true);
    });
    add("polar_cl_cd.png", "Lift against drag", [&](const fs::path& file) {
        draw_polar(p, f, file, &PointRecord::cd, &PointRecord::cl, "Cd", "Cl", false);
    });
    add("polar_cm_alpha.png", "Quarter-chord moment against angle of attack",
        [&](const fs::path& file) {
            draw_polar(p, f, file, &PointRecord::alpha, &PointRecord::cm, "alpha (deg)",
                       "Cm (quarter chord, nose-up +)", true);
        });
    add("sweep_cp.png", "Cp at each angle (final fields of each point)",
        [&](const fs::path& file) { draw_all_surfaces(sweep_dir, p, file, true); });
    add("sweep_cf.png", "Cf at each angle (final fields of each point)",
        [&](const fs::path& file) { draw_all_surfaces(sweep_dir, p, file, false); });
    if (std::any_of(p.begin(), p.end(),
                    [](const PointRecord& r) { return r.transition_upper || r.transition_lower; }))
        add("sweep_transition.png",
            "Transition positions and laminar bubbles against angle of attack",
            [&](const fs::path& file) { draw_transition_positions(p, f, file); });
    return set;
}

}  // namespace veer
