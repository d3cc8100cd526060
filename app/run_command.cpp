// `veer run`: a new run from a case file, or the continuation of one from its checkpoint.
#include <fmt/format.h>

#include <cstdio>
#include <iostream>
#include <optional>

#include "app/commands.hpp"
#include "app/mesh_pipeline.hpp"
#include "app/model_range_note.hpp"
#include "app/reader_labels.hpp"
#include "app/run_report.hpp"
#include "app/section_notes.hpp"
#include "app/simulation.hpp"
#include "io/case_choices.hpp"
#include "io/case_file.hpp"
#include "io/checkpoint.hpp"
#include "io/json_writer.hpp"
#include "io/output_dir.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

int exit_code(RunStatus s) {
    switch (s) {
        case RunStatus::converged:
        case RunStatus::end_time:
            return 0;
        case RunStatus::step_cap:
            return 1;
        case RunStatus::diverged:
            return 4;
        case RunStatus::interrupted:
            return 130;
    }
    return 3;
}

void say_how_it_ended(const RunResult& r, const Simulation& sim) {
    if (r.scheme_fallback_step > 0)
        fmt::print(
            "note: the \"fast\" steady scheme stopped converging; from iteration {} the run went "
            "on with \"classic\" (the same equations, smaller pseudo-time steps)\n",
            r.scheme_fallback_step);
    switch (r.status) {
        case RunStatus::converged:
            fmt::print("converged after {} iterations in {:.1f} s\n", r.steps, r.wall_seconds);
            break;
        case RunStatus::end_time:
            fmt::print("reached t = {:g} after {} steps in {:.1f} s\n", r.time, r.steps,
                       r.wall_seconds);
            break;
        case RunStatus::step_cap:
            fmt::print(stderr,
                       "veer: not converged: the step cap ([run] steps = {}) was reached; "
                       "continue with veer run --restart {} --set run.steps=N\n",
                       sim.spec().run.steps, sim.checkpoint_path().string());
            break;
        case RunStatus::interrupted:
            fmt::print(stderr, "veer: interrupted at step {}; state saved in {}\n", r.steps,
                       sim.checkpoint_path().string());
            break;
        case RunStatus::diverged:
            fmt::print(stderr, "veer: {}\n", r.diagnosis);
            break;
    }
}

}  // namespace

int run_run_command(const RunOptions& o) {
    CaseSpec spec;
    std::optional<CheckpointData> checkpoint;
    std::filesystem::path out = o.out_dir;
    const std::filesystem::path restart_dir =
        o.restart.parent_path().empty() ? std::filesystem::path(".") : o.restart.parent_path();
    if (!o.restart.empty()) {
        checkpoint = read_checkpoint(o.restart);
        spec = parse_case_text(checkpoint->case_text, o.restart.string() + " (case text)",
                               restart_dir, o.input.overrides, FileCheck::skip);
        if (out.empty()) out = restart_dir;
    } else {
        spec = read_case_file(o.input.case_file, o.input.overrides);
    }
    // A restart writes into its own run folder whatever the overrides did to the case text.
    std::error_code ec;
    const bool own_folder = checkpoint && std::filesystem::equivalent(out, restart_dir, ec);
    const FolderLock lock = prepare_output_dir(out, spec.text, o.force || own_folder);

    StructuredGrid grid;
    std::optional<Section> header_section;  // a restart keeps the section.json of its first run
    if (checkpoint) {
        grid = checkpoint->grid;
    } else {
        MeshBuild mesh = build_mesh(spec);
        for (const std::string& w : mesh.quality.warnings) fmt::print("mesh warning: {}\n", w);
        grid = std::move(mesh.grid);
        if (!spec.geometry.circle) {  // a circle has no chord line or trailing edge to place
            write_json_file(out / "section.json", section_placement_json(mesh.section));
            header_section = std::move(mesh.section);
        }
    }
    fmt::print("{}: grid {}, Re {:g}, alpha {:g} deg, {} {}\n", spec.geometry.name,
               grid_words(spec.mesh, spec.geometry.circle, grid.ni(), grid.nj()),
               spec.flow.reynolds, spec.flow.alpha_deg, spec.model.name, mode_word(spec.run.mode));
    if (header_section) print_section_notes(*header_section, 15);
    if (const auto note = model_range_note(spec)) fmt::print("model warning: {}\n", *note);
    SimulationOptions options;
    options.progress = !o.quiet;
    // A time-accurate run samples the control-volume route after every step for its time
    // means over whole cycles (the route is quadratic in the velocity: run_report.hpp).
    std::optional<ControlVolumeHistory> routes;
    const Simulation* running = nullptr;
    if (spec.run.mode == TimeMode::time_accurate && grid.c_layout()) {
        routes.emplace(grid, spec.post.contours);
        options.stop_early = [&routes, &running](const StepReport& step, double,
                                                 const SurfaceForces&) {
            if (running) routes->after_step(*running, step.step, step.time);
            return false;
        };
    }
    Simulation sim(spec, std::move(grid), out, options);
    running = &sim;
    if (checkpoint) sim.resume(*checkpoint);
    const RunResult result = sim.run();
    if (result.status != RunStatus::diverged)
        write_run_report(sim, result, ClosingTable::print, routes ? &*routes : nullptr);
    say_how_it_ended(result, sim);
    std::fflush(stderr);
    fmt::print("{}\n", reader_caution());  // the last line of every run that got this far
    return exit_code(result.status);
}

}  // namespace veer
