#pragma once
/// Discretisation uncertainty of one figure from three systematically refined grids: the grid
/// convergence index of Celik, Ghia, Roache, Freitas, Coleman & Raad 2008 (J. Fluids Eng. 130,
/// 078001, steps 1-6), with the factor of safety of Roache 2011 (J. Fluids Eng. 133(11), 115501):
/// 1.25 when the observed order is reasonable, 3 otherwise.
///
/// The observed order p solves p = |ln|e32/e21| + q(p)| / ln r21, q(p) = ln((r21^p - s) / (r32^p -
/// s)), by fixed-point iteration (q = 0 for a constant ratio). "Reasonable" is our choice, stated
/// here: monotone convergence with p within [formal - 1, formal + 1] ([1, 3] for veer's
/// second-order scheme). Outside it the coarse grid is likely outside the asymptotic range, so the
/// band is the conservative one: Fs = 3 with the formal order (Roache 2011), and never less than
/// half the spread of the three values (common practice for oscillatory convergence).
///
/// Diverging: the formula's outer absolute value gives a positive p even when the changes grow as
/// the grid is refined (|e21| larger than |e32| on a constant ratio), which no converging sequence
/// does: for monotone convergence with p > 0, |e32 / e21| = r21^p (r32^p - 1) / (r21^p - 1), which
/// exceeds its p -> 0 limit ln r32 / ln r21. At or below that limit the values are called
/// diverging (the classification by the convergence ratio e21 / e32 into monotone convergence,
/// oscillation and divergence: Stern, Wilson, Coleman & Paterson 2001, J. Fluids Eng. 123,
/// 793-802, recalled from memory), with the conservative band and no extrapolation.
#include <array>
#include <span>
#include <string>

namespace veer {

/// What the three values show.
enum class ConvergenceVerdict {
    monotone,            ///< reasonable observed order: Fs 1.25 with it
    order_out_of_range,  ///< monotone, but p outside [formal - 1, formal + 1]: conservative band
    oscillatory,         ///< e21 and e32 of opposite sign: conservative band, no extrapolation
    diverging,  ///< same sign, but the changes grow as the grid is refined: conservative band,
                ///< no extrapolation
    unchanged,  ///< the same value on the three grids (changes within 1e-7 of
                ///< max(1, |value|), below a run's iterative error): no error visible
};

struct GridConvergence {
    std::array<double, 3> spacing{};  ///< h1 (finest), h2, h3
    std::array<double, 3> values{};   ///< phi1 (finest), phi2, phi3
    double ratio_fine = 0.0;          ///< r21 = h2 / h1
    double ratio_coarse = 0.0;        ///< r32 = h3 / h2
    double formal_order = 2.0;        ///< the scheme's order
    double order = 0.0;               ///< observed p; 0 when unchanged
    double order_used = 0.0;          ///< the p in the band: observed, or the formal order
    double safety_factor = 0.0;       ///< 1.25 or 3
    bool extrapolated_valid = false;  ///< false for oscillatory, diverging or unchanged values
    double extrapolated = 0.0;    ///< phi_ext = (r21^p phi1 - phi2) / (r21^p - 1), p = order_used
    double relative_error = 0.0;  ///< e_a = |(phi1 - phi2) / phi1|
    double extrapolated_error = 0.0;  ///< e_ext = |(phi_ext - phi1) / phi_ext|
    double band = 0.0;                ///< absolute: Fs |phi1 - phi2| / (r21^p - 1), or the floor
    double gci_fine = 0.0;            ///< band / |phi1|; +infinity when phi1 is 0
    ConvergenceVerdict verdict = ConvergenceVerdict::unchanged;
};

/// The procedure on values listed finest first. Spacings must be positive and increasing
/// (throws std::invalid_argument naming the values otherwise).
GridConvergence grid_convergence(std::array<double, 3> spacing, std::array<double, 3> values,
                                 double formal_order = 2.0);

/// Representative cell size of a 2D grid, h = sqrt(sum(A) / N) (Celik et al. 2008, step 1).
double representative_spacing(std::span<const double> cell_areas);

/// One plain sentence for a reader, e.g. "converging, observed order 2.03 (formal 2)".
std::string verdict_text(const GridConvergence& g);

/// A short word for tables and files: "monotone", "order out of range", "oscillatory",
/// "diverging", "unchanged".
const char* verdict_name(ConvergenceVerdict verdict);

}  // namespace veer
