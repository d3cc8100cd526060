#include "app/cli.hpp"

#include <CLI/CLI.hpp>
#include <filesystem>
#include <iostream>

#include "app/commands.hpp"
#include "app/error_line.hpp"
#include "app/reader_labels.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

/// Exit statuses (README, "Exit status"): 2 bad input or an output problem the user can fix,
/// 3 a fault inside veer.
constexpr int exit_input = 2;
constexpr int exit_internal = 3;

int print_error(const std::string& prefix, const std::string& message, int code) {
    std::cerr << one_line(prefix + message, error_line_limit) << "\n";
    return code;
}

/// The argument parser's own verdicts: help and version print and exit 0; every mistake in the
/// arguments is bad input (exit 2, one line), whatever code the parser would give.
int parser_exit(CLI::App& app, const CLI::ParseError& e) {
    if (e.get_exit_code() == 0) return app.exit(e);
    return print_error("veer: error: ", std::string(e.what()) + " (run `veer --help`)", exit_input);
}

void add_case_options(CLI::App& sub, CaseOptions& o) {
    // No existence check here: the case reader refuses a missing path, a folder or a device with
    // a message that says what was expected (io/input_file.hpp).
    sub.add_option("case", o.case_file, "case file (TOML)")->required();
    sub.add_option("--set", o.overrides,
                   "override a case value, e.g. --set flow.alpha=6 (repeatable)")
        ->type_name("TABLE.KEY=VALUE");
}

CLI::App* add_sweep_subcommand(CLI::App& app, SweepOptions& o) {
    CLI::App* sweep = app.add_subcommand("sweep", "solve a case over a range of angles of attack");
    add_case_options(*sweep, o.input);
    sweep
        ->add_option("--alpha", o.alpha,
                     "angles in degrees: START:END:STEP (e.g. 0:12:2 is 0, 2, ... 12: start, end, "
                     "step) or a list a,b,c")
        ->required()
        ->type_name("ANGLES");
    sweep->add_option("-o,--output", o.out_dir, "sweep folder (one run folder per point)")
        ->required();
    sweep->add_flag("--down", o.down, "run from the highest angle down (hysteresis)");
    sweep
        ->add_option("--point-index", o.point_index,
                     "run only point K (0-based, in run order; for job arrays)")
        ->check(CLI::NonNegativeNumber);
    sweep->add_flag("--gather", o.gather, "only gather the finished points into the polar");
    sweep
        ->add_option("--steady-steps", o.steady_steps,
                     "iteration cap of each steady attempt before it goes time-accurate")
        ->check(CLI::PositiveNumber);
    sweep
        ->add_option("--unsteady-time", o.unsteady_time,
                     "end time (chords / free-stream speed) of time-accurate points")
        ->check(CLI::PositiveNumber);
    sweep
        ->add_option("--stability-time", o.stability_time,
                     "length of the disturbed time-accurate check of converged separated points "
                     "(chords / free-stream speed; 0: no check)")
        ->check(CLI::NonNegativeNumber);
    sweep
        ->add_option("--cycle-band", o.cycle_band,
                     "a steady attempt that stops converging but whose Cl circles within this "
                     "fraction peak to peak (Cd within ten times it) is reported as the cycle's "
                     "mean with that band (default 0.005; 0: it goes time-accurate)")
        ->check(CLI::Range(0.0, 0.05));
    sweep
        ->add_option("--stall-search", o.stall_search,
                     "go on past the last angle until Cl falls, then halve the step around Cl max "
                     "to 0.5 deg: on, off, auto (on from Re 1e4 up; default)")
        ->check(CLI::IsMember({"on", "off", "auto"}));
    sweep
        ->add_option("--stall-steps", o.stall_steps,
                     "cap of the stall search: steps beyond the requested angles (default 5)")
        ->check(CLI::Range(1, 50));
    sweep->add_flag("--error-bars", o.error_bars,
                    "also run every angle on two coarser grids and give Cl and Cd a grid "
                    "convergence index (error bars on the polar)");
    sweep
        ->add_option("--error-bar-ratio", o.error_bar_ratio,
                     "refinement ratio between the three grids, at least 1.3 (default 1.414: "
                     "each coarser grid has half the cells)")
        ->check(CLI::Range(1.3, 4.0));
    sweep->add_flag("--force", o.force, "write into a folder that holds another study");
    sweep->add_flag("-q,--quiet", o.quiet, "no live progress line");
    sweep->footer(
        "e.g. veer sweep CASE --alpha 0:12:2 -o DIR  (start 0, end 12, step 2 degrees)\n\n" +
        std::string(reader_caution()) + ".");
    return sweep;
}

CLI::App* add_grid_study_subcommand(CLI::App& app, GridStudyOptions& o) {
    CLI::App* study = app.add_subcommand(
        "grid-study",
        "run a case on three refined grids: observed order, extrapolated value and grid "
        "convergence index (GCI) of each figure");
    add_case_options(*study, o.input);
    study->add_option("-o,--output", o.out_dir, "study folder (one run folder per grid)")
        ->required();
    study
        ->add_option("--ratio", o.ratio,
                     "refinement ratio of every grid dimension and the first cell (1.3 to 2; "
                     "default sqrt 2)")
        ->check(CLI::PositiveNumber);
    study->add_option("--case-grid", o.case_grid,
                      "the case's own grid is the finest (default) or the middle of the three");
    study->add_flag("--far-boundary", o.far_boundary,
                    "also run the finest grid with the far field twice as far");
    study->add_flag("--same-surface-spacing", o.scale_surface_slope,
                    "scale the cap on the surface spacing's growth (surface_slope) with the "
                    "cells, so that the three grids share one surface spacing distribution");
    study->add_flag("--force", o.force, "write into folders that hold another study");
    study->add_flag("-q,--quiet", o.quiet, "no live progress line");
    study->footer("e.g. veer grid-study CASE -o DIR --far-boundary\n\n" +
                  std::string(reader_caution()) + ".");
    return study;
}

}  // namespace

int run_cli(int argc, char** argv) {
    CLI::App app{"veer: 2D incompressible flow about airfoil sections, lift computed two ways"};
    app.set_version_flag("--version", std::string("veer ") + VEER_VERSION);
    app.require_subcommand(1);
    app.footer("Run `veer SUBCOMMAND --help` for the options of each subcommand.\n\n" +
               std::string(reader_caution()) + ".");

    CaseOptions check_opts;
    CLI::App* check = app.add_subcommand("check", "validate a case file without running it");
    add_case_options(*check, check_opts);

    MeshOptions mesh_opts;
    CLI::App* mesh =
        app.add_subcommand("mesh", "build the C-grid of a case and report its quality");
    add_case_options(*mesh, mesh_opts.input);
    mesh->add_option("-o,--output", mesh_opts.out_dir, "output folder")->required();
    mesh->add_flag("--force", mesh_opts.force, "write into a folder that holds another study");

    RunOptions run_opts;
    CLI::App* run = app.add_subcommand("run", "solve the flow of a case");
    run->footer(std::string(reader_caution()) + ".");
    run->add_option("case", run_opts.input.case_file, "case file (TOML)");
    run->add_option("--set", run_opts.input.overrides, "override a case value (repeatable)")
        ->type_name("TABLE.KEY=VALUE");
    run->add_option("-o,--output", run_opts.out_dir,
                    "output folder (default with --restart: the checkpoint's folder)");
    run->add_option("--restart", run_opts.restart, "continue from a checkpoint file")
        ->check(CLI::ExistingFile);
    run->add_flag("--force", run_opts.force, "write into a folder that holds another study");
    run->add_flag("-q,--quiet", run_opts.quiet, "no live progress line");

    SweepOptions sweep_opts;
    CLI::App* sweep = add_sweep_subcommand(app, sweep_opts);
    GridStudyOptions study_opts;
    CLI::App* study = add_grid_study_subcommand(app, study_opts);
    ReportOptions report_opts;
    CLI::App* report = app.add_subcommand("report", "write DIR/report.html with pictures");
    report->add_option("dir", report_opts.dir, "a run folder or a sweep folder")
        ->required()
        ->check(CLI::ExistingDirectory);

    try {
        app.parse(argc, argv);
    } catch (const CLI::ParseError& e) {
        return parser_exit(app, e);
    }
    try {
        if (*check) return run_check_command(check_opts);
        if (*mesh) return run_mesh_command(mesh_opts);
        if (*sweep) return run_sweep_command(sweep_opts);
        if (*study) return run_grid_study_command(study_opts);
        if (*report) return run_report_command(report_opts);
        if (*run) {
            if (run_opts.input.case_file.empty() && run_opts.restart.empty())
                throw InputError("veer run: give a case file, or --restart CHECKPOINT");
            if (run_opts.out_dir.empty() && run_opts.restart.empty())
                throw InputError("veer run: give an output folder with -o DIR");
            return run_run_command(run_opts);
        }
    } catch (const InputError& e) {
        return print_error("veer: error: ", e.what(), exit_input);
    } catch (const std::filesystem::filesystem_error& e) {
        // A path the user gave that the system refuses (too long, no permission, a full disk).
        return print_error("veer: error: ", e.what(), exit_input);
    } catch (const std::bad_alloc&) {
        return print_error("veer: error: ", "out of memory; try a coarser grid", exit_input);
    } catch (const std::exception& e) {
        return print_error("veer: internal error: ", e.what(), exit_internal);
    }
    return 0;
}

}  // namespace veer
