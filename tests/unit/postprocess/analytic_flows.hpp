#pragma once
/// Exact potential flows for the post-processing tests, in veer's units (chord 1, U_inf = 1,
/// rho = 1) and sign convention (circulation gamma > 0 clockwise, which lifts for flow along +x).
#include <cmath>
#include <complex>
#include <functional>
#include <numbers>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/vec2.hpp"
#include "solver/flow_fields.hpp"
#include "tests/reference_table.hpp"

namespace veer::test {

using Complex = std::complex<double>;
using VelocityField = std::function<Vec2(Vec2)>;

/// Uniform stream at angle alpha plus a clockwise point vortex of circulation gamma at `centre`.
inline VelocityField uniform_plus_vortex(double alpha_deg, double gamma, Vec2 centre) {
    const double a = alpha_deg * std::numbers::pi / 180.0;
    return [=](Vec2 p) {
        const Vec2 r = p - centre;
        const double k = gamma / (2.0 * std::numbers::pi * dot(r, r));
        return Vec2{std::cos(a) + k * r.y, std::sin(a) - k * r.x};
    };
}

/// Joukowski section z = zeta + b^2/zeta about the circle of centre (-mu_x, mu_y) through
/// zeta = b, with the Kutta circulation gamma = 4 pi a U sin(alpha + beta) (Kutta 1902, Joukowski
/// 1906; e.g. Katz & Plotkin, Low-Speed Aerodynamics). Veer coordinates are
/// x = (z - z_le) / c with the trailing edge z = 2b at (1, 0).
struct Joukowski {
    double b = 1.0, mu_x = 0.1, mu_y = 0.0, alpha_deg = 5.0;
    double circulation_factor = 1.0;  ///< 1: the Kutta circulation; other values break it

    Complex centre() const { return {-mu_x, mu_y}; }
    double radius() const { return std::hypot(b + mu_x, mu_y); }
    double alpha() const { return alpha_deg * std::numbers::pi / 180.0; }
    double beta() const { return std::asin(mu_y / radius()); }
    /// Circulation in the physical plane (unscaled), clockwise positive.
    double gamma_physical() const {
        return 4.0 * std::numbers::pi * radius() * std::sin(alpha() + beta());
    }
    Complex map(Complex zeta) const { return zeta + b * b / zeta; }
    Complex zeta_on_circle(double theta) const {
        return centre() + radius() * std::exp(Complex(0.0, theta));
    }
    /// Leading edge: the contour point of least x (sampled finely); the chord is then the x extent,
    /// as in the worked values of analytic.md.
    Complex leading_edge() const {
        Complex best = map(zeta_on_circle(std::numbers::pi));
        for (int k = -2000; k <= 2000; ++k) {
            const Complex z = map(zeta_on_circle(std::numbers::pi * (1.0 + k * 5e-5)));
            if (z.real() < best.real()) best = z;
        }
        return best;
    }
    double chord() const { return 2.0 * b - leading_edge().real(); }
    /// Exact section lift coefficient, 2 gamma / (U c).
    double lift_coefficient() const { return 2.0 * gamma_physical() / chord(); }

    /// Fixes the leading edge and chord once (call after setting the parameters).
    Joukowski& prepare() {
        m_le = leading_edge();
        m_chord = chord();
        return *this;
    }
    Complex m_le{0.0, 0.0};
    double m_chord = 1.0;

    Vec2 to_veer(Complex z) const {
        const Complex x = (z - m_le) / m_chord;
        return {x.real(), x.imag()};
    }
    Complex to_physical(Vec2 p) const { return m_le + m_chord * Complex(p.x, p.y); }

    /// Section outline, trailing edge first and last, around + 1 points clustered at both ends.
    std::vector<Vec2> surface(int around) const {
        const double theta_te = std::arg(Complex(b, 0.0) - centre());
        std::vector<Vec2> pts;
        for (int m = 0; m <= around; ++m)
            pts.push_back(
                to_veer(map(zeta_on_circle(theta_te - 2.0 * std::numbers::pi * m / around))));
        pts.front() = pts.back() = to_veer(Complex(2.0 * b, 0.0));
        return pts;
    }

    /// Exact velocity at a veer point outside the section (the velocity scale is unchanged).
    Vec2 velocity(Vec2 p) const {
        const Complex z = to_physical(p);
        const Complex root = std::sqrt(z * z - 4.0 * b * b);
        Complex zeta = 0.5 * (z + root);
        const Complex other = 0.5 * (z - root);
        if (std::abs(other - centre()) > std::abs(zeta - centre())) zeta = other;
        const Complex s = zeta - centre();
        const double a = radius();
        const Complex dw =
            std::exp(Complex(0.0, -alpha())) - a * a * std::exp(Complex(0.0, alpha())) / (s * s) +
            Complex(0.0, circulation_factor * gamma_physical() / (2.0 * std::numbers::pi)) / s;
        const Complex w = dw / (1.0 - b * b / (zeta * zeta));  // u - i v
        return {w.real(), -w.imag()};
    }
};

/// A worked Joukowski case of tests/reference/joukowski_sections.csv [D] (b = 1, mu_x = 0.1).
struct JoukowskiReference {
    double chord = 0.0, cl = 0.0;
};

/// The row of the worked values for (mu_y, alpha_deg); throws if the file or the row is missing.
inline JoukowskiReference joukowski_reference(double mu_y, double alpha_deg) {
    const ReferenceTable t = ReferenceTable::read("joukowski_sections.csv", 3);
    for (std::size_t row = 0; row < t.rows(); ++row)
        if (t.number(row, "mu_y") == mu_y && t.number(row, "alpha_deg") == alpha_deg)
            return {t.number(row, "chord"), t.number(row, "cl")};
    throw std::runtime_error(t.path() + " has no row for mu_y " + std::to_string(mu_y) +
                             ", alpha " + std::to_string(alpha_deg));
}

/// Cell-centred fields of a potential flow: velocity at the centroids, Bernoulli pressure
/// p - p_inf = (1 - |u|^2) / 2, no eddy viscosity.
inline FlowFields sample_potential_flow(const GridMetrics& m, const VelocityField& velocity) {
    FlowFields f;
    f.ni = m.ni;
    f.nj = m.nj;
    const std::size_t n = m.volume.size();
    f.u.resize(n);
    f.v.resize(n);
    f.pressure.resize(n);
    f.eddy_viscosity.assign(n, 0.0);
    for (std::size_t c = 0; c < n; ++c) {
        const Vec2 u = velocity(m.centroid[c]);
        f.u[c] = u.x;
        f.v[c] = u.y;
        f.pressure[c] = 0.5 * (1.0 - dot(u, u));
    }
    return f;
}

}  // namespace veer::test
