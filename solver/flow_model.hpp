#pragma once
/// The one interface through which a turbulence (or transition) model plugs into the flow
/// solver. A model declares its transported variables (name, progress-line label, boundary
/// column), advances its own equations once per flow step, reports a residual per variable,
/// gives the momentum equations an eddy viscosity (or none) and lists the cell fields it adds
/// to the output. The solver, the convergence monitor, history.csv, the progress line, the
/// checkpoint, the VTK frames and restarts loop over what the model declares; nothing outside
/// the model's own files names its variables. README.md, "How to add a model", gives the steps.
#include <functional>
#include <map>
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/boundary_faces.hpp"
#include "solver/boundary_table.hpp"
#include "solver/cell_field.hpp"
#include "solver/connectivity.hpp"
#include "solver/face_geometry.hpp"
#include "solver/named_array.hpp"

namespace veer {

/// One transported variable of a model.
struct ModelVariable {
    /// Its name: the checkpoint array, the VTK cell array, the history column residual_NAME and
    /// the restart key. Letters, digits and '_' only.
    std::string name;
    std::string label;    ///< short label of its residual on the progress line
    ScalarColumn column;  ///< its conditions per boundary role (boundary_table.hpp)
};

/// Numbers a case gives its model in the [flow] table, by key (the model's keys below); the case
/// file reader fills them, `check` and `run` alike.
using ModelOptions = std::map<std::string, double>;

/// A number key of the [flow] table that a model reads (e.g. a trip position).
struct ModelKey {
    std::string name;     ///< the key, e.g. "trip_upper"
    double lowest = 0.0;  ///< the accepted range, inclusive
    double highest = 0.0;
    std::string allowed;  ///< the range in words for messages, e.g. "a chord fraction from 0 to 1"
};

/// What a model is built from. grid and metrics are valid during construction only; geom,
/// faces and connectivity belong to the solver and outlive the model (it may keep pointers).
struct ModelSetup {
    const StructuredGrid& grid;
    const GridMetrics& metrics;
    const FaceGeometry& geom;
    const std::vector<BoundaryFace>& faces;
    const Connectivity& connectivity;
    double nu = 0.0;            ///< molecular kinematic viscosity, 1 / Re
    ModelOptions options = {};  ///< the values of the model's keys the case gave
};

/// What one model step reads: the flow after its update.
struct ModelStepInputs {
    CellView u, v;  ///< velocity, ghosts filled from the boundary table (free-stream units)
    const std::vector<double>* flux_i = nullptr;  ///< face fluxes towards +i (chords^2 / time)
    const std::vector<double>* flux_j = nullptr;  ///< face fluxes towards +j
    CellView local_dt;  ///< steady: per-cell pseudo-time steps (time units); else empty
    double dt = 0.0;    ///< time-accurate: the step
    bool steady = true;
};

/// What one model step did.
struct ModelStepReport {
    /// Per variable (the order of variables()): rms over the cells of (q_new - q) / dt, the
    /// variable's units per time unit; the convergence monitor holds each to its own reference.
    std::vector<double> residuals;
    bool finite = true;            ///< every value of every variable finite
    int worst_i = 0, worst_j = 0;  ///< the first non-finite cell when !finite
    std::string worst_variable;    ///< its variable's name when !finite
};

/// A model of the flow's turbulence. Chosen at run time by name (model_registry.hpp).
class FlowModel {
public:
    virtual ~FlowModel() = default;

    /// The transported variables, in a fixed order (empty: nothing to advance).
    virtual const std::vector<ModelVariable>& variables() const = 0;

    /// One step of the model's own equations (called after each flow step).
    virtual ModelStepReport advance(const ModelStepInputs& in) = 0;

    /// Whether the model adds an eddy viscosity to the momentum diffusion.
    virtual bool has_eddy_viscosity() const = 0;
    /// Cell eddy viscosity, ni * nj (chords x free-stream speed; zeros without one).
    virtual std::vector<double> eddy_viscosity() const = 0;
    /// Eddy viscosity on the i- and j-faces (FaceGeometry layouts), added to nu in momentum.
    virtual void face_eddy_viscosity(std::vector<double>& on_i,
                                     std::vector<double>& on_j) const = 0;

    /// The transported variables at the cells, named as variables() (the restart state).
    virtual std::vector<NamedArray> values() const = 0;
    /// Replaces the variables named in `arrays` (others keep their values); the solver checks
    /// names and sizes first.
    virtual void set_values(const std::vector<NamedArray>& arrays) = 0;
    /// Whether the model's own line solves continue their j-lines across the wake cut
    /// (wall_normal_lines.hpp): the steady scheme's choice, set after construction and on a
    /// hand-over between schemes; the converged state does not depend on it. Models without
    /// line solves ignore it.
    virtual void fold_wake_cut_lines(bool /*fold*/) {}
    /// Further cell fields for the output frames (e.g. an intermittency); none by default.
    virtual std::vector<NamedArray> output_fields() const { return {}; }
};

/// A model as the case file and the solver know it: its name, its defaults, how to build it.
struct ModelDescriptor {
    std::string name;         ///< the case file's [flow] model, e.g. "laminar"
    std::string description;  ///< one line for messages
    /// Steady runs: the pseudo CFL number when the case gives none ([run] cfl = 0).
    double steady_pseudo_cfl = 5.0;
    /// Time-accurate runs: the CFL number when the case gives none.
    double time_accurate_cfl = 4.0;
    /// The first-cell height from this y+ when the case gives neither first_cell nor y_plus
    /// (wall-resolved models); none: the mesh default.
    std::optional<double> default_y_plus;
    /// The [flow] number keys the model reads besides the common ones (README, case files).
    std::vector<ModelKey> keys;
    /// Checks the values of those keys together (keys that exclude each other); throws
    /// InputError naming them. Empty: any combination within the ranges is accepted.
    std::function<void(const ModelOptions&)> check_options;
    /// The values the case gave for the keys; handed to make through ModelSetup::options.
    ModelOptions options;
    /// Builds the model for one solver.
    std::function<std::unique_ptr<FlowModel>(const ModelSetup&)> make;
};

}  // namespace veer
