#include "app/grid_study_pictures.hpp"

#include <fmt/format.h>

#include "io/plot_chart.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

/// The three grids' values against h, or why there is no picture.
std::optional<ChartSeries> grid_series(const nlohmann::json& study, const nlohmann::json& f) {
    ChartSeries s{"the three grids", {}, {}, true, true, false, 0};
    for (std::size_t k = 0; k < study["grids"].size() && k < f["values"].size(); ++k) {
        if (!f["values"][k].is_number()) return std::nullopt;
        s.x.push_back(study["grids"][k]["spacing"].get<double>());
        s.y.push_back(f["values"][k].get<double>());
    }
    if (s.x.size() != 3) return std::nullopt;
    return s;
}

void draw_one(const nlohmann::json& study, const std::string& key, const nlohmann::json& f,
              const fs::path& file) {
    Chart c;
    const std::string label = f.value("label", key);
    c.title = label + " against grid spacing h";
    c.x_label = "h = sqrt(domain area / cells) (chords)";
    c.y_label = label;
    c.x_from_zero = true;
    c.series.push_back(*grid_series(study, f));
    if (f.contains("extrapolated") && f["extrapolated"].is_number()) {
        const double e = f["extrapolated"].get<double>();
        c.series.push_back({"extrapolated to h = 0", {0.0}, {e}, false, true, false, 1});
    }
    if (f.contains("band") && f["band"].is_number()) {  // the GCI band about the fine value
        const double fine = f["values"][0].get<double>(), band = f["band"].get<double>();
        const double h1 = c.series.front().x.front();
        c.series.push_back(
            {"fine value ± GCI band", {h1, h1}, {fine - band, fine + band}, true, false, true, 2});
    }
    if (f.contains("far_boundary_value") && f["far_boundary_value"].is_number())
        c.series.push_back({"fine grid, far field twice as far",
                            {c.series.front().x.front()},
                            {f["far_boundary_value"].get<double>()},
                            false,
                            true,
                            false,
                            3});
    write_chart(c, file);
}

}  // namespace

PictureSet draw_grid_study_pictures(const fs::path& dir, const nlohmann::json& study) {
    PictureSet set;
    fs::create_directories(dir / "pictures");
    if (!study.contains("figures") || !study.contains("grids")) {
        set.skipped.push_back("grid_study.json holds no figures");
        return set;
    }
    for (const auto& [key, f] : study["figures"].items()) {
        if (!grid_series(study, f)) {
            set.skipped.push_back(key + ": not found on every grid");
            continue;
        }
        const std::string file = "pictures/grid_study_" + key + ".png";
        try {
            draw_one(study, key, f, dir / file);
        } catch (const InputError& e) {
            set.skipped.push_back(key + ": " + e.what());
            continue;
        }
        set.pictures.push_back(
            {file, fmt::format("{} on the three grids against h, with the value extrapolated to "
                               "h = 0 and the fine grid's GCI band",
                               f.value("label", key))});
    }
    return set;
}

}  // namespace veer
