#include "solver/transition_correlations.hpp"

#include <algorithm>
#include <cmath>

namespace veer {

using A = AftConstants;

double mack_critical_amplification(double tu_percent) {
    const double tau = 2.5 * std::tanh(tu_percent / 2.5);
    return -8.43 - 2.4 * std::log(tau / 100.0);
}

double aft_shape_factor(double h_l) {
    const double h12 = 0.376960 + std::sqrt(std::max(h_l + 2.453432, 0.0) / 0.653181);
    return std::clamp(h12, A::h12_lowest, A::h12_highest);
}

double aft_re_theta0(double h12) {
    const double e =
        0.7 * std::tanh(14.0 / (h12 - 1.0) - 9.24) + 2.492 / std::pow(h12 - 1.0, 0.43) + 0.62;
    return std::pow(10.0, e);
}

double aft_k_v(double h12) { return 0.246175 * h12 * h12 - 0.141831 * h12 + 0.008886; }

double aft_growth(double h12) {
    const double d = h12 / (0.5482 * h12 - 0.5185);
    const double l = (6.54 * h12 - 14.07) / (h12 * h12);
    const double m_times_l = 0.058 * (h12 - 4.0) * (h12 - 4.0) / (h12 - 1.0) - 0.068;
    return 0.5 * d * (l + m_times_l);
}

double aft_amplification_rate(double h12) {
    const double x = 3.87 / (h12 - 1.0) - 2.52;
    return 0.028 * (h12 - 1.0) - 0.0345 * std::exp(-x * x);
}

double aft_onset(double n, double n_crit, double r_t) {
    const double r = r_t / 3.5;
    return std::max(std::min(n / n_crit, 2.0) - std::max(1.0 - r * r * r, 0.0), 0.0);
}

double aft_turbulent(double r_t) {
    const double r = 0.5 * r_t;
    return std::exp(-(r * r) * (r * r));
}

double aft_ft2(double log_intermittency) { return A::ct3 * (1.0 - std::exp(log_intermittency)); }

double aft_amplification_source(const AftCell& c) {
    const double h12 = aft_shape_factor(c.h_l);
    const double re_v = c.strain * c.d * c.d / (c.nu + c.nu_t);
    if (re_v < aft_k_v(h12) * aft_re_theta0(h12)) return 0.0;  // F_crit = 0
    return c.omega * aft_growth(h12) * aft_amplification_rate(h12);
}

TransitionSourceSplit aft_intermittency_source(double log_intermittency, double strain,
                                               double omega, double f_onset, double f_turb) {
    const double g = std::exp(log_intermittency);
    const double gain = A::c1 * strain * f_onset;
    const double loss = A::c2 * omega * f_turb;
    TransitionSourceSplit s;
    s.value = gain * (1.0 - g) - loss * (A::c3 * g - 1.0);
    s.implicit_coefficient = (gain + loss * A::c3) * g;
    s.explicit_part = s.value + s.implicit_coefficient * log_intermittency;
    return s;
}

double bcm_critical_re_theta(double tu_percent) {
    return 803.73 * std::pow(tu_percent + 0.6067, -1.027);
}

double bcm_intermittency(double omega, double d, double nu, double nu_t, double re_theta_c) {
    using B = BcmConstants;
    const double re_theta = d * d * omega / (nu * B::re_v_to_re_theta);
    const double term1 = std::max(re_theta - re_theta_c, 0.0) / (B::chi1 * re_theta_c);
    const double term2 = std::max(nu_t / (B::chi2 * nu), 0.0);
    return 1.0 - std::exp(-std::sqrt(term1) - std::sqrt(term2));
}

}  // namespace veer
