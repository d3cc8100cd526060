#pragma once
/// The Spalart-Allmaras one-equation model, point terms: constants, closure functions, and the
/// source (production - destruction) with its implicit linearisation.
///
/// Definition followed exactly: the NASA Langley Turbulence Modeling Resource, page "The
/// Spalart-Allmaras Turbulence Model", standard form "SA" (Spalart & Allmaras 1994, La Recherche
/// Aerospatiale 1, 5-21) without the trip term (f_t1 = 0, as the resource writes it), with the
/// f_t2 term, and the negative-nu_tilde branch "SA-neg" of Allmaras, Johnson & Spalart 2012
/// (ICCFD7-1902), including its modified vorticity S_tilde (their note (c), constants c_v2, c_v3)
/// and diffusion coefficient f_n. For nu_tilde >= 0:
///
///   D nu~/Dt = c_b1 (1 - f_t2) S~ nu~ - [c_w1 f_w - c_b1 f_t2 / kappa^2] (nu~ / d)^2
///              + (1/sigma) [div((nu + nu~) grad nu~) + c_b2 |grad nu~|^2]
///   nu_t = nu~ f_v1,  f_v1 = chi^3 / (chi^3 + c_v1^3),  chi = nu~ / nu
///   S~ = Omega + S_bar if S_bar >= -c_v2 Omega, else
///        Omega + Omega (c_v2^2 Omega + c_v3 S_bar) / ((c_v3 - 2 c_v2) Omega - S_bar),
///   S_bar = nu~ f_v2 / (kappa^2 d^2),  f_v2 = 1 - chi / (1 + chi f_v1)
///   f_w = g [(1 + c_w3^6) / (g^6 + c_w3^6)]^(1/6),  g = r + c_w2 (r^6 - r),
///   r = min(nu~ / (S~ kappa^2 d^2), 10),  f_t2 = c_t3 exp(-c_t4 chi^2)
///
/// and for nu_tilde < 0 (SA-neg):
///
///   D nu~/Dt = c_b1 (1 - c_t3) Omega nu~ + c_w1 (nu~ / d)^2
///              + (1/sigma) [div((nu + nu~ f_n) grad nu~) + c_b2 |grad nu~|^2]
///   nu_t = 0,  f_n = (c_n1 + chi^3) / (c_n1 - chi^3)
///
/// Omega is the magnitude of the vorticity, d the distance to the wall.

#include <optional>

namespace veer {

/// Published model constants (sources beside each).
struct SpalartAllmarasConstants {
    // Spalart & Allmaras 1994, as written on the NASA Turbulence Modeling Resource "SA" page.
    static constexpr double cb1 = 0.1355;
    static constexpr double sigma = 2.0 / 3.0;
    static constexpr double cb2 = 0.622;
    static constexpr double kappa = 0.41;
    static constexpr double cw2 = 0.3;
    static constexpr double cw3 = 2.0;
    static constexpr double cv1 = 7.1;
    static constexpr double ct3 = 1.2;
    static constexpr double ct4 = 0.5;
    static constexpr double cw1 = cb1 / (kappa * kappa) + (1.0 + cb2) / sigma;
    static constexpr double r_max = 10.0;  ///< the cap on r (same page)
    // Allmaras, Johnson & Spalart 2012 (ICCFD7-1902), SA-neg and the S_tilde limiter.
    static constexpr double cv2 = 0.7;
    static constexpr double cv3 = 0.9;
    static constexpr double cn1 = 16.0;
};

/// chi^3 / (chi^3 + c_v1^3), chi = nu_tilde / nu (any sign of chi; used for chi >= 0).
double sa_fv1(double chi);
/// 1 - chi / (1 + chi f_v1).
double sa_fv2(double chi);
/// c_t3 exp(-c_t4 chi^2).
double sa_ft2(double chi);
/// g [(1 + c_w3^6) / (g^6 + c_w3^6)]^(1/6) with g = r + c_w2 (r^6 - r).
double sa_fw(double r);
/// (c_n1 + chi^3) / (c_n1 - chi^3) for chi < 0, 1 for chi >= 0.
double sa_fn(double chi);

/// Modified vorticity S~ (1 / time units) from the vorticity magnitude omega and
/// S_bar = nu~ f_v2 / (kappa^2 d^2), with the SA-neg limiter, so S~ >= 0.1 omega.
double sa_s_tilde(double omega, double s_bar);

/// Kinematic eddy viscosity nu~ f_v1 (0 where nu_tilde < 0), chords x free-stream speed.
double sa_eddy_viscosity(double nu_tilde, double nu);

/// Diffusion coefficient (nu + nu~ f_n) / sigma of the nu_tilde equation (f_n = 1 for nu~ >= 0);
/// positive for every nu_tilde (Allmaras et al. 2012 chose f_n so).
double sa_diffusivity(double nu_tilde, double nu);

/// Source of one cell, per unit volume, split for an implicit step:
///   source(nu~_new) ~ explicit_part - implicit_coefficient * nu~_new,
/// with implicit_coefficient >= 0 (1 / time units) and explicit_part >= 0, so that the update
/// stays positive where it started positive. Positive terms are explicit, negative ones are
/// written as coefficient x nu~ and moved to the diagonal (destruction; both SA-neg terms).
struct SaSourceSplit {
    double explicit_part = 0.0;         ///< nu_tilde units per time unit
    double implicit_coefficient = 0.0;  ///< 1 / time units
    double production = 0.0;            ///< the production term itself (signed)
    double destruction = 0.0;           ///< the destruction term itself (signed; loss > 0)
};

/// What a transition model built on this one changes in the source of a cell: a factor on the
/// production c_b1 (1 - f_t2) S~ nu~ (the algebraic intermittency of SA-BCM, Cakmakcioglu, Bas,
/// Mura & Kaynak, AIAA 2020-2706), and f_t2 given instead of c_t3 exp(-c_t4 chi^2) (SA-AFT2017b,
/// Coder, Pulliam & Jensen, AIAA 2018-1039: c_t3 (1 - exp(log-intermittency)); 0 for SA-BCM's
/// SA-noft2 base). The defaults are the standard model, to the bit. The SA-neg branch is
/// unchanged.
struct SaSourceModifiers {
    double production_factor = 1.0;
    std::optional<double> ft2;
};

/// Source terms at a cell with vorticity magnitude omega (1/time), wall distance d (chords),
/// molecular viscosity nu and the current nu_tilde.
SaSourceSplit sa_source(double nu_tilde, double omega, double wall_distance, double nu,
                        const SaSourceModifiers& modifiers = {});

/// The same source with the implicit coefficient raised, where needed, to the loss rate
/// -dS/dnu~ of the net source S = P - D (by a one-sided difference), and the explicit part
/// moved to keep explicit - coefficient * nu~ = S at the current value. Picard's coefficient
/// alone lets large pseudo-time steps settle into a two-cycle where f_t2 and f_w vary fast;
/// with the loss rate on the diagonal the point update is a damped Newton step. Positivity
/// holds as for sa_source (the coefficient only grows).
SaSourceSplit sa_source_linearised(double nu_tilde, double omega, double wall_distance, double nu,
                                   const SaSourceModifiers& modifiers = {});

}  // namespace veer
