// `veer sweep`: the points of an angle-of-attack sweep, each in its own run folder, then the
// polar (DIR/polar.csv, DIR/summary.json). Under an MPI launcher the points are spread over the
// ranks in contiguous blocks; each block's first point starts from the free stream.
#include <fmt/format.h>

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
#include "app/sweep_angles.hpp"
#include "app/sweep_plan.hpp"
#include "app/sweep_point.hpp"
#include "app/sweep_ranks.hpp"
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
    const auto [first, last] = rank_block(count, ranks.rank(), ranks.size());
    std::vector<std::size_t> mine;
    for (std::size_t k = first; k < last; ++k) mine.push_back(k);
    return mine;
}

void say_point(const PointRecord& r, std::size_t k, std::size_t count, bool reused) {
    const std::string steady =
        r.cl_steady ? fmt::format("; converged steady Cl {:.5f}", *r.cl_steady) : std::string();
    const std::string contour = r.cl_momentum && r.contour_distance
                                    ? fmt::format("; Cl {:.5f} by the {}", *r.cl_momentum,
                                                  control_volume_label(*r.contour_distance, false))
                                    : std::string();
    fmt::print(
        "point {}/{} alpha {:+.2f} deg: {}{}, surface Cl {:.5f} Cd {:.5f} Cm {:.5f} ({}{}){}{} ({} "
        "iterations, {:.1f} s)\n",
        k + 1, count, r.alpha, r.regime, reused ? " (done earlier)" : "", r.cl, r.cd, r.cm,
        r.cl_basis, steady, contour,
        r.strouhal ? fmt::format(", St {:.4f}", *r.strouhal) : std::string(), r.iterations,
        r.wall_seconds);
    std::fflush(stdout);
}

struct BlockResult {
    std::vector<PointRecord> records;
    bool interrupted = false;
};

/// Runs (or finds finished) the points `mine`, each starting from the previous one's fields.
BlockResult run_block(const SweepOptions& o, const SweepCase& sweep,
                      const std::vector<double>& angles, const std::vector<std::size_t>& mine,
                      const StructuredGrid& grid) {
    BlockResult b;
    std::vector<CaseSpec> specs;  // each point's case, derived once from the text read once
    specs.reserve(mine.size());
    for (std::size_t k : mine) specs.push_back(point_case(sweep, angles[k]));
    std::optional<FlowFields> previous;  // the fields the next point starts from
    const auto start = std::chrono::steady_clock::now();
    int ran = 0;
    for (std::size_t n = 0; n < mine.size(); ++n) {
        const std::size_t k = mine[n];
        const fs::path dir = o.out_dir / point_folder_name(angles[k]);
        if (std::optional<PointRecord> done = finished_point(dir, specs[n].text)) {
            say_point(*done, k, angles.size(), true);
            previous.reset();
            const bool next_needs_it =
                n + 1 < mine.size() &&
                !finished_point(o.out_dir / point_folder_name(angles[mine[n + 1]]),
                                specs[n + 1].text);
            if (next_needs_it) previous = finished_point_fields(dir, *done, grid);
            b.records.push_back(*done);
            continue;
        }
        const double elapsed =
            std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
        const std::string left =
            ran > 0 ? format_duration(elapsed / ran * static_cast<double>(mine.size() - n)) : "?";
        const std::string label = fmt::format("[point {}/{} alpha {:+.2f}, sweep left {}] ", k + 1,
                                              angles.size(), angles[k], left);
        PointOutcome out = run_sweep_point(sweep, angles[k], specs[n], grid, o.out_dir,
                                           previous ? &*previous : nullptr, label);
        ++ran;
        if (out.interrupted) {
            b.interrupted = true;
            return b;
        }
        say_point(*out.record, k, angles.size(), false);
        b.records.push_back(*out.record);
        previous = std::move(out.fields);  // a failed point leaves none: the next starts afresh
    }
    return b;
}

std::string records_text(const std::vector<PointRecord>& records) {
    nlohmann::json a = nlohmann::json::array();
    for (const PointRecord& r : records) a.push_back(record_to_json(r));
    return a.dump();
}

int write_polar(const fs::path& dir, const std::vector<PointRecord>& records,
                const std::vector<double>& angles) {
    std::vector<double> missing;
    for (double a : angles) {
        const bool found = std::any_of(records.begin(), records.end(), [&](const PointRecord& r) {
            return point_folder_name(r.alpha) == point_folder_name(a);
        });
        if (!found) missing.push_back(a);
    }
    write_polar_files(dir, records, missing);
    int failed = 0;
    for (const PointRecord& r : records) failed += r.regime == "failed";
    fmt::print("polar of {} points written: {} and {}\n", records.size(),
               (dir / "polar.csv").string(), (dir / "summary.json").string());
    if (!missing.empty()) fmt::print("{} points have no result yet\n", missing.size());
    if (failed) fmt::print(stderr, "veer: {} points failed (see their sweep_point.json)\n", failed);
    return failed || !missing.empty() ? 1 : 0;
}

int run_sweep(const SweepOptions& o, const SweepRanks& ranks) {
    const std::vector<double> angles = parse_sweep_angles(o.alpha, o.down);
    SweepCase sweep{read_case_source(fs::absolute(o.input.case_file)), o.input.overrides,
                    o.steady_steps, o.unsteady_time, !o.quiet};
    const CaseSpec base = parse_case_source(sweep.source, sweep.overrides);
    sweep.stability_time = o.stability_time;
    std::optional<FolderLock> lock;  // the root holds the sweep folder for the whole sweep
    if (ranks.is_root()) {
        lock.emplace(prepare_output_dir(o.out_dir, base.text, o.force));
        write_sweep_plan(o.out_dir, {sweep.source.path, sweep.overrides, angles, o.steady_steps,
                                     o.unsteady_time, ranks.size()});
    }
    ranks.barrier();
    if (o.gather) {
        if (!ranks.is_root()) return 0;
        std::vector<PointRecord> records;
        for (double a : angles)
            if (auto r =
                    finished_point(o.out_dir / point_folder_name(a), point_case(sweep, a).text))
                records.push_back(*r);
        return write_polar(o.out_dir, records, angles);
    }
    const std::vector<std::size_t> mine_points = points_to_run(o, angles.size(), ranks);
    MeshBuild mesh = build_mesh(base);
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
    if (!ranks.is_root()) return interrupted ? 130 : 0;
    if (interrupted) {
        if (!mine.interrupted || ranks.size() == 1)
            fmt::print(stderr, "veer: sweep interrupted; run the same command again to continue\n");
        return 130;
    }
    if (o.point_index >= 0) {
        fmt::print("point {} done; gather the sweep with veer report {}\n", o.point_index,
                   o.out_dir.string());
        return 0;
    }
    std::vector<PointRecord> records;
    for (const std::string& t : texts)
        for (const nlohmann::json& j : nlohmann::json::parse(t))
            records.push_back(record_from_json(j, "rank record"));
    return write_polar(o.out_dir, records, angles);
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
