#pragma once
/// A study as the case file describes it: geometry, grid, flow, run and post-processing settings,
/// every choice typed (the words are read once, io/case_choices.hpp).
#include <filesystem>
#include <optional>
#include <string>
#include <vector>

#include "mesh/cgrid_spec.hpp"
#include "mesh/naca.hpp"
#include "mesh/section.hpp"
#include "solver/flow_fields.hpp"
#include "solver/flow_model.hpp"
#include "solver/laminar_model.hpp"
#include "solver/pressure_solver.hpp"
#include "solver/solver_settings.hpp"

namespace veer {

/// [geometry]: a NACA designation, a coordinate file or the circle (exactly one of them).
struct GeometrySpec {
    std::string naca;                   ///< e.g. "0012", "23012"; empty when a file is used
    std::filesystem::path coordinates;  ///< resolved against the case file's folder
    TrailingEdge trailing_edge = TrailingEdge::open;  ///< NACA only: the thickness variant
    /// A circular cylinder of diameter 1, meshed as an O-grid; the diameter is the reference
    /// length in place of the chord (Reynolds number, coefficients, distances).
    bool circle = false;
    /// Coordinate files only: which line is the chord line (mesh/section.hpp).
    ChordLineChoice chord_line = ChordLineChoice::automatic;
    std::string name;  ///< label for reports
};

/// [run]: how the solution is marched and written.
struct RunSpec {
    /// "steady" (pseudo-time marching to convergence) or "unsteady" (time-accurate)
    TimeMode mode = TimeMode::steady;
    long steps = 20000;             ///< iteration cap
    double end_time = 20.0;         ///< unsteady: chord / free-stream-speed units
    double cfl = 0.0;               ///< 0: the solver's default for the mode
    double residual_drop = 1e-6;    ///< steady: residuals must fall by this factor
    double force_tolerance = 1e-5;  ///< steady: Cl, Cd change per 100 steps below this
    /// steady: Cl and Cd also count as settled when they settle geometrically with an estimated
    /// remaining change below a tenth of force_tolerance (app/geometric_tail.hpp); false: only
    /// the 100-step window decides.
    bool settle_estimate = true;
    long output_every = 0;        ///< field frame interval in steps; 0: first and last only
    long checkpoint_every = 500;  ///< checkpoint interval in steps
    PressureSolverKind pressure_solver = PressureSolverKind::multigrid;
    SteadyScheme steady_scheme = SteadyScheme::fast;  ///< steady: the path (same result)
    /// Circle, unsteady: surface speed (free-stream units) of a brief counter-clockwise spin of
    /// the body at the start, start_spin sin(pi t / 2) for 0 < t < 2, which breaks the symmetry
    /// of the start so that shedding begins within a few cycles (0: none).
    double start_spin = 0.0;
};

/// [post]: where the control-volume contours and wake stations lie.
struct PostSpec {
    std::vector<double> contours = {0.5, 1.0, 2.0, 4.0};   ///< distances from the section, chords
    std::vector<double> wake_stations = {0.25, 1.0, 3.0};  ///< chords behind the trailing edge
};

/// A whole case file, validated.
struct CaseSpec {
    std::filesystem::path path;  ///< the case file ("<command line>" for built-in cases)
    std::string text;            ///< the file's text after command-line overrides
    GeometrySpec geometry;
    CGridSpec mesh;
    std::optional<double> y_plus;  ///< set when [mesh] y_plus chose the first cell
    FlowConditions flow;
    ModelDescriptor model = laminar_descriptor();  ///< [flow] model, from the model registry
    RunSpec run;
    PostSpec post;
};

}  // namespace veer
