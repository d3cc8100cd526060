#include "solver/poisson_stencil.hpp"

#include <algorithm>

namespace veer {

bool PoissonStencil::has_dirichlet() const {
    auto flagged = [](const std::vector<std::uint8_t>& f) {
        return std::any_of(f.begin(), f.end(), [](std::uint8_t x) { return x != 0; });
    };
    return flagged(dirichlet_i) || flagged(dirichlet_j);
}

}  // namespace veer
