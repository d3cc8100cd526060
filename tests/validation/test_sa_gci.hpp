#pragma once
/// Grid convergence index of three grids, the procedure of Celik, Ghia, Roache, Freitas, Coleman
/// & Raad 2008 (J. Fluids Eng. 130, 078001) (steps 1-6 of its procedure); the
/// safety factor 1.25 for three grids (Roache 2011, J. Fluids Eng. 133(11), 115501).
#include <array>
#include <cmath>

namespace veer::test {

struct GciResult {
    double order = 0.0;               ///< observed order p
    double extrapolated = 0.0;        ///< Richardson-extrapolated value
    double relative_error = 0.0;      ///< e_a = |(phi1 - phi2) / phi1|
    double extrapolated_error = 0.0;  ///< e_ext = |(phi_ext - phi1) / phi_ext|
    double gci_fine = 0.0;            ///< 1.25 e_a / (r21^p - 1)
    bool oscillatory = false;         ///< s < 0
};

/// h = {h1, h2, h3} (1 finest), phi the values on those grids.
inline GciResult grid_convergence_index(std::array<double, 3> h, std::array<double, 3> phi) {
    GciResult g;
    const double r21 = h[1] / h[0], r32 = h[2] / h[1];
    const double e21 = phi[1] - phi[0], e32 = phi[2] - phi[1];
    const double s = (e32 / e21) >= 0.0 ? 1.0 : -1.0;
    g.oscillatory = s < 0.0;
    double p = std::abs(std::log(std::abs(e32 / e21))) / std::log(r21);
    for (int it = 0; it < 100; ++it) {  // fixed point of p = |ln|e32/e21| + q(p)| / ln r21
        const double q = std::log((std::pow(r21, p) - s) / (std::pow(r32, p) - s));
        p = std::abs(std::log(std::abs(e32 / e21)) + q) / std::log(r21);
    }
    g.order = p;
    const double rp = std::pow(r21, p);
    g.extrapolated = (rp * phi[0] - phi[1]) / (rp - 1.0);
    g.relative_error = std::abs((phi[0] - phi[1]) / phi[0]);
    g.extrapolated_error = std::abs((g.extrapolated - phi[0]) / g.extrapolated);
    g.gci_fine = 1.25 * g.relative_error / (rp - 1.0);
    return g;
}

}  // namespace veer::test
