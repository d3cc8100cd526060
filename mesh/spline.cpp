#include "mesh/spline.hpp"

#include <algorithm>
#include <cmath>

#include "mesh/errors.hpp"

namespace veer {
namespace {

/// Second derivatives of the natural cubic spline through (s_k, v_k): the tridiagonal system
/// h_{k-1} M_{k-1} + 2 (h_{k-1} + h_k) M_k + h_k M_{k+1} = 6 (slope_k - slope_{k-1}), M_0 = M_n =
/// 0, solved by the Thomas algorithm (diagonally dominant, so stable without pivoting).
std::vector<double> natural_second_derivatives(const std::vector<double>& s,
                                               const std::vector<double>& v) {
    const std::size_t n = s.size();
    std::vector<double> m(n, 0.0);
    if (n < 3) return m;
    std::vector<double> diag(n, 1.0), upper(n, 0.0), rhs(n, 0.0);
    for (std::size_t k = 1; k + 1 < n; ++k) {
        const double h0 = s[k] - s[k - 1];
        const double h1 = s[k + 1] - s[k];
        diag[k] = 2.0 * (h0 + h1);
        upper[k] = h1;
        rhs[k] = 6.0 * ((v[k + 1] - v[k]) / h1 - (v[k] - v[k - 1]) / h0);
    }
    for (std::size_t k = 1; k + 1 < n; ++k) {  // forward elimination; row 0 is M_0 = 0
        const double lower = k >= 2 ? s[k] - s[k - 1] : 0.0;
        const double factor = lower / diag[k - 1];
        diag[k] -= factor * upper[k - 1];
        rhs[k] -= factor * rhs[k - 1];
    }
    for (std::size_t k = n - 2; k >= 1; --k) m[k] = (rhs[k] - upper[k] * m[k + 1]) / diag[k];
    return m;
}

}  // namespace

ParametricSpline::ParametricSpline(const std::vector<Vec2>& points) {
    VEER_VERIFY(points.size() >= 2, "a spline needs at least two points");
    const std::size_t n = points.size();
    m_knots.assign(n, 0.0);
    std::vector<double> xs(n), ys(n);
    for (std::size_t k = 0; k < n; ++k) {
        xs[k] = points[k].x;
        ys[k] = points[k].y;
        if (k > 0) {
            const double h = norm(points[k] - points[k - 1]);
            VEER_VERIFY(h > 0.0, "a spline needs distinct consecutive points");
            m_knots[k] = m_knots[k - 1] + h;
        }
    }
    const std::vector<double> mx = natural_second_derivatives(m_knots, xs);
    const std::vector<double> my = natural_second_derivatives(m_knots, ys);
    const auto piece = [](double v0, double v1, double m0, double m1, double h) {
        return Piece{v0, (v1 - v0) / h - h * (2.0 * m0 + m1) / 6.0, 0.5 * m0,
                     (m1 - m0) / (6.0 * h)};
    };
    for (std::size_t k = 0; k + 1 < n; ++k) {
        const double h = m_knots[k + 1] - m_knots[k];
        m_x.push_back(piece(xs[k], xs[k + 1], mx[k], mx[k + 1], h));
        m_y.push_back(piece(ys[k], ys[k + 1], my[k], my[k + 1], h));
    }
}

std::size_t ParametricSpline::segment(double s) const {
    // upper_bound: at a knot s_k this picks the piece starting there, so t = 0 returns the point.
    const auto it = std::upper_bound(m_knots.begin(), m_knots.end(), s);
    const auto k = static_cast<std::size_t>(std::max<std::ptrdiff_t>(it - m_knots.begin() - 1, 0));
    return std::min(k, m_x.size() - 1);
}

Vec2 ParametricSpline::position(double s) const {
    s = std::clamp(s, 0.0, length());
    const std::size_t k = segment(s);
    const double t = s - m_knots[k];
    const auto eval = [t](const Piece& p) { return p.a + t * (p.b + t * (p.c + t * p.d)); };
    return {eval(m_x[k]), eval(m_y[k])};
}

Vec2 ParametricSpline::first_derivative(double s) const {
    s = std::clamp(s, 0.0, length());
    const std::size_t k = segment(s);
    const double t = s - m_knots[k];
    const auto eval = [t](const Piece& p) { return p.b + t * (2.0 * p.c + t * 3.0 * p.d); };
    return {eval(m_x[k]), eval(m_y[k])};
}

Vec2 ParametricSpline::second_derivative(double s) const {
    s = std::clamp(s, 0.0, length());
    const std::size_t k = segment(s);
    const double t = s - m_knots[k];
    const auto eval = [t](const Piece& p) { return 2.0 * p.c + 6.0 * p.d * t; };
    return {eval(m_x[k]), eval(m_y[k])};
}

double ParametricSpline::curvature(double s) const {
    const Vec2 d1 = first_derivative(s);
    const Vec2 d2 = second_derivative(s);
    const double speed = norm(d1);
    return cross(d1, d2) / (speed * speed * speed);
}

double ParametricSpline::nearest_parameter(Vec2 p) const {
    // Coarse scan (8 samples per piece), then Newton on (r(s) - p) . r'(s) = 0 within the bracket
    // of the best sample.
    constexpr int samples = 8;
    double best_s = 0.0;
    double best_d = norm(position(0.0) - p);
    for (std::size_t k = 0; k < m_x.size(); ++k) {
        const double h = m_knots[k + 1] - m_knots[k];
        for (int q = 1; q <= samples; ++q) {
            const double s = m_knots[k] + h * q / samples;
            const double d = norm(position(s) - p);
            if (d < best_d) {
                best_d = d;
                best_s = s;
            }
        }
    }
    // bracket: the sample spacing either side of the best sample, on whichever pieces hold it
    const std::size_t k = segment(best_s);
    const double h_before =
        k > 0 && best_s == m_knots[k] ? m_knots[k] - m_knots[k - 1] : m_knots[k + 1] - m_knots[k];
    const double h_after = m_knots[k + 1] - m_knots[k];
    const double lo = std::max(0.0, best_s - 1.5 * h_before / samples);
    const double hi = std::min(length(), best_s + 1.5 * h_after / samples);
    double s = best_s;
    for (int it = 0; it < 40; ++it) {
        const Vec2 r = position(s) - p;
        const Vec2 d1 = first_derivative(s);
        const double f = dot(r, d1);
        const double df = dot(d1, d1) + dot(r, second_derivative(s));
        if (df <= 0.0) break;
        const double next = std::clamp(s - f / df, lo, hi);
        if (std::abs(next - s) < 1e-15 * std::max(1.0, length())) {
            s = next;
            break;
        }
        s = next;
    }
    return norm(position(s) - p) <= best_d ? s : best_s;
}

}  // namespace veer
