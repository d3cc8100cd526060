#include "postprocess/contour_sampling.hpp"

#include "postprocess/cell_gradients.hpp"

namespace veer {

namespace {

struct CellSample {
    double u, v, p;
    Vec2 grad_u, grad_v, grad_p;
};

CellSample sample_cell(const StructuredGrid& grid, const GridMetrics& m, const FlowFields& f,
                       std::size_t c) {
    const int i = static_cast<int>(c % static_cast<std::size_t>(m.ni));
    const int j = static_cast<int>(c / static_cast<std::size_t>(m.ni));
    return {f.u[c],
            f.v[c],
            f.pressure[c],
            least_squares_gradient(grid, m, f.u, i, j),
            least_squares_gradient(grid, m, f.v, i, j),
            least_squares_gradient(grid, m, f.pressure, i, j)};
}

}  // namespace

FaceFlow sample_face(const StructuredGrid& grid, const GridMetrics& m, const FlowFields& fields,
                     const ContourFace& face) {
    const CellSample a = sample_cell(grid, m, fields, face.cell_in);
    const CellSample b = sample_cell(grid, m, fields, face.cell_out);
    const Vec2 ra = face.center - m.centroid[face.cell_in];
    const Vec2 rb = face.center - m.centroid[face.cell_out];
    const double wa = 1.0 - face.weight, wb = face.weight;
    auto blend = [&](double qa, Vec2 ga, double qb, Vec2 gb) {
        return wa * (qa + dot(ga, ra)) + wb * (qb + dot(gb, rb));
    };
    FaceFlow out;
    out.velocity = {blend(a.u, a.grad_u, b.u, b.grad_u), blend(a.v, a.grad_v, b.v, b.grad_v)};
    out.pressure = blend(a.p, a.grad_p, b.p, b.grad_p);
    if (fields.eddy_viscosity.size() == fields.u.size())
        out.eddy_viscosity =
            wa * fields.eddy_viscosity[face.cell_in] + wb * fields.eddy_viscosity[face.cell_out];
    out.grad_u = wa * a.grad_u + wb * b.grad_u;
    out.grad_v = wa * a.grad_v + wb * b.grad_v;
    return out;
}

}  // namespace veer
