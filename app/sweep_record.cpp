#include "app/sweep_record.hpp"

#include <cmath>

#include "io/json_writer.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

nlohmann::json optional_value(const std::optional<double>& v) {
    return v ? nlohmann::json(*v) : nlohmann::json(nullptr);
}

std::optional<double> read_optional(const nlohmann::json& j, const char* key) {
    if (!j.contains(key) || j[key].is_null()) return std::nullopt;
    return j[key].get<double>();
}

}  // namespace

bool upper_surface_separated(const PointRecord& r) {
    return r.upper_bubble || (r.trailing_edge_separation_upper &&
                              *r.trailing_edge_separation_upper < trailing_edge_zone);
}

bool upper_surface_needs_stability_check(const PointRecord& r) {
    return upper_surface_separated(r) ||
           (r.laminar_bubble_upper && *r.laminar_bubble_upper < trailing_edge_zone);
}

nlohmann::json record_to_json(const PointRecord& r) {
    return {
        {"alpha", r.alpha},
        {"folder", r.folder},
        {"final_run", r.final_run},
        {"regime", r.regime},
        {"status", r.status},
        {"note", r.note},
        {"cl", r.cl},
        {"cd", r.cd},
        {"cm", r.cm},
        {"cl_basis", r.cl_basis},
        {"cl_steady", optional_value(r.cl_steady)},
        {"cl_momentum", optional_value(r.cl_momentum)},
        {"contour_distance", optional_value(r.contour_distance)},
        {"separation_upper", optional_value(r.separation_upper)},
        {"reattachment_upper", optional_value(r.reattachment_upper)},
        {"separation_lower", optional_value(r.separation_lower)},
        {"reattachment_lower", optional_value(r.reattachment_lower)},
        {"trailing_edge_separation_upper", optional_value(r.trailing_edge_separation_upper)},
        {"upper_bubble", r.upper_bubble},
        {"transition_upper", optional_value(r.transition_upper)},
        {"transition_lower", optional_value(r.transition_lower)},
        {"laminar_bubble_upper", optional_value(r.laminar_bubble_upper)},
        {"laminar_bubble_upper_end", optional_value(r.laminar_bubble_upper_end)},
        {"turbulent_separation_upper", optional_value(r.turbulent_separation_upper)},
        {"model_warning", r.model_warning},
        {"strouhal", optional_value(r.strouhal)},
        {"cl_amplitude", r.cl_amplitude},
        {"cd_amplitude", r.cd_amplitude},
        {"cm_amplitude", r.cm_amplitude},
        {"cycles", r.cycles},
        {"iterations", r.iterations},
        {"wall_seconds", r.wall_seconds},
        {"case_text", r.case_text},
    };
}

PointRecord record_from_json(const nlohmann::json& j, const std::string& source) {
    try {
        PointRecord r;
        r.alpha = j.at("alpha").get<double>();
        r.folder = j.at("folder").get<std::string>();
        r.final_run = j.at("final_run").get<std::string>();
        r.regime = j.at("regime").get<std::string>();
        r.status = j.at("status").get<std::string>();
        r.note = j.value("note", std::string());
        // JSON has no NaN: a coefficient written as null (non-finite) reads back as NaN.
        auto number = [&](const char* key) {
            return j.at(key).is_null() ? std::nan("") : j.at(key).get<double>();
        };
        r.cl = number("cl");
        r.cd = number("cd");
        r.cm = number("cm");
        r.cl_momentum = read_optional(j, "cl_momentum");
        // Records written before these keys existed: the basis is not known.
        r.cl_basis = j.value("cl_basis", std::string("not recorded"));
        r.cl_steady = read_optional(j, "cl_steady");
        r.contour_distance = read_optional(j, "contour_distance");
        r.separation_upper = read_optional(j, "separation_upper");
        r.reattachment_upper = read_optional(j, "reattachment_upper");
        r.separation_lower = read_optional(j, "separation_lower");
        r.reattachment_lower = read_optional(j, "reattachment_lower");
        r.trailing_edge_separation_upper = read_optional(j, "trailing_edge_separation_upper");
        r.upper_bubble = j.value("upper_bubble", false);
        r.transition_upper = read_optional(j, "transition_upper");
        r.transition_lower = read_optional(j, "transition_lower");
        r.laminar_bubble_upper = read_optional(j, "laminar_bubble_upper");
        r.laminar_bubble_upper_end = read_optional(j, "laminar_bubble_upper_end");
        r.turbulent_separation_upper = read_optional(j, "turbulent_separation_upper");
        r.model_warning = j.value("model_warning", std::string());
        r.strouhal = read_optional(j, "strouhal");
        r.cl_amplitude = number("cl_amplitude");
        r.cd_amplitude = number("cd_amplitude");
        r.cm_amplitude = number("cm_amplitude");
        r.cycles = j.value("cycles", 0);
        r.iterations = j.value("iterations", 0L);
        r.wall_seconds = j.value("wall_seconds", 0.0);
        r.case_text = j.at("case_text").get<std::string>();
        return r;
    } catch (const nlohmann::json::exception& e) {
        throw InputError(source + ": not a sweep point record (" + e.what() + ")");
    }
}

std::filesystem::path record_path(const std::filesystem::path& point_dir) {
    return point_dir / "sweep_point.json";
}

std::optional<PointRecord> read_point_record(const std::filesystem::path& point_dir) {
    std::error_code ec;
    const std::filesystem::path record = record_path(point_dir);
    if (!std::filesystem::exists(record, ec)) return std::nullopt;
    return record_from_json(read_json_file(record), record.string());
}

std::optional<PointRecord> finished_point(const std::filesystem::path& point_dir,
                                          const std::string& case_text) {
    std::error_code ec;
    if (!std::filesystem::exists(point_dir / "summary.json", ec)) return std::nullopt;
    try {
        std::optional<PointRecord> r = read_point_record(point_dir);
        if (!r || r->case_text != case_text) return std::nullopt;
        return r;
    } catch (const InputError&) {
        return std::nullopt;  // a damaged record: the point is run again
    }
}

}  // namespace veer
