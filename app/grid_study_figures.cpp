#include "app/grid_study_figures.hpp"

#include <fmt/format.h>

#include <array>
#include <cmath>
#include <utility>

#include "app/reader_labels.hpp"

namespace veer {
namespace {

/// The summary.json keys a grid study follows, with a reader's label.
const std::array<std::pair<const char*, const char*>, 9> figure_keys = {{
    {"cl", "Cl (surface)"},
    {"cd", "Cd (surface)"},
    {"cm", "Cm (c/4, nose-up +)"},
    {"separation_upper", "upper separation x/c"},
    {"reattachment_upper", "upper reattachment x/c"},
    {"separation_lower", "lower separation x/c"},
    {"reattachment_lower", "lower reattachment x/c"},
    {"transition_upper", "upper transition x/c"},
    {"transition_lower", "lower transition x/c"},
}};

nlohmann::json or_null(const std::optional<double>& v) {
    return v ? nlohmann::json(*v) : nlohmann::json(nullptr);
}

/// Whether the values showed an order at all (not for alternating or unchanged values).
bool has_order(const GridConvergence& g) {
    return g.verdict == ConvergenceVerdict::monotone ||
           g.verdict == ConvergenceVerdict::order_out_of_range;
}

nlohmann::json convergence_json(const GridConvergence& g) {
    return {{"observed_order", has_order(g) ? nlohmann::json(g.order) : nlohmann::json(nullptr)},
            {"order_used", g.order_used},
            {"safety_factor", g.safety_factor},
            {"extrapolated",
             g.extrapolated_valid ? nlohmann::json(g.extrapolated) : nlohmann::json(nullptr)},
            {"relative_change_fine", g.relative_error},
            {"extrapolated_relative_error", g.extrapolated_error},
            {"gci_fine", g.gci_fine},
            {"band", g.band},
            {"verdict", verdict_name(g.verdict)},
            {"verdict_text", verdict_text(g)}};
}

nlohmann::json grid_json(const StudyRun& r) {
    nlohmann::json g = {{"name", r.grid.name},
                        {"folder", r.dir.filename().string()},
                        {"around", r.grid.around},
                        {"normal", r.grid.normal},
                        {"wake", r.grid.wake},
                        {"far_field", r.grid.far_field},
                        {"cells", r.cells},
                        {"spacing", r.spacing},
                        {"converged", r.converged()},
                        {"origin", origin_words(r.origin)},
                        {"iterations", static_cast<long>(r.number("iterations").value_or(0.0))}};
    g["first_cell"] = or_null(r.grid.first_cell);
    g["y_plus"] = or_null(r.grid.y_plus);
    return g;
}

std::string value_text(const std::optional<double>& v) {
    return v ? fmt::format("{:.5f}", *v) : std::string("-");
}

}  // namespace

std::optional<double> StudyFigure::far_boundary_change() const {
    if (!far_boundary_value || values.empty() || !values.front()) return std::nullopt;
    return *far_boundary_value - *values.front();
}

std::vector<StudyFigure> study_figures(const std::vector<StudyRun>& runs,
                                       const std::optional<StudyRun>& far_boundary) {
    std::vector<StudyFigure> out;
    for (const auto& [key, label] : figure_keys) {
        StudyFigure f;
        f.key = key;
        f.label = label;
        bool all = true, any = false;
        for (const StudyRun& r : runs) {
            f.values.push_back(r.number(key));
            all = all && f.values.back().has_value();
            any = any || f.values.back().has_value();
        }
        if (!any) continue;
        if (all && runs.size() == 3)
            f.convergence = grid_convergence({runs[0].spacing, runs[1].spacing, runs[2].spacing},
                                             {*f.values[0], *f.values[1], *f.values[2]});
        if (far_boundary) f.far_boundary_value = far_boundary->number(key);
        out.push_back(std::move(f));
    }
    return out;
}

nlohmann::json grid_study_json(const GridStudyResult& r) {
    nlohmann::json grids = nlohmann::json::array();
    for (const StudyRun& run : r.runs) grids.push_back(grid_json(run));
    const auto ratio = [&](int a, int b, auto field) {
        return static_cast<double>(r.runs[b].grid.*field) / r.runs[a].grid.*field;
    };
    nlohmann::json j = {
        {"ratio_asked", r.plan.ratio},
        {"case_grid", r.plan.role == CaseGridRole::finest ? "finest" : "middle"},
        {"grids", grids},
        {"ratios_used",
         {{"spacing_medium_to_fine", r.runs[1].spacing / r.runs[0].spacing},
          {"spacing_coarse_to_medium", r.runs[2].spacing / r.runs[1].spacing},
          {"around", {ratio(1, 0, &StudyGrid::around), ratio(2, 1, &StudyGrid::around)}},
          {"normal", {ratio(1, 0, &StudyGrid::normal), ratio(2, 1, &StudyGrid::normal)}},
          {"wake", {ratio(1, 0, &StudyGrid::wake), ratio(2, 1, &StudyGrid::wake)}}}},
        {"all_converged", r.runs[0].converged() && r.runs[1].converged() && r.runs[2].converged()},
        {"caution", reader_caution()},
    };
    nlohmann::json figures = nlohmann::json::object();
    for (const StudyFigure& f : r.figures) {
        nlohmann::json values = nlohmann::json::array();
        for (const auto& v : f.values) values.push_back(or_null(v));
        nlohmann::json fj = {{"label", f.label}, {"values", values}};
        if (f.convergence)
            fj.update(convergence_json(*f.convergence));
        else
            fj["verdict_text"] = "not found on every grid: no grid convergence estimate";
        if (r.far_boundary) {
            fj["far_boundary_value"] = or_null(f.far_boundary_value);
            fj["far_boundary_change"] = or_null(f.far_boundary_change());
        }
        figures[f.key] = fj;
    }
    j["figures"] = figures;
    if (r.far_boundary) j["far_boundary_grid"] = grid_json(*r.far_boundary);
    return j;
}

void print_grid_study_table(const GridStudyResult& r) {
    fmt::print("\ngrid study (Celik et al. 2008; grid 1 finest):\n");
    for (const StudyRun& run : r.runs)
        fmt::print("  {:<7} {:>5} x {:<4} wake {:<4} {:>7} cells  h {:.5f}  {}{}\n", run.grid.name,
                   run.grid.around, run.grid.normal, run.grid.wake, run.cells, run.spacing,
                   origin_words(run.origin), run.converged() ? "" : ", NOT CONVERGED");
    fmt::print("  ratios used (from cell areas): r21 {:.3f}, r32 {:.3f}\n",
               r.runs[1].spacing / r.runs[0].spacing, r.runs[2].spacing / r.runs[1].spacing);
    fmt::print("  {:<24} {:>10} {:>10} {:>10} {:>7} {:>11} {:>9}{}\n", "figure", "fine", "medium",
               "coarse", "order", "extrapol.", "GCI fine",
               r.far_boundary ? "   far x2 change" : "");
    for (const StudyFigure& f : r.figures) {
        const GridConvergence* g = f.convergence ? &*f.convergence : nullptr;
        fmt::print("  {:<24} {:>10} {:>10} {:>10} {:>7} {:>11} {:>9}", f.label,
                   value_text(f.values[0]), value_text(f.values[1]), value_text(f.values[2]),
                   g && has_order(*g) ? fmt::format("{:.2f}", g->order) : "-",
                   g && g->extrapolated_valid ? fmt::format("{:.5f}", g->extrapolated) : "-",
                   g ? fmt::format("{:.2f}%", 100 * g->gci_fine) : "-");
        if (r.far_boundary) {
            const auto change = f.far_boundary_change();
            fmt::print(" {:>16}", change ? fmt::format("{:+.5f}", *change) : std::string("-"));
        }
        fmt::print("\n");
    }
    for (const StudyFigure& f : r.figures)
        if (f.convergence) fmt::print("  {}: {}\n", f.label, verdict_text(*f.convergence));
    fmt::print("{}\n", reader_caution());
}

}  // namespace veer
