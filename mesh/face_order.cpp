#include "mesh/face_order.hpp"

namespace veer {

std::optional<BackwardFace> find_backward_face(const GridMetrics& m) {
    const int ni = m.ni, nj = m.nj;
    const auto backward = [&](Vec2 area, std::size_t minus, std::size_t plus) {
        return !(dot(area, m.centroid[plus] - m.centroid[minus]) > 0.0);
    };
    for (int j = 0; j < nj; ++j)
        for (int f = 1; f < ni; ++f)
            if (backward(m.area_i[m.face_i(f, j)], m.cell(f - 1, j), m.cell(f, j)))
                return BackwardFace{true, f, j, m.face_center_i[m.face_i(f, j)]};
    for (int f = 1; f < nj; ++f)
        for (int i = 0; i < ni; ++i)
            if (backward(m.area_j[m.face_j(i, f)], m.cell(i, f - 1), m.cell(i, f)))
                return BackwardFace{false, i, f, m.face_center_j[m.face_j(i, f)]};
    return std::nullopt;
}

}  // namespace veer
