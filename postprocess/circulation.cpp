#include "postprocess/circulation.hpp"

#include "postprocess/contour_sampling.hpp"

namespace veer {

ContourCirculation contour_circulation(const StructuredGrid& grid, const GridMetrics& metrics,
                                       const FlowFields& fields, const GridContour& contour) {
    VEER_VERIFY(fields.ni == grid.ni() && fields.nj == grid.nj(), "fields do not match the grid");
    double gamma = 0.0;
    for (const ContourFace& face : contour_faces(metrics, grid, contour))
        gamma += dot(sample_face(grid, metrics, fields, face).velocity, face.step());
    return {contour, gamma, 2.0 * gamma};
}

std::vector<ContourCirculation> contour_circulation(const StructuredGrid& grid,
                                                    const GridMetrics& metrics,
                                                    const FlowFields& fields,
                                                    const std::vector<GridContour>& contours) {
    std::vector<ContourCirculation> out;
    out.reserve(contours.size());
    for (const GridContour& c : contours)
        out.push_back(contour_circulation(grid, metrics, fields, c));
    return out;
}

}  // namespace veer
