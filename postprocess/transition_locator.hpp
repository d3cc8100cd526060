#pragma once
/// Where the boundary layer turns turbulent, from the Spalart–Allmaras turbulence index
/// (Spalart & Allmaras 1994, La Recherche Aérospatiale 1, 5–21):
///
///   i_t = (d nu~/dn)_wall / (kappa sqrt(nu Omega_wall)),   kappa = 0.41
///
/// about 0 in a laminar layer and 1 in a turbulent one (in the log layer nu~ = kappa u_tau d).
/// At a no-slip wall the vorticity is |du_t/dn|, so nu Omega_wall = |tau_w| and the denominator
/// is kappa u_tau. d nu~/dn is taken one-sided through the first two cells, nu~(d) = A d + B d^2
/// with nu~(0) = 0: the stencil of the wall shear (wall_faces.hpp).
///
/// Criterion (our choice, stated here and in README): a surface is transitional from the first
/// point, walking aft from the stagnation point, where i_t rises through 0.5 — halfway between
/// the index's laminar and turbulent ends — and stays at or above it over the next 0.02 chords
/// of arc (or to the trailing edge). The hold skips the spikes of i_t where the wall shear passes
/// through zero (separation and reattachment: u_tau -> 0) without the layer being turbulent.
#include <optional>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "postprocess/separation.hpp"
#include "postprocess/surface_distribution.hpp"
#include "postprocess/wall_faces.hpp"

namespace veer {

/// The name the Spalart–Allmaras family's models give nu~ among their variables (the model files
/// in solver/); the analysis finds the index's input by it.
inline constexpr const char* sa_working_variable = "nu_tilde";

/// The turbulence index on the wall faces, by face index i along the C.
struct WallTurbulenceIndex {
    int first_i = 0;             ///< i of values[0] (the first wall face)
    std::vector<double> values;  ///< one per wall face; NaN where the wall shear is exactly zero
    double at(int i) const;      ///< the value on face i (checked)
};

/// i_t on every wall face from the cell values of nu~ (ni * nj, i fastest) and the wall states
/// of the same fields (evaluate_wall_faces).
WallTurbulenceIndex turbulence_index(const StructuredGrid& grid, const GridMetrics& metrics,
                                     const std::vector<double>& nu_tilde,
                                     const std::vector<WallFaceState>& wall);

/// The criterion above; the defaults are the ones every output of veer uses.
struct TransitionCriterion {
    double threshold = 0.5;  ///< i_t level taken as turbulent
    double hold_arc = 0.02;  ///< chords of arc over which i_t must stay at or above it
};

/// Where one surface turns turbulent (points ordered from the leading edge aft, as
/// surface_distribution gives them), ignoring points with arc < start_arc (ahead of the
/// stagnation point). Interpolated linearly in arc between the last point below the threshold and
/// the first at or above it; the first point itself when the surface is turbulent from there on;
/// nothing when it stays laminar (or i_t never holds) to the trailing edge.
std::optional<SurfaceLocation> find_surface_transition(const std::vector<SurfacePoint>& side,
                                                       const WallTurbulenceIndex& index,
                                                       double start_arc,
                                                       const TransitionCriterion& criterion = {});

/// Transition on both surfaces, each walked from the stagnation point (separation.hpp) aft.
struct TransitionReport {
    std::optional<SurfaceLocation> upper;
    std::optional<SurfaceLocation> lower;
    /// Turbulent from the first point walked (the leading edge, or the stagnation point on its
    /// surface): no laminar part at all, as fully turbulent Spalart–Allmaras gives. Outputs word
    /// it "turbulent from the leading edge" rather than give the first face's x/c.
    bool upper_from_leading_edge = false, lower_from_leading_edge = false;
};

TransitionReport find_transition(const SurfaceDistribution& distribution,
                                 const WallTurbulenceIndex& index,
                                 const SurfaceLocation& stagnation,
                                 const TransitionCriterion& criterion = {});

/// The x/c a reader is given for a transition position: never ahead of the leading edge. On a
/// cambered section at high alpha the first wall face walked can lie a little ahead of x = 0
/// (x/c -0.0002 measured with fully turbulent Spalart–Allmaras on NACA 4412): that is x/c 0.
double reported_transition_x(const SurfaceLocation& at);

}  // namespace veer
