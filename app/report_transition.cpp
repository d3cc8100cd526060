#include "app/report_transition.hpp"

#include <fmt/format.h>

#include <nlohmann/json.hpp>
#include <optional>
#include <string>

#include "io/json_writer.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

std::optional<double> number_at(const nlohmann::json& j, const std::string& key) {
    if (!j.contains(key) || !j[key].is_number()) return std::nullopt;
    return j[key].get<double>();
}

/// The part of a series with x on one side of x_t (the points at x_t itself in both).
ChartSeries part(const ChartSeries& s, double x_t, bool ahead, const std::string& label) {
    ChartSeries out = s;
    out.label = label;
    out.x.clear();
    out.y.clear();
    out.dashed = ahead;
    for (std::size_t k = 0; k < s.x.size(); ++k)
        if (ahead ? s.x[k] <= x_t : s.x[k] >= x_t) out.x.push_back(s.x[k]), out.y.push_back(s.y[k]);
    return out;
}

void add_side(Chart& c, const ChartSeries& s, const nlohmann::json& summary,
              const std::string& side) {
    const std::optional<double> x_t = number_at(summary, "transition_" + side);
    if (!x_t) {
        ChartSeries laminar = s;
        laminar.label = side + " surface, laminar";
        laminar.dashed = true;
        c.series.push_back(laminar);
    } else {
        c.series.push_back(part(s, *x_t, true, side + " surface, laminar"));
        c.series.push_back(part(s, *x_t, false, side + " surface, turbulent"));
        c.marks.push_back({*x_t, fmt::format("transition {} {:.2f}", side, *x_t)});
    }
    const std::string key = "laminar_bubbles_" + side;
    if (!summary.contains(key) || !summary[key].is_array()) return;
    for (const nlohmann::json& b : summary[key]) {
        if (!b.is_array() || b.size() != 3 || !b[0].is_number() || !b[2].is_number()) continue;
        c.series.push_back({fmt::format("laminar bubble, {}", side),
                            {b[0].get<double>(), b[2].get<double>()},
                            {0.0, 0.0},
                            true,
                            true,
                            false,
                            side == "upper" ? 5 : 6});
    }
}

}  // namespace

void mark_transition_on_cf(Chart& chart, const fs::path& summary) {
    std::error_code ec;
    if (chart.series.size() < 2 || !fs::exists(summary, ec)) return;
    const nlohmann::json j = read_json_file(summary);
    if (!j.contains("transition_upper") || !j.contains("transition_lower")) return;
    // Laminar runs write the keys too (null): their fields have no turbulence index.
    if (j["transition_upper"].is_null() && j["transition_lower"].is_null() &&
        j.value("model", std::string()) == "laminar")
        return;
    const ChartSeries upper = chart.series[0], lower = chart.series[1];
    chart.series.erase(chart.series.begin(), chart.series.begin() + 2);
    Chart split;
    add_side(split, upper, j, "upper");
    add_side(split, lower, j, "lower");
    chart.series.insert(chart.series.begin(), split.series.begin(), split.series.end());
    chart.marks.insert(chart.marks.end(), split.marks.begin(), split.marks.end());
    chart.title += " (laminar dashed, turbulent solid)";
}

Chart transition_positions_chart(const std::vector<PointRecord>& points, const PolarFigures& f) {
    Chart c;
    c.title = "Transition and laminar bubbles against angle of attack";
    c.x_label = "alpha (deg)";
    c.y_label = "x / c";
    ChartSeries upper{"transition, upper", {}, {}, true, true, false, 0};
    ChartSeries lower{"transition, lower", {}, {}, true, true, true, 1};
    ChartSeries start{"laminar bubble start, upper", {}, {}, false, true, false, 5};
    ChartSeries end{"laminar bubble end, upper", {}, {}, false, true, false, 6};
    for (const PointRecord& r : points) {
        if (r.transition_upper) upper.x.push_back(r.alpha), upper.y.push_back(*r.transition_upper);
        if (r.transition_lower) lower.x.push_back(r.alpha), lower.y.push_back(*r.transition_lower);
        if (r.laminar_bubble_upper && r.laminar_bubble_upper_end) {
            start.x.push_back(r.alpha), start.y.push_back(*r.laminar_bubble_upper);
            end.x.push_back(r.alpha), end.y.push_back(*r.laminar_bubble_upper_end);
        }
    }
    if (upper.x.empty() && lower.x.empty())
        throw InputError("no point has a transition position (a laminar or older sweep)");
    for (const ChartSeries* s : {&upper, &lower, &start, &end})
        if (!s->x.empty()) c.series.push_back(*s);
    if (f.alpha_separation_onset)
        c.marks.push_back({*f.alpha_separation_onset,
                           fmt::format("separation onset {:g}°", *f.alpha_separation_onset)});
    if (f.alpha_cl_max)
        c.marks.push_back({*f.alpha_cl_max, fmt::format("Cl max {:g}°", *f.alpha_cl_max)});
    return c;
}

void draw_transition_positions(const std::vector<PointRecord>& points, const PolarFigures& f,
                               const fs::path& file) {
    write_chart(transition_positions_chart(points, f), file);
}

}  // namespace veer
