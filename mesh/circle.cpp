#include "mesh/circle.hpp"

#include <cmath>
#include <numbers>
#include <sstream>

#include "mesh/errors.hpp"

namespace veer {

std::vector<Vec2> circle_surface(int around) {
    if (around < 16 || around % 2 != 0) {
        std::ostringstream msg;
        msg << "mesh: around = " << around
            << " is out of range for a circle; allowed: an even integer of at least 16";
        throw InputError(msg.str());
    }
    const int half = around / 2;
    std::vector<Vec2> nodes(static_cast<std::size_t>(around + 1));
    for (int k = 0; k <= half; ++k) {
        // Clockwise from the rear point: the lower half first, as a section's lower surface.
        const double theta = std::numbers::pi * k / half;
        const Vec2 p{circle_centre.x + 0.5 * std::cos(theta), -0.5 * std::sin(theta)};
        nodes[static_cast<std::size_t>(k)] = p;
        nodes[static_cast<std::size_t>(around - k)] = {p.x, -p.y};
    }
    nodes[static_cast<std::size_t>(half)] = {0.0, 0.0};  // the front point, exactly
    nodes.front() = nodes.back() = {1.0, 0.0};
    return nodes;
}

Section circle_section(int around, const std::string& name) {
    Section s;
    s.name = name;
    s.points = circle_surface(around);
    s.leading_edge = static_cast<std::size_t>(around / 2);
    return s;
}

double angle_from_rear_deg(Vec2 point) {
    const Vec2 r = point - circle_centre;
    return std::atan2(std::abs(r.y), r.x) * 180.0 / std::numbers::pi;
}

}  // namespace veer
