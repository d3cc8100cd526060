#include "app/sweep_plan.hpp"

#include "app/sweep_angles.hpp"
#include "io/json_writer.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace fs = std::filesystem;

fs::path plan_path(const fs::path& sweep_dir) { return sweep_dir / "sweep.json"; }

void write_sweep_plan(const fs::path& sweep_dir, const SweepPlan& p) {
    nlohmann::json folders = nlohmann::json::array();
    for (double a : p.angles) folders.push_back(point_folder_name(a));
    write_json_file(plan_path(sweep_dir), {{"case_file", p.case_file.string()},
                                           {"overrides", p.overrides},
                                           {"angles", p.angles},
                                           {"folders", folders},
                                           {"steady_steps", p.steady_steps},
                                           {"unsteady_time", p.unsteady_time},
                                           {"ranks", p.ranks}});
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
        return p;
    } catch (const nlohmann::json::exception& e) {
        throw InputError(plan_path(sweep_dir).string() + ": not a sweep plan (" + e.what() + ")");
    }
}

GatheredPoints gather_point_records(const fs::path& sweep_dir, const SweepPlan& plan) {
    GatheredPoints g;
    for (double a : plan.angles) {
        if (std::optional<PointRecord> r = read_point_record(sweep_dir / point_folder_name(a)))
            g.records.push_back(std::move(*r));
        else
            g.missing.push_back(a);
    }
    return g;
}

}  // namespace veer
