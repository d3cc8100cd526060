#include "app/sweep_plan.hpp"

#include "app/sweep_angles.hpp"
#include "io/json_writer.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace fs = std::filesystem;

fs::path plan_path(const fs::path& sweep_dir) { return sweep_dir / "sweep.json"; }

namespace {

nlohmann::json error_bars_json(const std::optional<ErrorBarGrids>& g) {
    if (!g) return nullptr;
    return {{"ratio", g->ratio}, {"cells", g->cells}};
}

}  // namespace

std::vector<double> all_angles(const SweepPlan& plan) {
    std::vector<double> angles = plan.angles;
    for (const AddedAngle& a : plan.added) angles.push_back(a.alpha);
    return angles;
}

void write_sweep_plan(const fs::path& sweep_dir, const SweepPlan& p) {
    nlohmann::json folders = nlohmann::json::array();
    for (double a : p.angles) folders.push_back(point_folder_name(a));
    nlohmann::json added = nlohmann::json::array();
    for (const AddedAngle& a : p.added)
        added.push_back(
            {{"alpha", a.alpha}, {"why", a.why}, {"folder", point_folder_name(a.alpha)}});
    write_json_file(plan_path(sweep_dir), {{"case_file", p.case_file.string()},
                                           {"overrides", p.overrides},
                                           {"angles", p.angles},
                                           {"folders", folders},
                                           {"steady_steps", p.steady_steps},
                                           {"unsteady_time", p.unsteady_time},
                                           {"ranks", p.ranks},
                                           {"added", added},
                                           {"stall_search", p.stall_search},
                                           {"error_bars", error_bars_json(p.error_bars)}});
}

std::optional<SweepPlan> read_sweep_plan(const fs::path& sweep_dir) {
    std::error_code ec;
    if (!fs::exists(plan_path(sweep_dir), ec)) return std::nullopt;
    const nlohmann::json j = read_json_file(plan_path(sweep_dir));
    try {
        SweepPlan p;
        p.case_file = j.at("case_file").get<std::string>();
        p.overrides = j.at("overrides").get<std::vector<std::string>>();
        p.angles = j.at("angles").get<std::vector<double>>();
        p.steady_steps = j.value("steady_steps", 0L);
        p.unsteady_time = j.value("unsteady_time", 0.0);
        p.ranks = j.value("ranks", 1);
        for (const nlohmann::json& a : j.value("added", nlohmann::json::array()))
            p.added.push_back({a.at("alpha").get<double>(), a.at("why").get<std::string>()});
        p.stall_search = j.value("stall_search", std::string());
        if (j.contains("error_bars") && !j.at("error_bars").is_null())
            p.error_bars = ErrorBarGrids{j.at("error_bars").at("ratio").get<double>(),
                                         j.at("error_bars").at("cells").get<std::array<long, 3>>()};
        return p;
    } catch (const nlohmann::json::exception& e) {
        throw InputError(plan_path(sweep_dir).string() + ": not a sweep plan (" + e.what() + ")");
    }
}

GatheredPoints gather_point_records(const fs::path& sweep_dir, const SweepPlan& plan) {
    GatheredPoints g;
    const std::vector<double> angles = all_angles(plan);
    for (std::size_t k = 0; k < angles.size(); ++k) {
        std::optional<PointRecord> r = read_point_record(sweep_dir / point_folder_name(angles[k]));
        if (!r) {
            g.missing.push_back(angles[k]);
            continue;
        }
        if (k >= plan.angles.size()) r->added_for = plan.added[k - plan.angles.size()].why;
        g.records.push_back(std::move(*r));
    }
    return g;
}

}  // namespace veer
