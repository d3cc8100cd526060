#include "app/report_grid_study.hpp"

#include <fmt/format.h>

#include <nlohmann/json.hpp>

#include "app/grid_study_pictures.hpp"
#include "app/reader_labels.hpp"
#include "app/report_tables.hpp"
#include "io/json_writer.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

std::string cell(const nlohmann::json& v, const char* format = "{:.5f}") {
    return v.is_number() ? fmt::format(fmt::runtime(format), v.get<double>()) : "–";
}

ReportTable grids_table(const nlohmann::json& s) {
    ReportTable t{"The grids (grid 1 finest; h from the cell areas, Celik et al. 2008 step 1)",
                  {{"grid", "around x normal (wake)", "cells", "h (chords)", "first cell",
                    "far field (chords)", "converged", "result"}}};
    auto row = [&](const nlohmann::json& g) {
        const std::string first = g["y_plus"].is_number()
                                      ? fmt::format("y+ {:.3g}", g["y_plus"].get<double>())
                                      : cell(g["first_cell"], "{:.3g} chords");
        t.rows.push_back({g.value("name", ""),
                          fmt::format("{} x {} ({})", g.value("around", 0), g.value("normal", 0),
                                      g.value("wake", 0)),
                          fmt::format("{}", g.value("cells", 0L)), cell(g["spacing"]), first,
                          cell(g["far_field"], "{:g}"), g.value("converged", false) ? "yes" : "NO",
                          g.value("origin", "")});
    };
    for (const auto& g : s["grids"]) row(g);
    if (s.contains("far_boundary_grid")) row(s["far_boundary_grid"]);
    return t;
}

ReportTable figures_table(const nlohmann::json& s) {
    const bool far = s.contains("far_boundary_grid");
    std::vector<std::string> header = {"figure",   "fine",           "medium",
                                       "coarse",   "observed order", "extrapolated",
                                       "GCI fine", "band (±)",       "verdict"};
    if (far) header.push_back("far field x2: change");
    ReportTable t{"Grid convergence of each figure", {header}};
    for (const auto& [key, f] : s["figures"].items()) {
        std::vector<std::string> row = {f.value("label", key), cell(f["values"][0]),
                                        cell(f["values"][1]), cell(f["values"][2])};
        const bool gci = f.contains("gci_fine");
        row.push_back(gci ? cell(f["observed_order"], "{:.2f}") : "–");
        row.push_back(gci ? cell(f["extrapolated"]) : "–");
        row.push_back(gci && f["gci_fine"].is_number()
                          ? fmt::format("{:.3f} %", 100 * f["gci_fine"].get<double>())
                          : "–");
        row.push_back(gci ? cell(f["band"]) : "–");
        row.push_back(f.value("verdict_text", ""));
        if (far)
            row.push_back(f.contains("far_boundary_change")
                              ? cell(f["far_boundary_change"], "{:+.5f}")
                              : "–");
        t.rows.push_back(row);
    }
    return t;
}

}  // namespace

bool is_grid_study_folder(const fs::path& dir) {
    std::error_code ec;
    return fs::exists(dir / "grid_study.json", ec);
}

ReportPage grid_study_page(const fs::path& dir) {
    const nlohmann::json s = read_json_file(dir / "grid_study.json");
    ReportPage page{"Grid study " + dir.filename().string(), {}, std::string(reader_caution())};
    if (auto study = study_section(dir, nullptr)) page.sections.push_back(*study);
    ReportSection g{"Grid convergence", {}, {grids_table(s), figures_table(s)}, {}};
    g.paragraphs.push_back(fmt::format(
        "Three systematically refined grids, refinement ratio {:g} asked on around, normal, wake "
        "and the first cell (counts rounded to multiples of 4; used: r21 = {:.3f}, r32 = {:.3f} "
        "from the cell areas), far field fixed. Observed order, extrapolated value and GCI by "
        "the procedure of Celik et al. 2008 (J. Fluids Eng. 130, 078001), factor of safety 1.25, "
        "or 3 with the formal order when the observed order is outside 1 to 3 or the values "
        "oscillate (Roache 2011). The GCI estimates the discretisation error only; the "
        "far-field change (when given) is a separate component, and neither covers the flow "
        "model's own error.",
        s.value("ratio_asked", 0.0), s["ratios_used"].value("spacing_medium_to_fine", 0.0),
        s["ratios_used"].value("spacing_coarse_to_medium", 0.0)));
    const PictureSet pictures = draw_grid_study_pictures(dir, s);
    g.pictures = pictures.pictures;
    for (const std::string& why : pictures.skipped) g.paragraphs.push_back("Not drawn: " + why);
    page.sections.push_back(g);
    return page;
}

}  // namespace veer
