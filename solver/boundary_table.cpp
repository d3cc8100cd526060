#include "solver/boundary_table.hpp"

namespace veer {

VariableConditions conditions_for(FaceRole role) {
    switch (role) {
        case FaceRole::wall:
        case FaceRole::inflow:
        case FaceRole::prescribed_velocity:
            return {Condition::dirichlet, Condition::neumann, Condition::neumann};
        case FaceRole::outflow:
            return {Condition::neumann, Condition::dirichlet, Condition::dirichlet};
    }
    VEER_VERIFY(false, "unknown face role");
}

const ScalarCondition& ScalarColumn::on(FaceRole role) const {
    switch (role) {
        case FaceRole::wall:
            return wall;
        case FaceRole::inflow:
            return inflow;
        case FaceRole::outflow:
            return outflow;
        case FaceRole::prescribed_velocity:
            return prescribed_velocity;
    }
    VEER_VERIFY(false, "unknown face role");
}

std::optional<FaceRole> resolve_role(SegmentKind kind, bool free_stream_enters, bool overridden) {
    if (kind == SegmentKind::wake_cut || kind == SegmentKind::periodic) return std::nullopt;
    if (overridden) return FaceRole::prescribed_velocity;
    switch (kind) {
        case SegmentKind::wall:
            return FaceRole::wall;
        case SegmentKind::far_field:
            return free_stream_enters ? FaceRole::inflow : FaceRole::outflow;
        case SegmentKind::outflow:
            return FaceRole::outflow;
        default:
            break;
    }
    VEER_VERIFY(false, "unknown segment kind");
}

const char* role_name(FaceRole role) {
    switch (role) {
        case FaceRole::wall:
            return "wall";
        case FaceRole::inflow:
            return "inflow";
        case FaceRole::outflow:
            return "outflow";
        case FaceRole::prescribed_velocity:
            return "prescribed velocity";
    }
    return "?";
}

}  // namespace veer
