#include "mesh/wake_cut.hpp"

#include "mesh/errors.hpp"
#include "mesh/geometric_stretching.hpp"

namespace veer {

std::vector<Vec2> build_wall_line(const std::vector<Vec2>& surface, int wake, double wake_length) {
    VEER_VERIFY(surface.size() >= 3 && wake >= 1, "build_wall_line needs a surface and a wake");
    const int around = static_cast<int>(surface.size()) - 1;
    const int ni = 2 * wake + around;
    const Vec2 te = surface.front();
    const double first =
        0.5 * (norm(surface[1] - surface[0]) + norm(surface[surface.size() - 2] - surface.back()));
    const std::vector<double> steps = geometric_steps(first, wake_length, wake);

    std::vector<Vec2> line(static_cast<std::size_t>(ni + 1));
    // Lower cut: node wake is the TE, node 0 the outlet. Upper cut: the same nodes reversed.
    double x = te.x;
    line[static_cast<std::size_t>(wake)] = te;
    for (int k = 0; k < wake; ++k) {
        x += steps[static_cast<std::size_t>(k)];
        line[static_cast<std::size_t>(wake - 1 - k)] = {x, te.y};
    }
    line[0] = {te.x + wake_length, te.y};  // the outlet exactly, free of summation round-off
    for (int m = 1; m < around; ++m)
        line[static_cast<std::size_t>(wake + m)] = surface[static_cast<std::size_t>(m)];
    for (int i = 0; i <= wake; ++i)
        line[static_cast<std::size_t>(ni - i)] = line[static_cast<std::size_t>(i)];
    return line;
}

}  // namespace veer
