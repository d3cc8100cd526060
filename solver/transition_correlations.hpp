#pragma once
/// Point functions of the two transition models built on Spalart-Allmaras: the amplification-
/// factor transport model SA-AFT2017b and the algebraic intermittency of SA-BCM. Every formula
/// and constant is as the NASA Langley Turbulence Modeling Resource (TMR) transcribes it from the
/// primary papers:
///
/// SA-AFT2017b: Coder, Pulliam & Jensen, AIAA 2018-1039 (2018); the amplification-factor
/// framework of Coder & Maughmer, AIAA J. 52(11), 2014; the intermittency equation after Menter,
/// Smirnov, Liu & Avancha, Flow Turb. Combust. 95, 583-619 (2015).
/// SA-BCM: Cakmakcioglu, Bas, Mura & Kaynak, AIAA 2020-2706 (2020).
/// Critical amplification factor from the free-stream turbulence: Mack 1977 (NASA CR-153203),
/// with the limiter tau = 2.5 tanh(Tu / 2.5) the TMR page gives.
///
/// What the SA-AFT correlations stand for (checked on Falkner-Skan layers,
/// tests/unit/solver/test_aft_growth_on_falkner_skan.cpp): evaluated at y = delta*, H12(H_L) is
/// the layer's delta*/theta, k_V its Re_V / Re_theta and D(H12) its u / (theta Omega), so the n~
/// source per unit length there is the e^N envelope's dn/dRe_theta dRe_theta/dx.

namespace veer {

/// SA-AFT2017b constants (Coder, Pulliam & Jensen 2018, as on the TMR "SA-AFT2017b" page).
struct AftConstants {
    static constexpr double sigma_n = 1.0;      ///< diffusion of n~: sigma_n (nu + nu_t)
    static constexpr double c1 = 100.0;         ///< intermittency production
    static constexpr double c2 = 0.06;          ///< intermittency destruction
    static constexpr double c3 = 50.0;          ///< intermittency destruction
    static constexpr double sigma_gamma = 1.0;  ///< diffusion of g~: nu + nu_t / sigma_gamma
    static constexpr double ct3 = 1.2;          ///< f_t2 = c_t3 (1 - exp(g~)), SA's c_t3
    /// Far-field nu~ / nu of the model (TMR page: 0.1).
    static constexpr double free_stream_ratio = 0.1;
    /// The shape-factor band the correlations are used in (our choice, not the papers'): the
    /// correlations are fits to Falkner-Skan-type laminar profiles, whose H12 runs from about
    /// 2.2 (stagnation-point flow, memory) upwards; below 2.2 the growth function's denominator
    /// and (H12 - 1) approach their poles. 20 bounds separated shear layers far from any fit.
    static constexpr double h12_lowest = 2.2;
    static constexpr double h12_highest = 20.0;
};

/// SA-BCM constants (Cakmakcioglu et al. 2020, as on the TMR "SA-BCM" page).
struct BcmConstants {
    static constexpr double chi1 = 0.002;
    static constexpr double chi2 = 0.02;
    static constexpr double re_v_to_re_theta = 2.193;  ///< Re_theta = Re_v / 2.193
    /// Far-field nu~ / nu: the TMR page allows 0.015-0.025; the middle of that band.
    static constexpr double free_stream_ratio = 0.02;
};

/// Critical amplification factor from the free-stream turbulence intensity Tu in percent:
/// -8.43 - 2.4 ln(tau / 100), tau = 2.5 tanh(Tu / 2.5) (Mack 1977 with the TMR limiter).
double mack_critical_amplification(double tu_percent);

/// Shape factor H12 from the local estimate H_L = d^2 [grad(u . grad d)] . grad d / nu:
/// 0.376960 + sqrt((H_L + 2.453432) / 0.653181), kept inside [h12_lowest, h12_highest].
double aft_shape_factor(double h_l);
/// Re_theta0: log10(Re_theta0) = 0.7 tanh(14/(H12 - 1) - 9.24) + 2.492/(H12 - 1)^0.43 + 0.62.
double aft_re_theta0(double h12);
/// k_V = 0.246175 H12^2 - 0.141831 H12 + 0.008886 (Re_V0 = k_V Re_theta0).
double aft_k_v(double h12);
/// F_growth = D (1 + m) / 2 l with D = H12 / (0.5482 H12 - 0.5185), l = (6.54 H12 - 14.07) / H12^2,
/// m = [0.058 (H12 - 4)^2 / (H12 - 1) - 0.068] / l; evaluated as D / 2 (l + m l), which has no
/// pole where l = 0 (H12 = 2.151).
double aft_growth(double h12);
/// dn/dRe_theta = 0.028 (H12 - 1) - 0.0345 exp[-(3.87 / (H12 - 1) - 2.52)^2].
double aft_amplification_rate(double h12);
/// F_onset = max(min(n / N_crit, 2) - max(1 - (R_T / 3.5)^3, 0), 0).
double aft_onset(double n, double n_crit, double r_t);
/// F_turb = exp(-(R_T / 2)^4).
double aft_turbulent(double r_t);
/// f_t2 = c_t3 (1 - exp(g~)) from the log-intermittency g~ (<= 0).
double aft_ft2(double log_intermittency);

/// What the n~ source reads at a cell.
struct AftCell {
    double omega = 0.0;   ///< vorticity magnitude (1/time)
    double strain = 0.0;  ///< strain-rate magnitude sqrt(2 S_ij S_ij) (1/time)
    double d = 0.0;       ///< wall distance (chords)
    double nu = 0.0;      ///< molecular viscosity
    double nu_t = 0.0;    ///< eddy viscosity
    double h_l = 0.0;     ///< local shape-factor estimate H_L
};

/// Source of n~ per unit volume: Omega F_crit F_growth dn/dRe_theta, F_crit = 1 where
/// Re_V = S d^2 / (nu + nu_t) reaches Re_V0 = k_V Re_theta0, else 0. Never negative.
double aft_amplification_source(const AftCell& c);

/// Source of the log-intermittency g~ split for an implicit step, as the SA source:
/// source(g_new) ~ explicit_part - implicit_coefficient g_new, implicit_coefficient >= 0.
struct TransitionSourceSplit {
    double explicit_part = 0.0;
    double implicit_coefficient = 0.0;
    double value = 0.0;  ///< the source at the current g~
};

/// c1 S F_onset [1 - exp(g~)] - c2 Omega F_turb [c3 exp(g~) - 1], linearised about g~ (Newton:
/// the coefficient is -d(source)/dg~ = (c1 S F_onset + c2 c3 Omega F_turb) exp(g~) >= 0).
TransitionSourceSplit aft_intermittency_source(double log_intermittency, double strain,
                                               double omega, double f_onset, double f_turb);

/// SA-BCM: Re_theta_c = 803.73 (Tu + 0.6067)^(-1.027), Tu in percent.
double bcm_critical_re_theta(double tu_percent);
/// SA-BCM's gamma_BC = 1 - exp(-sqrt(Term1) - sqrt(Term2)),
/// Term1 = max(Re_theta - Re_theta_c, 0) / (chi1 Re_theta_c), Re_theta = d^2 Omega / (2.193 nu),
/// Term2 = max(nu_t / (chi2 nu), 0).
double bcm_intermittency(double omega, double d, double nu, double nu_t, double re_theta_c);

}  // namespace veer
