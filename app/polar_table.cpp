#include "app/polar_table.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <numbers>
#include <sstream>

#include "io/atomic_file.hpp"
#include "io/json_writer.hpp"

namespace veer {
namespace {

std::string cell(const std::optional<double>& v) {
    return v && std::isfinite(*v) ? fmt::format("{:.8g}", *v) : std::string();
}

std::string cell(double v) { return cell(std::optional<double>(v)); }

nlohmann::json value_or_null(const std::optional<double>& v) {
    return v ? nlohmann::json(*v) : nlohmann::json(nullptr);
}

/// The band, GCI, observed order and verdict of one figure (--error-bars); empty cells without.
std::string grid_cells(const std::optional<FigureGridError>& e) {
    if (!e) return ",,,";
    return fmt::format("{},{},{},{}", cell(e->band), cell(e->gci), cell(e->order), e->verdict);
}

nlohmann::json grid_json(const std::optional<FigureGridError>& e) {
    if (!e) return nullptr;
    return {{"band", e->band},
            {"gci", std::isfinite(e->gci) ? nlohmann::json(e->gci) : nullptr},
            {"order", e->order},
            {"verdict", e->verdict},
            {"coarser", e->coarser}};
}

/// Per-point error bars in summary.json: null when no point has them.
nlohmann::json grid_errors_json(const std::vector<PointRecord>& points) {
    nlohmann::json a = nlohmann::json::array();
    for (const PointRecord& r : points)
        if (r.cl_grid || r.cd_grid)
            a.push_back(
                {{"alpha", r.alpha}, {"cl", grid_json(r.cl_grid)}, {"cd", grid_json(r.cd_grid)}});
    return a.empty() ? nlohmann::json(nullptr) : a;
}

std::string polar_text(const std::vector<PointRecord>& points) {
    std::ostringstream out;
    const auto& columns = polar_columns();
    for (std::size_t c = 0; c < columns.size(); ++c) out << (c ? "," : "") << columns[c];
    out << "\n";
    for (const PointRecord& r : points) {
        // cl_basis is free text without commas (sweep_record.hpp), so no quoting is needed.
        out << fmt::format(
            "{:g},{},{},{},{},{},{},{},{},{},{},{},{},{},{},{},{},{},{},{},{},{},{}\n", r.alpha,
            cell(r.cl), cell(r.cd), cell(r.cm), cell(r.cl_momentum), cell(r.separation_upper),
            cell(r.reattachment_upper), cell(r.separation_lower), cell(r.reattachment_lower),
            r.regime, cell(r.strouhal), cell(r.cl_amplitude), r.cl_basis, cell(r.cl_steady),
            cell(r.contour_distance), cell(r.transition_upper), cell(r.transition_lower),
            cell(r.laminar_bubble_upper), cell(r.laminar_bubble_upper_end),
            cell(r.turbulent_separation_upper), r.added_for, grid_cells(r.cl_grid),
            grid_cells(r.cd_grid));
    }
    return out.str();
}

/// Whether Cl max is bracketed and the uncertainty its angle spacing leaves.
void add_stall_bracket(nlohmann::json& s, const PolarFigures& f, const std::string& search) {
    s["stall_bracketed"] = f.stall && f.stall->bracketed;
    s["alpha_cl_max_uncertainty"] = f.stall ? value_or_null(f.stall->alpha_uncertainty) : nullptr;
    s["cl_max_uncertainty"] = f.stall ? value_or_null(f.stall->cl_uncertainty) : nullptr;
    s["stall_search"] = search.empty() ? nlohmann::json(nullptr) : nlohmann::json(search);
}

nlohmann::json summary_json(const std::vector<PointRecord>& points,
                            const std::vector<double>& missing, const std::string& search) {
    const PolarFigures f = polar_figures(points);
    nlohmann::json s = {
        {"points", points.size()},
        {"missing_points", missing},
        {"lift_slope_per_deg", f.linear ? nlohmann::json(f.linear->slope_per_deg) : nullptr},
        {"lift_slope_per_rad",
         f.linear ? nlohmann::json(f.linear->slope_per_deg * 180.0 / std::numbers::pi) : nullptr},
        {"alpha_zero_lift", value_or_null(f.alpha_zero_lift)},
        {"cl_max", value_or_null(f.cl_max)},
        {"alpha_cl_max", value_or_null(f.alpha_cl_max)},
        {"stall_in_range", f.stall_in_range},
        {"alpha_separation_onset", value_or_null(f.alpha_separation_onset)},
        {"cd_min", value_or_null(f.cd_min)},
        {"alpha_cd_min", value_or_null(f.alpha_cd_min)},
        {"max_lift_disagreement", value_or_null(f.max_lift_disagreement)},
    };
    if (f.linear)
        s["linear_range"] = {{"alpha_min", f.linear->alpha_min},
                             {"alpha_max", f.linear->alpha_max},
                             {"points", f.linear->points}};
    else
        s["linear_range"] = nullptr;
    add_stall_bracket(s, f, search);
    s["grid_errors"] = grid_errors_json(points);
    int unsteady = 0, failed = 0, bounded = 0;
    double wall = 0.0;
    for (const PointRecord& r : points) {
        unsteady += r.regime == "unsteady";
        failed += r.regime == "failed";
        bounded += r.status == "bounded cycle";
        wall += r.wall_seconds;
    }
    s["unsteady_points"] = unsteady;
    s["failed_points"] = failed;
    s["bounded_cycle_points"] = bounded;
    s["wall_seconds_points"] = wall;
    s["model_warning"] = nullptr;
    for (const PointRecord& r : points)
        if (!r.model_warning.empty()) {
            s["model_warning"] = r.model_warning;
            break;
        }
    return s;
}

}  // namespace

const std::vector<const char*>& polar_columns() {
    static const std::vector<const char*> columns = {"alpha",
                                                     "cl",
                                                     "cd",
                                                     "cm",
                                                     "cl_momentum",
                                                     "separation_upper",
                                                     "reattachment_upper",
                                                     "separation_lower",
                                                     "reattachment_lower",
                                                     "regime",
                                                     "strouhal",
                                                     "cl_amplitude",
                                                     "cl_basis",
                                                     "cl_steady",
                                                     "contour_distance",
                                                     "transition_upper",
                                                     "transition_lower",
                                                     "laminar_bubble_upper",
                                                     "laminar_bubble_upper_end",
                                                     "turbulent_separation_upper",
                                                     "added_for",
                                                     "cl_grid_band",
                                                     "cl_gci",
                                                     "cl_grid_order",
                                                     "cl_grid_verdict",
                                                     "cd_grid_band",
                                                     "cd_gci",
                                                     "cd_grid_order",
                                                     "cd_grid_verdict"};
    return columns;
}

void write_polar_files(const std::filesystem::path& dir, std::vector<PointRecord> points,
                       const std::vector<double>& missing, const std::string& stall_search) {
    std::sort(points.begin(), points.end(),
              [](const auto& a, const auto& b) { return a.alpha < b.alpha; });
    write_text_atomically(dir / "polar.csv", polar_text(points));
    write_json_file(dir / "summary.json", summary_json(points, missing, stall_search));
}

}  // namespace veer
