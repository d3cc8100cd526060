// The pictures of one run: convergence history, Cp and Cf along the section, the flow near it.
#include <fmt/format.h>

#include <algorithm>
#include <cmath>

#include "app/report_csv.hpp"
#include "app/report_pictures.hpp"
#include "app/report_transition.hpp"
#include "io/plot_chart.hpp"
#include "io/plot_flow_picture.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

/// The first of `names` the table has (the surface table's columns have had two spellings).
std::string column_of(const CsvTable& t, std::initializer_list<const char*> names) {
    for (const char* n : names)
        if (t.has(n)) return n;
    return *names.begin();
}

ChartSeries side_series(const CsvTable& t, const std::string& side, const std::string& value,
                        const std::string& label, int colour) {
    const std::vector<double> x = t.numbers(column_of(t, {"x_c", "x/c", "x"}));
    const std::vector<double> y = t.numbers(value);
    const std::vector<std::string> s = t.text("side");
    ChartSeries c;
    c.label = label;
    c.markers = false;
    c.colour = colour;
    for (std::size_t k = 0; k < x.size(); ++k)
        if (s[k] == side) c.x.push_back(x[k]), c.y.push_back(y[k]);
    return c;
}

/// A steady history has time 0 throughout and is drawn against the iteration.
bool steady_history(const CsvTable& t) {
    if (t.rows() == 0) throw InputError("the history has no rows yet");
    return t.numbers("time").back() == 0.0;
}

void draw_convergence(const fs::path& history, const fs::path& file, const std::string& title) {
    const CsvTable t = CsvTable::read(history);
    const bool steady = steady_history(t);
    const std::vector<double> x = steady ? t.numbers("step") : t.numbers("time");
    Chart c;
    c.title = title + ": residuals";
    c.x_label = steady ? "iteration" : "time (chords / U)";
    c.x_from_zero = true;
    c.y_label = "RMS residual";
    c.y_scale = AxisScale::logarithmic;
    c.series = {{"u momentum", x, t.numbers("residual_u"), true, false, false, 0},
                {"v momentum", x, t.numbers("residual_v"), true, false, false, 1},
                {"continuity", x, t.numbers("residual_continuity"), true, false, false, 2}};
    // Then the model's variables, one column each after Cm (io/history_file.hpp).
    const std::vector<std::string>& names = t.names();
    const auto cm = std::find(names.begin(), names.end(), "cm");
    int colour = 3;
    for (auto n = cm == names.end() ? cm : cm + 1; n != names.end(); ++n)
        if (n->starts_with("residual_"))
            c.series.push_back({n->substr(9), x, t.numbers(*n), true, false, false, colour++});
    write_chart(c, file);
}

void draw_lift_history(const fs::path& history, const fs::path& file, const std::string& title) {
    const CsvTable t = CsvTable::read(history);
    const bool steady = steady_history(t);
    const std::vector<double> x = steady ? t.numbers("step") : t.numbers("time");
    Chart c;
    c.title = title + ": forces";
    c.x_label = steady ? "iteration" : "time (chords / U)";
    c.x_from_zero = true;
    c.y_label = "coefficient";
    c.series = {{"Cl", x, t.numbers("cl"), true, false, false, 0},
                {"Cd", x, t.numbers("cd"), true, false, false, 1},
                {"Cm", x, t.numbers("cm"), true, false, false, 2}};
    write_chart(c, file);
}

void draw_surface(const fs::path& surface, const fs::path& file, const std::string& title,
                  bool pressure) {
    const CsvTable t = CsvTable::read(surface);
    const std::string value = pressure ? column_of(t, {"cp", "Cp"}) : column_of(t, {"cf", "Cf"});
    Chart c;
    c.title = title + (pressure ? ": pressure coefficient" : ": skin friction");
    c.x_label = "x / c";
    c.y_label = pressure ? "Cp" : "Cf";
    c.y_reversed = pressure;
    c.series = {side_series(t, "upper", value, "upper surface", 0),
                side_series(t, "lower", value, "lower surface", 1)};
    if (!pressure) {
        mark_transition_on_cf(c, surface.parent_path() / "summary.json");
        c.series.push_back({"", {0.0, 1.0}, {0.0, 0.0}, true, false, true, 4});
    }
    write_chart(c, file);
}

/// Draws one picture if its input exists; notes why not otherwise.
template <class Draw>
void try_picture(PictureSet& set, const fs::path& input, const fs::path& report_dir,
                 const std::string& name, const std::string& caption, Draw draw) {
    std::error_code ec;
    if (!fs::exists(input, ec)) {
        set.skipped.push_back(fmt::format("{}: no {}", caption, input.string()));
        return;
    }
    try {
        draw(report_dir / "pictures" / name);
        set.pictures.push_back({"pictures/" + name, caption});
    } catch (const InputError& e) {
        set.skipped.push_back(fmt::format("{}: {}", caption, e.what()));
    }
}

}  // namespace

PictureSet draw_run_pictures(const fs::path& run_dir, const fs::path& report_dir,
                             const std::string& prefix, const std::string& title) {
    fs::create_directories(report_dir / "pictures");
    PictureSet set;
    const fs::path history = run_dir / "history.csv", surface = run_dir / "surface.csv";
    try_picture(set, history, report_dir, prefix + "residuals.png", title + ": residuals",
                [&](const fs::path& f) { draw_convergence(history, f, title); });
    try_picture(set, history, report_dir, prefix + "forces.png", title + ": force history",
                [&](const fs::path& f) { draw_lift_history(history, f, title); });
    try_picture(set, surface, report_dir, prefix + "cp.png", title + ": Cp along the section",
                [&](const fs::path& f) { draw_surface(surface, f, title, true); });
    try_picture(set, surface, report_dir, prefix + "cf.png", title + ": Cf along the section",
                [&](const fs::path& f) { draw_surface(surface, f, title, false); });
    const fs::path pvd = run_dir / "fields.pvd";
    try_picture(set, pvd, report_dir, prefix + "flow.png",
                title + ": streamlines over the speed field (last frame)", [&](const fs::path& f) {
                    FlowPictureOptions o;
                    o.title = title + ": streamlines, speed |u|/U";
                    write_flow_picture(read_flow_frame(last_frame_file(pvd)), f, o);
                });
    return set;
}

}  // namespace veer
