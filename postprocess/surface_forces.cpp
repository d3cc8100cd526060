#include "postprocess/surface_forces.hpp"

#include "postprocess/free_stream.hpp"

namespace veer {

namespace {

CoefficientParts make_parts(double pressure, double friction) {
    return {pressure + friction, pressure, friction};
}

}  // namespace

SurfaceForces integrate_surface_forces(const std::vector<WallFaceState>& wall,
                                       const FlowConditions& conditions,
                                       const SurfaceForceOptions& options) {
    Vec2 fp, ff;
    double mp = 0.0, mf = 0.0;  // counter-clockwise moments about the reference
    for (const WallFaceState& f : wall) {
        const Vec2 dfp = (-f.pressure * f.length) * f.normal;
        const Vec2 dff = (f.shear * f.length) * f.tangent;
        const Vec2 arm = f.center - options.moment_reference;
        fp = fp + dfp;
        ff = ff + dff;
        mp += cross(arm, dfp);
        mf += cross(arm, dff);
    }
    const Vec2 e_lift = lift_direction(conditions.alpha_deg);
    const Vec2 e_drag = drag_direction(conditions.alpha_deg);
    const double scale = 1.0 / free_stream_dynamic_pressure;  // chord 1
    SurfaceForces out;
    out.cl = make_parts(scale * dot(fp, e_lift), scale * dot(ff, e_lift));
    out.cd = make_parts(scale * dot(fp, e_drag), scale * dot(ff, e_drag));
    out.cm = make_parts(-scale * mp, -scale * mf);  // counter-clockwise is nose-down
    out.force_pressure = fp;
    out.force_friction = ff;
    return out;
}

SurfaceForces integrate_surface_forces(const StructuredGrid& grid, const GridMetrics& metrics,
                                       const FlowFields& fields, const FlowConditions& conditions,
                                       const SurfaceForceOptions& options) {
    const std::vector<WallFaceState> wall =
        evaluate_wall_faces(grid, metrics, fields, conditions, options.wall_pressure);
    return integrate_surface_forces(wall, conditions, options);
}

}  // namespace veer
