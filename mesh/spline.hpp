#pragma once
/// Parametric cubic spline through a polyline, in cumulative chord length.
#include <cstddef>
#include <vector>

#include "mesh/vec2.hpp"

namespace veer {

/// Interpolating cubic spline x(s), y(s) with natural end conditions (zero second derivative at
/// both ends); s is the cumulative chord length of the points (same units as the points).
class ParametricSpline {
public:
    /// Needs at least two points and no two consecutive points equal.
    explicit ParametricSpline(const std::vector<Vec2>& points);

    /// Parameter of each point (s of point k = knots()[k]); knots().front() == 0.
    const std::vector<double>& knots() const { return m_knots; }
    /// Total parameter length (the polyline length).
    double length() const { return m_knots.back(); }

    /// Position at s (clamped to [0, length()]); at a knot it returns that point exactly.
    Vec2 position(double s) const;
    /// d(x, y)/ds at s.
    Vec2 first_derivative(double s) const;
    /// d^2(x, y)/ds^2 at s.
    Vec2 second_derivative(double s) const;
    /// Signed curvature at s (1/length): positive where the curve turns counter-clockwise.
    double curvature(double s) const;
    /// Parameter of the point of the spline nearest to p.
    double nearest_parameter(Vec2 p) const;

private:
    struct Piece {
        double a, b, c, d;  ///< value a + b t + c t^2 + d t^3, t = s - knot
    };
    std::size_t segment(double s) const;

    std::vector<double> m_knots;
    std::vector<Piece> m_x;
    std::vector<Piece> m_y;
};

}  // namespace veer
