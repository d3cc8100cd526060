#include "app/report_tables.hpp"

#include <fmt/format.h>

#include <cmath>

#include "app/reader_labels.hpp"
#include "io/case_file.hpp"
#include "io/output_dir.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

/// A value as a reader reads it: numbers rounded, lists joined, yes/no, "–" for none. Never JSON.
std::string reader_value(const nlohmann::json& j) {
    if (j.is_null()) return "–";
    if (j.is_boolean()) return j.get<bool>() ? "yes" : "no";
    if (j.is_number_integer() || j.is_number_unsigned()) return fmt::format("{}", j.dump());
    if (j.is_number_float()) return fmt::format("{:.6g}", j.get<double>());
    if (j.is_string()) return j.get<std::string>().empty() ? "–" : j.get<std::string>();
    if (j.is_array()) {
        if (j.empty()) return "none";
        std::string out;
        for (const auto& v : j) out += (out.empty() ? "" : ", ") + reader_value(v);
        return j.size() == 2 ? "(" + out + ")" : out;
    }
    std::string out;  // an object: "name value" pairs, keys with spaces
    for (const auto& [k, v] : j.items()) {
        std::string name = k;
        for (char& c : name)
            if (c == '_') c = ' ';
        out += (out.empty() ? "" : "; ") + name + " " + reader_value(v);
    }
    return out;
}

std::string labelled(const FigureLabel& l) {
    return l.unit.empty() ? std::string(l.label) : fmt::format("{} ({})", l.label, l.unit);
}

/// Rows for the labelled keys of `s`, in the order given.
void add_labelled_rows(ReportTable& t, const nlohmann::json& s,
                       std::initializer_list<const char*> keys) {
    for (const char* k : keys)
        if (s.contains(k))
            if (const auto l = figure_label(k))
                t.rows.push_back({labelled(*l), reader_value(s[k])});
}

/// Cl (or Cd) of each contour of a route, labelled with the contour's placed distance.
void add_route_rows(ReportTable& t, const nlohmann::json& s, const char* key, const char* what,
                    bool circulation) {
    if (!s.contains(key) || !s[key].is_object()) return;
    const bool circle = s.value("reference_length", std::string("chord")) == "diameter";
    for (const auto& [asked, v] : s[key].items()) {
        const auto& placed =
            s.contains("contour_distances") ? s["contour_distances"] : nlohmann::json::object();
        const bool known = placed.contains(asked);  // older summaries keep only the asked one
        const double d = known ? placed[asked].get<double>() : std::stod(asked);
        std::string route =
            circulation ? circulation_label(d, circle) : control_volume_label(d, circle);
        if (!known) route += " (asked; placed distance not recorded)";
        t.rows.push_back({fmt::format("{}, {}", what, route), reader_value(v)});
    }
}

std::string number(const std::optional<double>& v, const char* format = "{:.5f}") {
    return v && std::isfinite(*v) ? fmt::format(fmt::runtime(format), *v) : std::string("–");
}

/// A figure with its grid error band (sweeps with --error-bars), e.g. "1.07450 ± 0.00312 (p 1.9,
/// monotone)".
std::string with_band(double value, const std::optional<FigureGridError>& e) {
    if (!e) return number(value);
    return fmt::format("{} ± {} (p {:.2f}, {})", number(value), number(e->band), e->order,
                       e->verdict);
}

std::string angle_range(const std::vector<double>& angles) {
    if (angles.empty()) return "none";
    const auto [lo, hi] = std::minmax_element(angles.begin(), angles.end());
    return fmt::format("{:g} to {:g} deg ({} points)", *lo, *hi, angles.size());
}

}  // namespace

std::optional<ReportSection> study_section(const fs::path& dir, const std::vector<double>* angles) {
    const std::optional<std::string> text = stamped_case_text(dir);
    if (!text) return std::nullopt;
    const CaseSpec c = parse_case_text(*text, (dir / "case").string(), dir, {}, FileCheck::skip);
    const bool circle = c.geometry.circle;
    const int ni = circle ? c.mesh.around : c.mesh.around + 2 * c.mesh.wake;
    const char* lengths = length_words(circle);
    ReportSection s{"The study", {}, {}, {}};
    ReportTable t{"", {{"what", "value"}}};
    t.rows.push_back({"section", c.geometry.name});
    t.rows.push_back({fmt::format("Reynolds number (on the {})", circle ? "diameter" : "chord"),
                      fmt::format("{:g}", c.flow.reynolds)});
    t.rows.push_back({"angle of attack",
                      angles ? angle_range(*angles) : fmt::format("{:g} deg", c.flow.alpha_deg)});
    t.rows.push_back({"flow model", c.model.name});
    t.rows.push_back({"grid (around x normal)", grid_words(c.mesh, circle, ni, c.mesh.normal)});
    t.rows.push_back(
        {"far field", fmt::format("{:g} {} from the section", c.mesh.far_field, lengths)});
    t.rows.push_back({"first cell height", fmt::format("{:.3g} {}", c.mesh.first_cell, lengths)});
    s.tables.push_back(t);
    return s;
}

ReportTable run_results_table(const nlohmann::json& s) {
    ReportTable t{"Results (from summary.json)", {{"figure", "value"}}};
    add_labelled_rows(t, s,
                      {"mode", "status", "iterations", "wall_seconds", "cl", "cl_pressure",
                       "cl_friction", "cd", "cd_pressure", "cd_friction"});
    const bool circle = s.value("reference_length", std::string("chord")) == "diameter";
    if (s.contains("cm"))
        t.rows.push_back(
            {circle ? "Cm, about the centre, clockwise positive (a section's nose-up sense)"
                    : "Cm, about the quarter chord, nose-up positive",
             reader_value(s["cm"])});
    add_route_rows(t, s, "cl_momentum", "Cl", false);
    add_route_rows(t, s, "cd_momentum", "Cd", false);
    add_route_rows(t, s, "cl_circulation", "Cl", true);
    add_labelled_rows(
        t, s,
        {"max_lift_disagreement", "outermost_contour_distance", "cl_momentum_outermost",
         "cd_momentum_outermost", "outermost_lift_difference", "stagnation_x", "separation_upper",
         "reattachment_upper", "separation_lower", "reattachment_lower", "base_cp",
         "separation_angle_upper_deg", "separation_angle_lower_deg", "recirculation_length"});
    if (s.contains("time_average") && s["time_average"].is_object()) {
        const nlohmann::json& a = s["time_average"];
        const std::string over =
            fmt::format("time mean over {} whole cycles", a.value("cycles", 0));
        if (a.contains("mean"))
            for (const char* k : {"cl", "cd", "cm"})
                if (a["mean"].contains(k))
                    t.rows.push_back({fmt::format("{}, {}",
                                                  k == std::string("cl")   ? "Cl"
                                                  : k == std::string("cd") ? "Cd"
                                                                           : "Cm",
                                                  over),
                                      reader_value(a["mean"][k])});
        if (a.contains("strouhal"))
            t.rows.push_back({"Strouhal number of the lift", reader_value(a["strouhal"])});
        if (a.contains("cl_rms")) t.rows.push_back({"Cl rms", reader_value(a["cl_rms"])});
    }
    return t;
}

ReportTable sweep_figures_table(const nlohmann::json& s) {
    ReportTable t{"Figures of the polar (from summary.json)", {{"figure", "value"}}};
    add_labelled_rows(t, s,
                      {"points",
                       "missing_points",
                       "lift_slope_per_deg",
                       "lift_slope_per_rad",
                       "linear_range",
                       "alpha_zero_lift",
                       "cl_max",
                       "cl_max_uncertainty",
                       "alpha_cl_max",
                       "alpha_cl_max_uncertainty",
                       "stall_in_range",
                       "stall_bracketed",
                       "stall_search",
                       "alpha_separation_onset",
                       "cd_min",
                       "alpha_cd_min",
                       "max_lift_disagreement",
                       "unsteady_points",
                       "failed_points",
                       "bounded_cycle_points",
                       "wall_seconds_points"});
    for (auto& row : t.rows)  // the linear range as a range, not an object
        if (row[0].rfind("linear range", 0) == 0 && s["linear_range"].is_object())
            row[1] = fmt::format(
                "{:g} to {:g} deg ({} points)", s["linear_range"].value("alpha_min", 0.0),
                s["linear_range"].value("alpha_max", 0.0), s["linear_range"].value("points", 0));
    return t;
}

ReportTable polar_points_table(const std::vector<PointRecord>& p) {
    std::string cv = "Cl, control volume (largest contour)";
    for (const PointRecord& r : p)
        if (r.contour_distance) cv = "Cl, " + control_volume_label(*r.contour_distance, false);
    ReportTable t{
        "The polar (polar.csv)",
        {{"alpha (deg)", "regime", "Cl, surface", "what Cl is", "Cd", "Cm (c/4, nose-up +)", cv,
          "upper surface: separates / reattaches (x/c)", "lower surface: separates (x/c)",
          "Strouhal number", "Cl amplitude", "iterations (wall s)"}}};
    for (const PointRecord& r : p) {
        std::string basis = r.cl_basis;
        if (r.cl_steady) basis += fmt::format(" (converged steady Cl {:.5f})", *r.cl_steady);
        t.rows.push_back(
            {fmt::format("{:g}", r.alpha),
             r.added_for.empty() ? r.regime : r.regime + " (added: " + r.added_for + ")",
             with_band(r.cl, r.cl_grid), basis, with_band(r.cd, r.cd_grid), number(r.cm),
             number(r.cl_momentum),
             number(r.separation_upper, "{:.3f}") + " / " + number(r.reattachment_upper, "{:.3f}"),
             number(r.separation_lower, "{:.3f}"), number(r.strouhal, "{:.4f}"),
             r.regime == "unsteady" || r.status == "bounded cycle" ? number(r.cl_amplitude) : "–",
             fmt::format("{} ({:.1f})", r.iterations, r.wall_seconds)});
    }
    return t;
}

ReportTable placement_table(const nlohmann::json& p) {
    static const std::vector<std::pair<const char*, const char*>> labels = {
        {"layout", "layout read"},
        {"chord_line", "chord line used"},
        {"chord_line_requested", "chord line asked for"},
        {"chord_line_start", "chord line start (file units)"},
        {"chord_line_end", "chord line end (file units)"},
        {"scale", "scale applied"},
        {"rotation_deg", "rotation applied (deg)"},
        {"trailing_edge_gap", "trailing-edge gap (chords)"},
        {"trailing_edge_closure", "trailing-edge closure"},
        {"trailing_edge_tip_distance", "closed tip behind the trailing-edge centre (chords)"},
        {"base_points_set_aside", "base points set aside"},
    };
    ReportTable t{"Placement (from section.json)", {{"figure", "value"}}};
    for (const auto& [k, label] : labels)
        if (p.contains(k)) t.rows.push_back({label, reader_value(p[k])});
    return t;
}

}  // namespace veer
