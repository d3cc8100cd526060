#include "solver/steady_scheme.hpp"

namespace veer {

SteadySchemeChoices steady_scheme_choices(SteadyScheme scheme, double classic_pseudo_cfl) {
    SteadySchemeChoices c;
    if (scheme == SteadyScheme::classic) {
        c.pseudo_cfl = classic_pseudo_cfl;
        return c;
    }
    c.pseudo_cfl = fast_pseudo_cfl;
    c.momentum_sweeps = fast_momentum_sweeps;
    c.fold_wake_cut = true;
    c.projection_fraction = fast_projection_fraction;
    c.eddy_viscosity_relaxation = fast_eddy_viscosity_relaxation;
    return c;
}

}  // namespace veer
