#include "solver/pressure_solver.hpp"

#include "mesh/errors.hpp"
#include "solver/multigrid_solver.hpp"
#include "solver/pressure_solver_eigen.hpp"

namespace veer {

std::unique_ptr<PressureSolver> make_pressure_solver(PressureSolverKind kind) {
    switch (kind) {
        case PressureSolverKind::multigrid:
            return std::make_unique<MultigridSolver>();
        case PressureSolverKind::eigen_cg:
            return make_eigen_cg_solver();
        case PressureSolverKind::eigen_bicgstab:
            return make_eigen_bicgstab_solver();
    }
    throw InternalError("unknown pressure solver kind");
}

std::string_view pressure_solver_kind_name(PressureSolverKind kind) {
    switch (kind) {
        case PressureSolverKind::multigrid:
            return "multigrid";
        case PressureSolverKind::eigen_cg:
            return "eigen-cg";
        case PressureSolverKind::eigen_bicgstab:
            return "eigen-bicgstab";
    }
    return "unknown";
}

}  // namespace veer
