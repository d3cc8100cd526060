#include "solver/pressure_solver.hpp"

#include <string>

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
            return "eigen_cg";
        case PressureSolverKind::eigen_bicgstab:
            return "eigen_bicgstab";
    }
    return "unknown";
}

PressureSolverKind parse_pressure_solver_kind(std::string_view text, std::string_view where) {
    for (auto kind : {PressureSolverKind::multigrid, PressureSolverKind::eigen_cg,
                      PressureSolverKind::eigen_bicgstab})
        if (text == pressure_solver_kind_name(kind)) return kind;
    throw InputError(std::string(where) + ": pressure solver '" + std::string(text) +
                     "' is not known; allowed: multigrid, eigen_cg, eigen_bicgstab");
}

}  // namespace veer
