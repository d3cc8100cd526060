// `veer report DIR`: DIR/report.html with pictures and tables, for a run folder (summary.json,
// history.csv, surface.csv, fields.pvd) or a sweep folder (sweep.json and its point folders,
// which it gathers into polar.csv and summary.json first).
#include <fmt/format.h>

#include <cmath>

#include "app/commands.hpp"
#include "app/polar_table.hpp"
#include "app/report_html.hpp"
#include "app/sweep_plan.hpp"
#include "io/atomic_file.hpp"
#include "io/json_writer.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

std::string number(const std::optional<double>& v, const char* format = "{:.5f}") {
    return v && std::isfinite(*v) ? fmt::format(fmt::runtime(format), *v) : std::string("–");
}

std::string json_cell(const nlohmann::json& j) {
    if (j.is_null()) return "–";
    if (j.is_number_float()) return fmt::format("{:.6g}", j.get<double>());
    if (j.is_string()) return j.get<std::string>();
    return j.dump();
}

ReportTable run_table(const nlohmann::json& s) {
    ReportTable t{"Summary (summary.json)", {{"quantity", "value"}}};
    for (const char* k : {"section",
                          "reynolds",
                          "alpha",
                          "model",
                          "mode",
                          "status",
                          "iterations",
                          "wall_seconds",
                          "cl",
                          "cl_pressure",
                          "cl_friction",
                          "cd",
                          "cd_pressure",
                          "cd_friction",
                          "cm",
                          "cl_momentum",
                          "cl_circulation",
                          "max_lift_disagreement",
                          "separation_upper",
                          "reattachment_upper",
                          "separation_lower",
                          "reattachment_lower",
                          "time_average"})
        if (s.contains(k)) t.rows.push_back({k, json_cell(s[k])});
    return t;
}

ReportTable polar_table(const std::vector<PointRecord>& p) {
    ReportTable t{"Polar (polar.csv)",
                  {{"alpha", "regime", "Cl", "Cd", "Cm", "Cl control volume", "sep. upper",
                    "reatt. upper", "sep. lower", "St", "Cl amplitude", "iterations", "wall s"}}};
    for (const PointRecord& r : p)
        t.rows.push_back({fmt::format("{:g}", r.alpha), r.regime, number(r.cl), number(r.cd),
                          number(r.cm), number(r.cl_momentum), number(r.separation_upper, "{:.3f}"),
                          number(r.reattachment_upper, "{:.3f}"),
                          number(r.separation_lower, "{:.3f}"), number(r.strouhal, "{:.4f}"),
                          r.regime == "unsteady" ? number(r.cl_amplitude) : "–",
                          std::to_string(r.iterations), fmt::format("{:.1f}", r.wall_seconds)});
    return t;
}

ReportTable figures_table(const fs::path& dir) {
    const nlohmann::json s = read_json_file(dir / "summary.json");
    ReportTable t{"Figures of the polar (summary.json)", {{"figure", "value"}}};
    for (const auto& [k, v] : s.items()) t.rows.push_back({k, json_cell(v)});
    return t;
}

/// The section's placement (section.json, written by `veer run` and `veer sweep`): its notes as
/// paragraphs and its figures as a table; nothing when the folder has none.
std::optional<ReportSection> placement_section(const fs::path& dir) {
    std::error_code ec;
    if (!fs::exists(dir / "section.json", ec)) return std::nullopt;
    const nlohmann::json p = read_json_file(dir / "section.json");
    ReportSection s{"Section: how the coordinates were read and placed", {}, {}, {}};
    if (p.contains("notes"))
        for (const auto& n : p["notes"])
            if (n.is_string() && !n.get<std::string>().empty()) s.paragraphs.push_back(n);
    ReportTable t{"Placement (section.json)", {{"figure", "value"}}};
    for (const auto& [k, v] : p.items())
        if (k != "notes") t.rows.push_back({k, json_cell(v)});
    s.tables.push_back(t);
    return s;
}

void add_skipped(ReportSection& s, const PictureSet& set) {
    for (const std::string& why : set.skipped) s.paragraphs.push_back("Not drawn: " + why);
}

ReportPage sweep_page(const fs::path& dir, const SweepPlan& plan) {
    const GatheredPoints g = gather_point_records(dir, plan);
    write_polar_files(dir, g.records, g.missing);
    std::vector<PointRecord> p = g.records;
    std::sort(p.begin(), p.end(), [](const auto& a, const auto& b) { return a.alpha < b.alpha; });
    const PolarFigures f = polar_figures(p);
    ReportPage page{"Sweep " + dir.filename().string() + " — " + plan.case_file.filename().string(),
                    {}};
    ReportSection polar{"Polar", {}, {figures_table(dir), polar_table(p)}, {}};
    polar.paragraphs.push_back(fmt::format(
        "{} of {} points have results. Lift slope: least squares over the linear range (from the "
        "lowest |alpha|, grown while every point stays within 2 % of the range's largest |Cl|). "
        "Separation onset: the first angle whose upper-surface flow leaves the wall ahead of 0.95 "
        "chord or shows a bubble there.",
        p.size(), plan.angles.size()));
    const PictureSet sp = draw_sweep_pictures(dir, p, f);
    polar.pictures = sp.pictures;
    add_skipped(polar, sp);
    page.sections.push_back(polar);
    if (auto placement = placement_section(dir)) page.sections.push_back(*placement);
    // The points worth a closer look: the one at Cl max and the highest angle.
    std::vector<const PointRecord*> closer;
    for (const PointRecord& r : p)
        if ((f.alpha_cl_max && r.alpha == *f.alpha_cl_max) || &r == &p.back()) closer.push_back(&r);
    for (const PointRecord* r : closer) {
        const std::string title = fmt::format("alpha {:g}°", r->alpha);
        ReportSection s{"Point at " + title + " (" + r->regime + ")", {}, {}, {}};
        const PictureSet rp =
            draw_run_pictures(dir / r->folder / r->final_run, dir, r->folder + "_", title);
        s.pictures = rp.pictures;
        add_skipped(s, rp);
        page.sections.push_back(s);
    }
    return page;
}

ReportPage run_page(const fs::path& dir) {
    const nlohmann::json s = read_json_file(dir / "summary.json");
    const std::string title = fmt::format(
        "{} at alpha {:g}°", s.value("section", std::string("section")), s.value("alpha", 0.0));
    ReportPage page{"Run " + dir.filename().string() + " — " + title, {}};
    ReportSection table{"Results", {}, {run_table(s)}, {}};
    page.sections.push_back(table);
    if (auto placement = placement_section(dir)) page.sections.push_back(*placement);
    ReportSection pics{"Pictures", {}, {}, {}};
    const PictureSet set = draw_run_pictures(dir, dir, "", title);
    pics.pictures = set.pictures;
    add_skipped(pics, set);
    page.sections.push_back(pics);
    return page;
}

}  // namespace

int run_report_command(const ReportOptions& o) {
    const fs::path dir = o.dir;
    std::error_code ec;
    ReportPage page;
    if (const std::optional<SweepPlan> plan = read_sweep_plan(dir))
        page = sweep_page(dir, *plan);
    else if (fs::exists(dir / "summary.json", ec))
        page = run_page(dir);
    else
        throw InputError(dir.string() +
                         ": neither a sweep folder (sweep.json) nor a run folder (summary.json)");
    write_text_atomically(dir / "report.html", render_report_html(page));
    int pictures = 0;
    for (const ReportSection& s : page.sections) pictures += static_cast<int>(s.pictures.size());
    fmt::print("report written: {} ({} pictures)\n", (dir / "report.html").string(), pictures);
    return 0;
}

}  // namespace veer
