// The stall search of a sweep run round by round (app/sweep_stall_rounds.hpp).
#include "app/sweep_stall_rounds.hpp"

#include <fmt/format.h>
#include <fmt/ranges.h>

#include <cmath>

#include "app/stall_search.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_block.hpp"
#include "io/json_writer.hpp"

namespace veer {
namespace {

/// The finished point nearest to `alpha` (the lower one on a tie): an added point starts from
/// its fields. Empty when there is none.
std::string nearest_folder(const std::vector<PointRecord>& records, double alpha) {
    const PointRecord* best = nullptr;
    for (const PointRecord& r : records) {
        if (r.regime == "failed") continue;
        const double d = std::abs(r.alpha - alpha),
                     d_best = best ? std::abs(best->alpha - alpha) : 1e9;
        if (!best || d < d_best - 1e-9 || (d < d_best + 1e-9 && r.alpha < best->alpha)) best = &r;
    }
    return best ? point_folder_name(best->alpha) : std::string();
}

/// The next round of the stall search on the root: {"angles", "why", "starts"}; no angles when
/// the search has ended (then `plan.stall_search` says how).
nlohmann::json plan_stall_round(const std::vector<PointRecord>& records, SweepPlan& plan, int cap) {
    std::vector<PolarSample> samples;
    std::vector<double> attempted;
    for (const PointRecord& r : records) {
        attempted.push_back(r.alpha);
        if (r.regime != "failed" && std::isfinite(r.cl)) samples.push_back({r.alpha, r.cl});
    }
    const StallSearchStep step =
        next_stall_search_step(samples, attempted, StallSearchRule{plan.angles, cap, 0.5});
    nlohmann::json starts = nlohmann::json::array();
    for (double a : step.angles) starts.push_back(nearest_folder(records, a));
    if (step.state != StallSearchState::searching)
        plan.stall_search = stall_search_words(step.state) +
                            (step.state == StallSearchState::bracketed ? "" : ": " + step.why);
    return {{"angles", step.angles}, {"why", step.why}, {"starts", starts}};
}

}  // namespace

/// Whether the stall search runs: asked for, or "auto" from Reynolds number 1e4 up (at Re 1000
/// the sweeps measured in app/SWEEPS.md still gain lift at 20 degrees: nothing to bracket).
bool stall_search_on(const SweepOptions& o, const CaseSpec& base) {
    if (o.point_index >= 0) return false;  // a job-array point runs its one angle only
    if (o.stall_search == "auto") return base.flow.reynolds >= 1e4;
    return o.stall_search == "on";
}

/// The stall search after the requested points (app/stall_search.hpp): each round is planned on
/// the root from every record so far and spread over the ranks like the requested points.
/// Returns true when interrupted. `records` (the root's) gains the added points.
bool run_stall_search(const SweepOptions& o, const SweepCase& sweep, SweepPlan& plan,
                      std::vector<PointRecord>& records, const StructuredGrid& grid,
                      const SweepRanks& ranks) {
    for (;;) {
        const std::string text =
            ranks.is_root() ? plan_stall_round(records, plan, o.stall_steps).dump() : "";
        const nlohmann::json round = nlohmann::json::parse(ranks.broadcast_from_root(text));
        const auto angles = round.at("angles").get<std::vector<double>>();
        if (angles.empty()) return false;
        const std::string why = round.at("why").get<std::string>();
        if (ranks.is_root()) {
            for (double a : angles) plan.added.push_back({a, why});
            write_sweep_plan(o.out_dir, plan);
            const bool beyond = why.rfind("stall search", 0) == 0;  // an extension, not a halving
            fmt::print("{}{}: {:g} deg\n", why,
                       beyond ? fmt::format(" (cap: {} steps)", o.stall_steps) : std::string(),
                       fmt::join(angles, ", "));
        }
        const std::vector<std::size_t> mine = block_indices(angles.size(), ranks);
        std::optional<FlowFields> start;
        const std::string folder =
            mine.empty() ? "" : round.at("starts").at(mine.front()).get<std::string>();
        if (!folder.empty())
            if (auto r = read_point_record(o.out_dir / folder))
                start = finished_point_fields(o.out_dir / folder, *r, grid);
        const BlockResult b = run_block(o, sweep, angles, mine, grid, std::move(start));
        if (ranks.any(b.interrupted)) return true;
        for (PointRecord& r : records_from_texts(ranks.gather_on_root(records_text(b.records)))) {
            r.added_for = why;
            records.push_back(std::move(r));
        }
    }
}

/// --gather: the stall search's points as far as they are finished.
void gather_stall_points(const SweepOptions& o, const SweepCase& sweep, SweepPlan& plan,
                         std::vector<PointRecord>& records) {
    for (;;) {
        const nlohmann::json round = plan_stall_round(records, plan, o.stall_steps);
        const std::string why = round.at("why").get<std::string>();
        for (double a : round.at("angles").get<std::vector<double>>()) {
            auto r = finished_point(o.out_dir / point_folder_name(a), point_case(sweep, a).text);
            if (!r) {
                plan.stall_search = "unfinished: run the sweep without --gather to go on";
                return;
            }
            plan.added.push_back({a, why});
            records.push_back(*r);
            records.back().added_for = why;
        }
        if (round.at("angles").empty()) return;
    }
}

}  // namespace veer
