#include "postprocess/recirculation.hpp"

#include "mesh/errors.hpp"

namespace veer {

std::optional<double> recirculation_length(const StructuredGrid& grid, const GridMetrics& metrics,
                                           const FlowFields& fields) {
    VEER_VERIFY(grid.c_layout() && grid.c_layout()->closed(),
                "the recirculation length is read on the seam of an O-grid");
    VEER_VERIFY(fields.ni == grid.ni() && fields.nj == grid.nj(), "fields do not match the grid");
    const Vec2 rear = grid.node(0, 0);
    const int last = grid.ni() - 1;
    double s_before = 0.0, u_before = 0.0;
    for (int j = 0; j < grid.nj(); ++j) {
        const std::size_t f = metrics.face_i(0, j);
        const double u = 0.5 * (fields.u[metrics.cell(0, j)] + fields.u[metrics.cell(last, j)]);
        const double s = norm(metrics.face_center_i[f] - rear);
        if (u >= 0.0) {
            if (j == 0) return 0.0;
            return s_before + (s - s_before) * (-u_before) / (u - u_before);
        }
        s_before = s;
        u_before = u;
    }
    return std::nullopt;
}

}  // namespace veer
