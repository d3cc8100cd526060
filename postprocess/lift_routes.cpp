#include "postprocess/lift_routes.hpp"

#include <algorithm>
#include <cmath>

namespace veer {

std::vector<RouteComparison> compare_routes(const SurfaceForces& surface,
                                            const std::vector<ContourForces>& momentum,
                                            const std::vector<ContourCirculation>& circulation) {
    VEER_VERIFY(momentum.size() == circulation.size(),
                "momentum and circulation routes need the same contours");
    std::vector<RouteComparison> out;
    out.reserve(momentum.size());
    for (std::size_t k = 0; k < momentum.size(); ++k) {
        const ContourForces& m = momentum[k];
        const ContourCirculation& c = circulation[k];
        VEER_VERIFY(m.contour.line_j == c.contour.line_j && m.contour.cut_i == c.contour.cut_i,
                    "momentum and circulation routes on different contours");
        RouteComparison r;
        r.contour = m.contour;
        r.cl_momentum = m.cl.total;
        r.cd_momentum = m.cd.total;
        r.cl_circulation = c.cl;
        r.cl_momentum_difference = m.cl.total - surface.cl.total;
        r.cd_momentum_difference = m.cd.total - surface.cd.total;
        r.cl_circulation_difference = c.cl - surface.cl.total;
        out.push_back(r);
    }
    return out;
}

double largest_lift_disagreement(const std::vector<RouteComparison>& routes) {
    double worst = 0.0;
    for (const RouteComparison& r : routes)
        worst = std::max(worst, std::abs(r.cl_momentum_difference));
    return worst;
}

}  // namespace veer
