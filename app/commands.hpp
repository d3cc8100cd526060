#pragma once
/// The subcommands of `veer`; each returns the process exit code and throws InputError on bad
/// input (the caller prints it as one line).
#include <filesystem>
#include <string>
#include <vector>

namespace veer {

/// Options shared by the subcommands that read a case file.
struct CaseOptions {
    std::filesystem::path case_file;
    std::vector<std::string> overrides;  ///< --set table.key=value
};

struct MeshOptions {
    CaseOptions input;
    std::filesystem::path out_dir;
    bool force = false;
};

struct RunOptions {
    CaseOptions input;
    std::filesystem::path out_dir;
    std::filesystem::path restart;  ///< checkpoint to continue from; empty for a new run
    bool force = false;
    bool quiet = false;
};

/// `veer sweep`: an angle-of-attack sweep and its polar (app/SWEEPS.md).
struct SweepOptions {
    CaseOptions input;
    std::string alpha;  ///< START:END:STEP or a,b,c (degrees)
    bool down = false;  ///< run from the highest angle down
    std::filesystem::path out_dir;
    bool force = false;
    bool quiet = false;
    long point_index = -1;      ///< >= 0: run only this point (0-based, job arrays)
    bool gather = false;        ///< only gather finished points into the polar
    long steady_steps = 0;      ///< > 0: step cap of each steady attempt
    double unsteady_time = 0;   ///< > 0: end time of time-accurate points
    double stability_time = 6;  ///< disturbed time-accurate check of separated points; 0: none
    /// A steady attempt that stops converging but circles within this fraction of |Cl| (peak to
    /// peak; Cd within ten times it) is reported as its cycle's mean (app/bounded_cycle.hpp);
    /// 0: such points go time-accurate.
    double cycle_band = 5e-3;
    /// Stall search after the requested angles (app/stall_search.hpp): "on", "off" or "auto"
    /// (on from Reynolds number 1e4 up: below it a section's lift rises past 20 degrees).
    std::string stall_search = "auto";
    int stall_steps = 5;  ///< the search's cap: steps beyond the requested angles
    /// Every angle also on the two coarser members of the case's grid family, for per-point
    /// error bars of Cl and Cd (app/sweep_error_bars.hpp).
    bool error_bars = false;
    double error_bar_ratio = 1.4142135623730951;  ///< the family's ratio: sqrt 2 halves the cells
};

/// `veer grid-study`: a case on three refined grids, the grid convergence of its figures
/// (app/grid_study_*.hpp), optionally the far-boundary sensitivity.
struct GridStudyOptions {
    CaseOptions input;
    std::filesystem::path out_dir;
    double ratio = 1.41421356237;  ///< refinement ratio, each dimension (sqrt 2: half the cells)
    std::string case_grid = "finest";  ///< which grid the case's own is: finest or middle
    bool far_boundary = false;         ///< also the finest grid with the far field twice as far
    /// scale the surface spacing's growth cap with the cells (one surface spacing distribution)
    bool scale_surface_slope = false;
    bool force = false;
    bool quiet = false;
};

/// `veer report`: DIR/report.html with pictures, for a run folder or a sweep folder.
struct ReportOptions {
    std::filesystem::path dir;
};

int run_mesh_command(const MeshOptions& options);
int run_check_command(const CaseOptions& options);
int run_run_command(const RunOptions& options);
int run_sweep_command(const SweepOptions& options);
int run_grid_study_command(const GridStudyOptions& options);
int run_report_command(const ReportOptions& options);

}  // namespace veer
