#pragma once
/// The one table from physical boundary to mathematical condition per variable (README, table
/// "Boundary conditions", says the same; each model adds a column per transported variable).
///
/// | role                | velocity (u, v)              | pressure p         | increment phi |
/// |---------------------|------------------------------|--------------------|---------------|
/// | wall                | Dirichlet: wall velocity (0) | Neumann, dp/dn = 0 | Neumann       |
/// | inflow (far field)  | Dirichlet: free stream+vortex| Neumann            | Neumann       |
/// | outflow             | Neumann, du/dn = 0           | Dirichlet: p_far   | Dirichlet, 0  |
/// | prescribed velocity | Dirichlet: u(x, t) given     | Neumann            | Neumann       |
/// | wake cut, periodic  | connectivity (partner cell)  | connectivity       | connectivity  |
///
/// A far-field face is an inflow where the free stream enters (U_inf . n_out < 0), an outflow
/// elsewhere; outflow segments are outflows. p_far = (1 - |u_far|^2) / 2 (Bernoulli with the
/// far-field velocity, so p_far = 0 without the vortex correction).
#include <functional>
#include <optional>

#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// What a boundary face is, once the segment kind and the flow direction are known.
enum class FaceRole { wall, inflow, outflow, prescribed_velocity };

/// Mathematical condition of one variable on a face.
enum class Condition { dirichlet, neumann };

/// Conditions of the variables of the projection method on one face role.
struct VariableConditions {
    Condition velocity;
    Condition pressure;
    Condition pressure_increment;
};

/// The table above, one row.
VariableConditions conditions_for(FaceRole role);

/// The condition of a model's transported variable on one role: Dirichlet with a value (a
/// constant, or a function of the face centre where `value_at` is set) or Neumann (zero normal
/// gradient; the value is unused).
struct ScalarCondition {
    Condition kind = Condition::neumann;
    double value = 0.0;
    std::function<double(Vec2 face_center)> value_at;
};

/// A model variable's column of the table: its condition on each role (the wake cut and periodic
/// sides are connectivity, as for every variable). Each model declares one per transported
/// variable (flow_model.hpp); boundary_ghosts.hpp turns it into per-face conditions and ghosts.
struct ScalarColumn {
    ScalarCondition wall, inflow, outflow, prescribed_velocity;
    const ScalarCondition& on(FaceRole role) const;
};

/// The role of a physical boundary face of a segment of `kind`; `free_stream_enters` is
/// U_inf . n_out < 0 on that face; `overridden` where a per-segment velocity override applies.
/// Returns nothing for connectivity kinds (wake cut, periodic).
std::optional<FaceRole> resolve_role(SegmentKind kind, bool free_stream_enters, bool overridden);

/// Short name of a role (for messages).
const char* role_name(FaceRole role);

}  // namespace veer
