// `veer report DIR`: DIR/report.html with pictures and tables, for a run folder (summary.json,
// history.csv, surface.csv, fields.pvd) or a sweep folder (sweep.json and its point folders,
// which it gathers into polar.csv and summary.json first).
#include <fmt/format.h>

#include <cmath>

#include "app/commands.hpp"
#include "app/polar_table.hpp"
#include "app/reader_labels.hpp"
#include "app/report_grid_study.hpp"
#include "app/report_html.hpp"
#include "app/report_tables.hpp"
#include "app/sweep_error_bars.hpp"
#include "app/sweep_plan.hpp"
#include "io/atomic_file.hpp"
#include "io/json_writer.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

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
    s.tables.push_back(placement_table(p));
    return s;
}

void add_skipped(ReportSection& s, const PictureSet& set) {
    for (const std::string& why : set.skipped) s.paragraphs.push_back("Not drawn: " + why);
}

ReportPage sweep_page(const fs::path& dir, const SweepPlan& plan) {
    GatheredPoints g = gather_point_records(dir, plan);
    if (plan.error_bars) attach_grid_errors(dir, *plan.error_bars, g.records);
    write_polar_files(dir, g.records, g.missing, plan.stall_search);
    std::vector<PointRecord> p = g.records;
    std::sort(p.begin(), p.end(), [](const auto& a, const auto& b) { return a.alpha < b.alpha; });
    const PolarFigures f = polar_figures(p);
    ReportPage page{"Sweep " + dir.filename().string() + " — " + plan.case_file.filename().string(),
                    {},
                    std::string(reader_caution())};
    if (auto study = study_section(dir, &plan.angles)) page.sections.push_back(*study);
    ReportSection polar{
        "Polar",
        {},
        {sweep_figures_table(read_json_file(dir / "summary.json")), polar_points_table(p)},
        {}};
    polar.paragraphs.push_back(fmt::format(
        "{} of {} points have results. Cl, Cd and Cm are the surface route's (pressure + "
        "friction); Cm is about the quarter chord, nose-up positive; \"what Cl is\" says whether "
        "a point's figures are a converged steady state or a time-accurate mean. Lift slope: "
        "least squares over the linear range (from the lowest |alpha|, grown while every point "
        "stays within 2 % of the range's largest |Cl|). Separation onset: the first angle whose "
        "upper-surface flow leaves the wall ahead of 0.95 chord or shows a bubble there.",
        p.size(), all_angles(plan).size()));
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
        const std::string title = fmt::format("α = {:g}°", r->alpha);
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
        "{} at α = {:g}°", s.value("section", std::string("section")), s.value("alpha", 0.0));
    ReportPage page{
        "Run " + dir.filename().string() + " — " + title, {}, std::string(reader_caution())};
    if (auto study = study_section(dir, nullptr)) page.sections.push_back(*study);
    ReportSection table{"Results", {}, {run_results_table(s)}, {}};
    table.paragraphs.push_back(
        "Cl, Cd and Cm from the surface (pressure + friction); Cm about the quarter chord, "
        "nose-up positive. The control-volume rows are the momentum balance on grid lines at "
        "the distances given; the circulation rows lie below the surface lift in viscous flow "
        "by design (the wake's shed vorticity is left out), so their offset is not an error "
        "bar.");
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
    else if (is_grid_study_folder(dir))
        page = grid_study_page(dir);
    else if (fs::exists(dir / "summary.json", ec))
        page = run_page(dir);
    else
        throw InputError(
            dir.string() +
            ": neither a sweep folder (sweep.json), a grid-study folder (grid_study.json) nor a "
            "run folder (summary.json)");
    write_text_atomically(dir / "report.html", render_report_html(page));
    int pictures = 0;
    for (const ReportSection& s : page.sections) pictures += static_cast<int>(s.pictures.size());
    fmt::print("report written: {} ({} pictures)\n", (dir / "report.html").string(), pictures);
    return 0;
}

}  // namespace veer
