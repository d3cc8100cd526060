// `veer sweep`: the points of an angle-of-attack sweep, each in its own run folder, then the
// polar (DIR/polar.csv, DIR/summary.json). Under an MPI launcher the points are spread over the
// ranks in contiguous blocks; each block's first point starts from the free stream.
#include <fmt/format.h>
#include <fmt/ranges.h>

#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdio>
#include <optional>

#include "app/commands.hpp"
#include "app/error_line.hpp"
#include "app/mesh_pipeline.hpp"
#include "app/model_range_note.hpp"
#include "app/polar_table.hpp"
#include "app/progress_line.hpp"
#include "app/reader_labels.hpp"
#include "app/section_notes.hpp"
#include "app/stall_search.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_block.hpp"
#include "app/sweep_coarser_grids.hpp"
#include "app/sweep_error_bars.hpp"
#include "app/sweep_plan.hpp"
#include "app/sweep_point.hpp"
#include "app/sweep_ranks.hpp"
#include "app/sweep_stall_rounds.hpp"
#include "io/case_file.hpp"
#include "io/json_writer.hpp"
#include "io/output_dir.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

/// Which points this process runs, in run order (indices into the angle list).
std::vector<std::size_t> points_to_run(const SweepOptions& o, std::size_t count,
                                       const SweepRanks& ranks) {
    if (o.point_index >= 0) {
        if (static_cast<std::size_t>(o.point_index) >= count)
            throw InputError(
                fmt::format("--point-index {}: the sweep has {} points, allowed: 0 "
                            "to {}",
                            o.point_index, count, count - 1));
        if (ranks.rank() != 0) return {};
        return {static_cast<std::size_t>(o.point_index)};
    }
    return block_indices(count, ranks);
}

/// The screen line of Cl max and how well the sweep's angles pin it down.
void say_cl_max(const std::vector<PointRecord>& records, const std::string& search) {
    const PolarFigures f = polar_figures(records);
    if (!f.stall) return;
    const StallBracket& b = *f.stall;
    if (b.bracketed && b.alpha_uncertainty && b.cl_uncertainty)
        fmt::print(
            "Cl max {:.4f} at {:g} +- {:g} deg, bracketed (a lower Cl on each side; "
            "unsteady points by their mean Cl); the parabola through it and its "
            "neighbours peaks {:.4f} higher\n",
            b.cl_max, b.alpha_cl_max, *b.alpha_uncertainty, *b.cl_uncertainty);
    else
        fmt::print("Cl max {:.4f} at {:g} deg, the {} angle: stall not bracketed{}\n", b.cl_max,
                   b.alpha_cl_max, b.alpha_cl_max >= records.back().alpha ? "highest" : "lowest",
                   search.empty() ? std::string() : " (stall search: " + search + ")");
}

int write_polar(const fs::path& dir, std::vector<PointRecord> records, const SweepPlan& plan) {
    const std::vector<double> angles = all_angles(plan);
    if (plan.error_bars) attach_grid_errors(dir, *plan.error_bars, records);
    std::vector<double> missing;
    for (double a : angles) {
        const bool found = std::any_of(records.begin(), records.end(), [&](const PointRecord& r) {
            return point_folder_name(r.alpha) == point_folder_name(a);
        });
        if (!found) missing.push_back(a);
    }
    write_polar_files(dir, records, missing, plan.stall_search);
    int failed = 0;
    for (const PointRecord& r : records) failed += r.regime == "failed";
    fmt::print("polar of {} points written: {} and {}\n", records.size(),
               (dir / "polar.csv").string(), (dir / "summary.json").string());
    std::sort(records.begin(), records.end(),
              [](const auto& a, const auto& b) { return a.alpha < b.alpha; });
    if (!records.empty()) say_cl_max(records, plan.stall_search);
    if (!missing.empty()) fmt::print("{} points have no result yet\n", missing.size());
    if (failed) fmt::print(stderr, "veer: {} points failed (see their sweep_point.json)\n", failed);
    return failed || !missing.empty() ? 1 : 0;
}

/// Every angle of the polar (requested and added by the stall search), on every rank.
std::vector<double> polar_angles(const SweepPlan& plan, const SweepRanks& ranks) {
    const std::string text = ranks.is_root() ? nlohmann::json(all_angles(plan)).dump() : "";
    return nlohmann::json::parse(ranks.broadcast_from_root(text)).get<std::vector<double>>();
}

int run_sweep(const SweepOptions& o, const SweepRanks& ranks) {
    const std::vector<double> angles = parse_sweep_angles(o.alpha, o.down);
    SweepCase sweep{read_case_source(fs::absolute(o.input.case_file)), o.input.overrides,
                    o.steady_steps, o.unsteady_time, !o.quiet};
    const CaseSpec base = parse_case_source(sweep.source, sweep.overrides);
    sweep.stability_time = o.stability_time;
    if (o.cycle_band > 0) {
        sweep.cycle = BoundedCycleCriteria{};
        sweep.cycle.cl_fraction = o.cycle_band;
        sweep.cycle.cd_fraction = 10.0 * o.cycle_band;
    }
    std::optional<FolderLock> lock;  // the root holds the sweep folder for the whole sweep
    SweepPlan plan;
    plan.case_file = sweep.source.path;
    plan.overrides = sweep.overrides;
    plan.angles = angles;
    plan.steady_steps = o.steady_steps;
    plan.unsteady_time = o.unsteady_time;
    plan.ranks = ranks.size();
    const bool search = stall_search_on(o, base);
    if (!search)
        plan.stall_search = o.stall_search == "off" ? "off (--stall-search off)"
                                                    : "off (Re below 1e4: --stall-search on asks)";
    if (ranks.is_root()) {
        lock.emplace(prepare_output_dir(o.out_dir, base.text, o.force));
        if (o.gather)  // the grids of an earlier run with error bars, to gather their points
            if (const std::optional<SweepPlan> earlier = read_sweep_plan(o.out_dir))
                plan.error_bars = earlier->error_bars;
        write_sweep_plan(o.out_dir, plan);
    }
    ranks.barrier();
    if (o.gather) {
        if (!ranks.is_root()) return 0;
        std::vector<PointRecord> records;
        for (double a : angles)
            if (auto r =
                    finished_point(o.out_dir / point_folder_name(a), point_case(sweep, a).text))
                records.push_back(*r);
        if (search) gather_stall_points(o, sweep, plan, records);
        write_sweep_plan(o.out_dir, plan);
        return write_polar(o.out_dir, records, plan);
    }
    const std::vector<std::size_t> mine_points = points_to_run(o, angles.size(), ranks);
    MeshBuild mesh = build_mesh(base);
    std::optional<CoarserGrids> coarser;  // made before any point runs: a bad family stops here
    if (o.error_bars && o.point_index < 0) {
        coarser = coarser_grids(sweep, base, static_cast<long>(mesh.grid.ni()) * mesh.grid.nj(),
                                o.error_bar_ratio);
        plan.error_bars = coarser->grids;
    }
    if (ranks.is_root()) {
        for (const std::string& w : mesh.quality.warnings) fmt::print("mesh warning: {}\n", w);
        fmt::print("{}: grid {}, Re {:g}, {}, {} points on {} process{}\n", base.geometry.name,
                   grid_words(mesh.spec, base.geometry.circle, mesh.grid.ni(), mesh.grid.nj()),
                   base.flow.reynolds, base.model.name, angles.size(), ranks.size(),
                   ranks.size() > 1 ? "es" : "");
        if (const auto note = model_range_note(base)) fmt::print("model warning: {}\n", *note);
        if (!base.geometry.circle) {  // a circle has no chord line or trailing edge to place
            print_section_notes(mesh.section, 15);
            write_json_file(o.out_dir / "section.json", section_placement_json(mesh.section));
        }
    }
    const BlockResult mine = run_block(o, sweep, angles, mine_points, mesh.grid);
    if (mine.interrupted && ranks.size() > 1) {
        // Said before the collective calls below: when a rank was killed, the launcher stops the
        // others (SIGTERM, which checkpoints like Ctrl-C) and they never get past those calls.
        fmt::print(stderr,
                   "veer: rank {} stopped (interrupted, or another rank ended) with its point "
                   "checkpointed; run the same command again to resume the sweep\n",
                   ranks.rank());
        std::fflush(stderr);
    }
    const bool interrupted = ranks.any(mine.interrupted);
    const std::vector<std::string> texts = ranks.gather_on_root(records_text(mine.records));
    if (interrupted) {
        if (ranks.is_root() && (!mine.interrupted || ranks.size() == 1))
            fmt::print(stderr, "veer: sweep interrupted; run the same command again to continue\n");
        return 130;
    }
    if (o.point_index >= 0) {
        if (ranks.is_root())
            fmt::print("point {} done; gather the sweep with veer report {}\n", o.point_index,
                       o.out_dir.string());
        return 0;
    }
    std::vector<PointRecord> records = records_from_texts(texts);
    const bool stopped =
        (search && run_stall_search(o, sweep, plan, records, mesh.grid, ranks)) ||
        (coarser && run_coarser_grids(o, *coarser, polar_angles(plan, ranks), ranks));
    if (stopped) {
        if (ranks.is_root())
            fmt::print(stderr, "veer: sweep interrupted; run the same command again to continue\n");
        return 130;
    }
    if (!ranks.is_root()) return 0;
    write_sweep_plan(o.out_dir, plan);
    return write_polar(o.out_dir, records, plan);
}

}  // namespace

int run_sweep_command(const SweepOptions& o) {
    SweepRanks ranks;
    int code = 0;
    if (ranks.size() == 1) {
        code = run_sweep(o, ranks);
    } else {
        // One rank's bad input must not leave the others waiting at a barrier.
        try {
            code = run_sweep(o, ranks);
        } catch (const std::exception& e) {
            fmt::print(stderr, "{}\n",
                       one_line(fmt::format("veer: error on rank {}: {}", ranks.rank(), e.what()),
                                error_line_limit));
            std::fflush(stderr);
            ranks.abort(2);
            return 2;
        }
    }
    if (ranks.is_root()) {  // the last line of every sweep that ran
        std::fflush(stderr);
        fmt::print("{}\n", reader_caution());
    }
    return code;
}

}  // namespace veer
