#include "postprocess/control_volume.hpp"

#include "postprocess/contour_sampling.hpp"
#include "postprocess/free_stream.hpp"

namespace veer {

namespace {

/// Viscous traction tau.A on a face.
Vec2 viscous_traction(double nu_eff, const FaceFlow& f, Vec2 a) {
    const double txx = 2.0 * nu_eff * f.grad_u.x, tyy = 2.0 * nu_eff * f.grad_v.y;
    const double txy = nu_eff * (f.grad_u.y + f.grad_v.x);
    return {txx * a.x + txy * a.y, txy * a.x + tyy * a.y};
}

/// d/dt of the momentum inside the contour, first-order backward difference.
Vec2 momentum_rate(const GridMetrics& m, const StructuredGrid& grid, const FlowFields& now,
                   const GridContour& contour, const ControlVolumeOptions& options) {
    if (options.previous == nullptr) return {};
    VEER_VERIFY(options.dt > 0.0, "the rate-of-change term needs a positive time step");
    const FlowFields& before = *options.previous;
    VEER_VERIFY(before.u.size() == now.u.size(), "previous fields do not match the grid");
    Vec2 rate;
    for (std::size_t c : contour_cells(m, grid, contour))
        rate = rate + m.volume[c] * Vec2{now.u[c] - before.u[c], now.v[c] - before.v[c]};
    return (1.0 / options.dt) * rate;
}

}  // namespace

Vec2 contour_momentum(const GridMetrics& metrics, const StructuredGrid& grid,
                      const FlowFields& fields, const GridContour& contour) {
    VEER_VERIFY(fields.u.size() == metrics.volume.size(), "fields do not match the grid");
    Vec2 sum;
    for (std::size_t c : contour_cells(metrics, grid, contour))
        sum = sum + metrics.volume[c] * Vec2{fields.u[c], fields.v[c]};
    return sum;
}

namespace {

MomentumParts project(Vec2 pressure, Vec2 flux, Vec2 viscous, Vec2 unsteady, Vec2 direction) {
    const double s = 1.0 / free_stream_dynamic_pressure;  // chord 1
    MomentumParts p;
    p.pressure = s * dot(pressure, direction);
    p.momentum_flux = s * dot(flux, direction);
    p.viscous = s * dot(viscous, direction);
    p.unsteady = s * dot(unsteady, direction);
    p.total = p.pressure + p.momentum_flux + p.viscous + p.unsteady;
    return p;
}

}  // namespace

ContourForces contour_forces(const StructuredGrid& grid, const GridMetrics& metrics,
                             const FlowFields& fields, const FlowConditions& conditions,
                             const GridContour& contour, const ControlVolumeOptions& options) {
    VEER_VERIFY(fields.ni == grid.ni() && fields.nj == grid.nj(), "fields do not match the grid");
    const double nu = 1.0 / conditions.reynolds;
    Vec2 pressure, flux, viscous;
    for (const ContourFace& face : contour_faces(metrics, grid, contour)) {
        const FaceFlow f = sample_face(grid, metrics, fields, face);
        pressure = pressure - f.pressure * face.area_out;
        flux = flux - dot(f.velocity, face.area_out) * f.velocity;
        viscous = viscous + viscous_traction(nu + f.eddy_viscosity, f, face.area_out);
    }
    const Vec2 unsteady = -1.0 * momentum_rate(metrics, grid, fields, contour, options);
    ContourForces out;
    out.contour = contour;
    out.force = pressure + flux + viscous + unsteady;
    out.cl = project(pressure, flux, viscous, unsteady, lift_direction(conditions.alpha_deg));
    out.cd = project(pressure, flux, viscous, unsteady, drag_direction(conditions.alpha_deg));
    return out;
}

std::vector<ContourForces> contour_forces(const StructuredGrid& grid, const GridMetrics& metrics,
                                          const FlowFields& fields,
                                          const FlowConditions& conditions,
                                          const std::vector<GridContour>& contours,
                                          const ControlVolumeOptions& options) {
    std::vector<ContourForces> out;
    out.reserve(contours.size());
    for (const GridContour& c : contours)
        out.push_back(contour_forces(grid, metrics, fields, conditions, c, options));
    return out;
}

}  // namespace veer
