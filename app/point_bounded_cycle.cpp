#include "app/point_bounded_cycle.hpp"

#include <fmt/format.h>

namespace veer {

/// The half band is the point's own uncertainty (cl_amplitude and the others); the point is
/// never "converged steady".
void take_bounded_cycle(PointRecord& r, const BoundedCycle& c, const std::string& why) {
    r.regime = "steady";
    r.status = "bounded cycle";
    r.cl_basis = fmt::format(
        "settled in a bounded cycle: mean over its last {} iterations; Cl +- {:.1e} Cd +- {:.1e} "
        "(half peak-to-peak)",
        c.iterations, c.cl_half_band, c.cd_half_band);
    r.cl = c.cl;
    r.cd = c.cd;
    r.cm = c.cm;
    r.cl_amplitude = c.cl_half_band;
    r.cd_amplitude = c.cd_half_band;
    r.cm_amplitude = c.cm_half_band;
    r.cycles = c.cycles;
    r.note = fmt::format(
        "{}; its forces circle in a bounded cycle ({} cycles over the last {} iterations: Cl "
        "{:.5f} +- {:.2e}, Cd {:.5f} +- {:.2e}, half peak-to-peak), reported as the cycle's mean "
        "with that band as its uncertainty; the control-volume lift and the surface pictures are "
        "of the last iteration",
        why, c.cycles, c.iterations, c.cl, c.cl_half_band, c.cd, c.cd_half_band);
}

}  // namespace veer
