#pragma once
/// SA-AFT2017b's amplification factor on the exact Blasius layer, as the model itself predicts it
/// independently of veer's grid and solver: the n~ equation (transition_correlations.hpp: source
/// Omega F_crit F_growth dn/dRe_theta with H12 from H_L, diffusion nu in the laminar layer) marched
/// downstream on Blasius' similarity velocity (Blasius 1908; f''(0) = 0.332057 [P], from the
/// reference file), in the similarity variable eta = y sqrt(Re / x):
///   f' x dn/dx - (f / 2) dn/deta = d2n/deta2 + x P,   x P = sqrt(Re_x) f'' F_crit F_growth
///   dn/dRe_theta,
/// with Omega = f'' sqrt(Re / x), H_L = eta^3 f'' / 2 and Re_V = eta^2 f'' sqrt(Re_x) [D] (boundary
/// layer approximation; test_transition_flow_quantities.cpp checks those against veer's own
/// estimates). Implicit in log(Re_x), central in eta; zero gradient at the wall, n = 0 outside.
/// It tells what Re_x the model's n~ needs to reach N_crit on a plate: what veer's plate run must
/// reproduce if its transport and coupling are right.
#include <algorithm>
#include <array>
#include <cmath>
#include <vector>

#include "../similarity_rk4.hpp"
#include "solver/transition_correlations.hpp"

namespace veer::test {

/// Re_x where the largest n~ across the layer first reaches `n_crit` (NaN if not by 1e8).
/// `diffusion_scale` multiplies n~'s diffusivity (the model's: 1, sigma_n = 1 with nu_t = 0), to
/// measure how much of the onset the diffusion sets.
inline double blasius_amplification_onset(double wall_curvature, double n_crit,
                                          double diffusion_scale = 1.0) {
    const double h = 0.01, eta_end = 12.0;
    const auto n_eta = static_cast<std::size_t>(eta_end / h) + 1;
    const auto rhs = [](const std::array<double, 3>& y) {
        return std::array<double, 3>{y[1], y[2], -0.5 * y[0] * y[2]};
    };
    const auto rows = similarity_rk4(rhs, {0.0, 0.0, wall_curvature}, h, n_eta);
    std::vector<double> f(n_eta), fp(n_eta), fpp(n_eta);
    for (std::size_t k = 0; k < n_eta; ++k)
        f[k] = rows[k][0], fp[k] = rows[k][1], fpp[k] = rows[k][2];
    std::vector<double> h12(n_eta), re_v0(n_eta), gain(n_eta);
    for (std::size_t k = 0; k < n_eta; ++k) {
        const double eta = h * static_cast<double>(k);
        h12[k] = aft_shape_factor(0.5 * eta * eta * eta * fpp[k]);
        re_v0[k] = aft_k_v(h12[k]) * aft_re_theta0(h12[k]);
        gain[k] = fpp[k] * aft_growth(h12[k]) * aft_amplification_rate(h12[k]);
    }
    std::vector<double> n(n_eta, 0.0), a(n_eta), b(n_eta), c(n_eta), r(n_eta);
    const double step = std::log(1e8 / 1e4) / 8000.0;
    for (double lx = std::log(1e4); lx < std::log(1e8);) {
        lx += step;
        const double x = std::exp(lx), root = std::sqrt(x);
        for (std::size_t k = 1; k + 1 < n_eta; ++k) {
            const double eta = h * static_cast<double>(k);
            const bool critical = eta * eta * fpp[k] * root >= re_v0[k];
            const double diffusion = diffusion_scale / (h * h);
            a[k] = -(diffusion - f[k] / (4.0 * h));
            c[k] = -(diffusion + f[k] / (4.0 * h));
            b[k] = fp[k] / step + 2.0 * diffusion;
            r[k] = fp[k] * n[k] / step + (critical ? root * gain[k] : 0.0);
        }
        a[0] = 0.0, b[0] = 1.0, c[0] = -1.0, r[0] = 0.0;  // dn/deta = 0
        a[n_eta - 1] = 0.0, b[n_eta - 1] = 1.0, c[n_eta - 1] = 0.0, r[n_eta - 1] = 0.0;  // n = 0
        for (std::size_t k = 1; k < n_eta; ++k) {  // Thomas algorithm
            const double w = a[k] / b[k - 1];
            b[k] -= w * c[k - 1];
            r[k] -= w * r[k - 1];
        }
        n[n_eta - 1] = r[n_eta - 1] / b[n_eta - 1];
        for (std::size_t k = n_eta - 1; k-- > 0;) n[k] = (r[k] - c[k] * n[k + 1]) / b[k];
        if (*std::max_element(n.begin(), n.end()) >= n_crit) return x;
    }
    return std::nan("");
}

}  // namespace veer::test
