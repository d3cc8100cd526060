#include "mesh/segment_distance.hpp"

#include <algorithm>

namespace veer {

double point_segment_distance(Vec2 p, Vec2 a, Vec2 b) {
    const Vec2 ab = b - a;
    const double len2 = dot(ab, ab);
    const double t = len2 > 0.0 ? std::clamp(dot(p - a, ab) / len2, 0.0, 1.0) : 0.0;
    return norm(p - (a + t * ab));
}

}  // namespace veer
