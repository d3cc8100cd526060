#pragma once
// Manufactured pressure problems shared by the Eigen and multigrid tests: the right-hand side is
// the discrete L applied to a known field, so the exact discrete solution is that field.
#include <cmath>
#include <string>
#include <vector>

#include "pressure_test_grids.hpp"
#include "solver/pressure_operator.hpp"

namespace veer::test {

struct ManufacturedProblem {
    std::string label;
    PoissonStencil stencil;
    std::vector<double> exact;  ///< zero mean where the operator is singular
    std::vector<double> rhs;    ///< L(exact)
};

inline ManufacturedProblem manufacture(std::string label, const StructuredGrid& g,
                                       const FaceFlags& flags) {
    const auto m = compute_metrics(g);
    ManufacturedProblem pb{std::move(label), assemble_laplacian(g, m, flags.i, flags.j), {}, {}};
    pb.exact = at_centroids(m, smooth_test_field);
    const auto op = make_pressure_operator(pb.stencil);
    if (op.singular) remove_mean(pb.exact);
    apply_operator(op, pb.exact, pb.rhs);
    for (double& v : pb.rhs) v = -v;  // apply_operator gives A = -L
    return pb;
}

/// C-like grid, far field Dirichlet, wall and outlets Neumann (aspect ratios up to ~1e3).
inline ManufacturedProblem c_grid_problem(int around = 64, int normal = 32, int wake = 16) {
    const auto g = make_c_grid(around, normal, wake, 1e-4);
    return manufacture("c-grid", g, far_field_dirichlet(g.ni(), g.nj(), true, false));
}

/// C-like grid with Dirichlet only on the two outlets: mixed Dirichlet / Neumann.
inline ManufacturedProblem mixed_problem() {
    const auto g = make_c_grid(32, 16, 8, 1e-3);
    return manufacture("mixed", g, far_field_dirichlet(g.ni(), g.nj(), false, true));
}

/// C-like grid with every boundary Neumann: singular.
inline ManufacturedProblem all_neumann_problem() {
    const auto g = make_c_grid(32, 16, 8, 1e-3);
    return manufacture("all-neumann", g, far_field_dirichlet(g.ni(), g.nj(), false, false));
}

/// Distorted doubly periodic box: singular.
inline ManufacturedProblem periodic_problem() {
    const auto g = make_periodic_box(32, 16, 2.0, 1.0, 0.05);
    return manufacture("periodic", g, far_field_dirichlet(g.ni(), g.nj(), false, false));
}

inline double max_abs_difference(const std::vector<double>& a, const std::vector<double>& b) {
    double d = 0.0;
    for (std::size_t k = 0; k < a.size(); ++k) d = std::max(d, std::abs(a[k] - b[k]));
    return d;
}

inline double max_abs(const std::vector<double>& a) {
    double d = 0.0;
    for (double v : a) d = std::max(d, std::abs(v));
    return d;
}

}  // namespace veer::test
