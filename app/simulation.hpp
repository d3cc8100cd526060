#pragma once
/// The Simulation schedules a run: it owns the clock (time steps from the CFL target), the stop
/// criteria (convergence, step cap, end time), divergence checks, the history, field frames and
/// checkpoints. The solver only steps.
#include <deque>
#include <filesystem>
#include <functional>
#include <memory>
#include <string>
#include <utility>
#include <vector>

#include "app/convergence.hpp"
#include "io/case_spec.hpp"
#include "io/checkpoint.hpp"
#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "postprocess/run_analysis.hpp"
#include "postprocess/surface_forces.hpp"
#include "postprocess/time_average.hpp"
#include "solver/flow_solver.hpp"

namespace veer {

enum class RunStatus { converged, step_cap, end_time, interrupted, diverged };

/// The word for a status in summary.json and the sweep records: "converged", "step cap",
/// "end time", "interrupted", "diverged".
const char* status_word(RunStatus status);

/// How a run ended.
struct RunResult {
    RunStatus status = RunStatus::step_cap;
    long steps = 0;             ///< steps (iterations) taken in total, restarts included
    double time = 0.0;          ///< physical time reached (unsteady)
    double wall_seconds = 0.0;  ///< this invocation's wall time
    std::string diagnosis;      ///< diverged: where and what to try
    StepReport last;            ///< the last step's figures
    SurfaceForces forces;       ///< the last step's surface forces
    long last_checkpoint_step = -1;
    /// Steady "fast": the step after which the run went on with "classic" (0: it did not).
    long scheme_fallback_step = 0;
};

struct SimulationOptions {
    bool progress = true;  ///< live progress line on stderr
    std::string label;     ///< prefix of the progress line (e.g. a sweep point)
    /// Asked after every step with its report, the largest relative residual and the surface
    /// forces; true ends the run there (status step_cap), e.g. when a sweep sees a steady
    /// iteration stall or a time-accurate run settle.
    std::function<bool(const StepReport& step, double relative_residual,
                       const SurfaceForces& forces)>
        stop_early;
};

class Simulation {
public:
    /// A new run of `spec` on `grid`, writing into `out_dir` (which the caller has prepared).
    Simulation(const CaseSpec& spec, StructuredGrid grid, std::filesystem::path out_dir,
               SimulationOptions options = {});
    ~Simulation();

    /// Continues from a checkpoint of the same case and grid (solver and schedule state).
    void resume(const CheckpointData& checkpoint);

    /// Starts a new run from given fields on the same grid (e.g. the previous point of a sweep)
    /// instead of the free stream. A steady run is then held to the residual references of a
    /// start from the free stream (free_stream_reference.hpp), as a single run is.
    void start_from(const FlowFields& initial);

    /// Steps until a stop criterion holds; writes the history, frames and checkpoints.
    RunResult run();

    const StructuredGrid& grid() const { return m_grid; }
    const GridMetrics& metrics() const { return m_metrics; }
    const FlowSolver& solver() const { return *m_solver; }
    const CaseSpec& spec() const { return m_spec; }
    std::filesystem::path checkpoint_path() const { return m_out / "checkpoint.h5"; }
    /// Time and surface forces of every step so far (a restart's earlier steps from its history).
    const ForceRecord& force_history() const { return m_forces; }

private:
    void write_checkpoint_now();
    void record_forces(double time, const SurfaceForces& forces);
    std::vector<std::pair<std::string, double>> labelled_model_residuals(const StepReport& r) const;
    std::string divergence_diagnosis(const StepReport& r) const;
    double next_time_step() const;
    double nominal_time_step() const;

    CaseSpec m_spec;
    StructuredGrid m_grid;
    GridMetrics m_metrics;
    std::filesystem::path m_out;
    SimulationOptions m_options;
    std::unique_ptr<FlowSolver> m_solver;
    ConvergenceMonitor m_monitor;
    bool m_resumed = false;
    long m_last_checkpoint_step = -1;
    /// The worst cell (largest change) of each of the last finite steps: a field that turns
    /// non-finite does so everywhere at once after a line solve, so its first non-finite cell in
    /// memory order says nothing about where the blow-up began; the cell that led most often
    /// over the last steps does.
    std::deque<std::pair<int, int>> m_recent_worst;
    ForceRecord m_forces;
};

/// Solver settings for a case (mode, pressure solver, CFL; for the circle: no far-field vortex,
/// the start spin).
SolverSettings solver_settings_for(const CaseSpec& spec);

/// How the surface forces of a case are integrated: moments about the quarter chord of a
/// section, about the centre of the circle.
SurfaceForceOptions surface_force_options(const CaseSpec& spec);

/// What the post-processing of the case's fields looks at ([post] places, moment reference,
/// circle or section, steady or not).
AnalysisPlaces analysis_places(const CaseSpec& spec);

}  // namespace veer
