#include "solver/spalart_allmaras_terms.hpp"

#include <algorithm>
#include <cmath>

namespace veer {

namespace {
using C = SpalartAllmarasConstants;
constexpr double kappa2 = C::kappa * C::kappa;
}  // namespace

double sa_fv1(double chi) {
    const double chi3 = chi * chi * chi;
    return chi3 / (chi3 + C::cv1 * C::cv1 * C::cv1);
}

double sa_fv2(double chi) { return 1.0 - chi / (1.0 + chi * sa_fv1(chi)); }

double sa_ft2(double chi) { return C::ct3 * std::exp(-C::ct4 * chi * chi); }

double sa_fw(double r) {
    // Powers by products and the sixth root as a cube root of a square root: std::pow took a
    // fifth of a Spalart-Allmaras step (perf, NACA 0012 384 x 128); the values agree to round-off.
    auto sixth = [](double x) {
        const double x2 = x * x;
        return x2 * x2 * x2;
    };
    const double g = r + C::cw2 * (sixth(r) - r);
    const double cw3_6 = sixth(C::cw3);
    return g * std::cbrt(std::sqrt((1.0 + cw3_6) / (sixth(g) + cw3_6)));
}

double sa_fn(double chi) {
    if (chi >= 0.0) return 1.0;
    const double chi3 = chi * chi * chi;
    return (C::cn1 + chi3) / (C::cn1 - chi3);
}

double sa_s_tilde(double omega, double s_bar) {
    if (s_bar >= -C::cv2 * omega) return omega + s_bar;
    return omega + omega * (C::cv2 * C::cv2 * omega + C::cv3 * s_bar) /
                       ((C::cv3 - 2.0 * C::cv2) * omega - s_bar);
}

double sa_eddy_viscosity(double nu_tilde, double nu) {
    return nu_tilde > 0.0 ? nu_tilde * sa_fv1(nu_tilde / nu) : 0.0;
}

double sa_diffusivity(double nu_tilde, double nu) {
    return (nu + nu_tilde * sa_fn(nu_tilde / nu)) / C::sigma;
}

SaSourceSplit sa_source(double nu_tilde, double omega, double wall_distance, double nu,
                        const SaSourceModifiers& modifiers) {
    SaSourceSplit s;
    const double chi = nu_tilde / nu;
    const double inv_d2 = 1.0 / (wall_distance * wall_distance);
    if (nu_tilde < 0.0) {
        // SA-neg: both terms are gains that pull nu_tilde back to zero; as coefficient x nu~
        // their coefficient is negative, so they go to the diagonal.
        s.production = C::cb1 * (1.0 - C::ct3) * omega * nu_tilde;
        s.destruction = -C::cw1 * nu_tilde * nu_tilde * inv_d2;
        s.implicit_coefficient = -C::cb1 * (1.0 - C::ct3) * omega - C::cw1 * nu_tilde * inv_d2;
        return s;
    }
    const double ft2 = modifiers.ft2 ? *modifiers.ft2 : sa_ft2(chi);
    const double s_bar = nu_tilde * sa_fv2(chi) * inv_d2 / kappa2;
    const double s_tilde = sa_s_tilde(omega, s_bar);
    double r = C::r_max;
    if (s_tilde > 0.0) r = std::min(nu_tilde * inv_d2 / (s_tilde * kappa2), C::r_max);
    const double fw = sa_fw(r);
    s.production = modifiers.production_factor * C::cb1 * (1.0 - ft2) * s_tilde * nu_tilde;
    s.destruction = (C::cw1 * fw - C::cb1 * ft2 / kappa2) * nu_tilde * nu_tilde * inv_d2;
    s.explicit_part = std::max(s.production, 0.0) + std::max(-s.destruction, 0.0);
    if (nu_tilde > 0.0)
        s.implicit_coefficient =
            (std::max(-s.production, 0.0) + std::max(s.destruction, 0.0)) / nu_tilde;
    return s;
}

SaSourceSplit sa_source_linearised(double nu_tilde, double omega, double wall_distance, double nu,
                                   const SaSourceModifiers& modifiers) {
    SaSourceSplit s = sa_source(nu_tilde, omega, wall_distance, nu, modifiers);
    const double net = s.production - s.destruction;
    // Step towards zero so that the difference stays on the branch of nu_tilde.
    const double h = (nu_tilde >= 0.0 ? -1.0 : 1.0) * 1e-6 * std::max(std::abs(nu_tilde), nu);
    const double probe = nu_tilde + h;
    if ((probe >= 0.0) != (nu_tilde >= 0.0)) return s;  // too close to zero to difference
    const SaSourceSplit p = sa_source(probe, omega, wall_distance, nu, modifiers);
    const double loss_rate = -((p.production - p.destruction) - net) / h;
    if (loss_rate > s.implicit_coefficient) {
        s.implicit_coefficient = loss_rate;
        s.explicit_part = net + loss_rate * nu_tilde;
    }
    return s;
}

}  // namespace veer
