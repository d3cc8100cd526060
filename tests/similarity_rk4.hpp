#pragma once
/// Classical fourth-order Runge-Kutta for the third-order similarity equations of laminar layers
/// (Blasius, Falkner-Skan) written as y = (f, f', f''): the rows y(0), y(step), ... for the
/// tests that build exact boundary-layer profiles.
#include <array>
#include <cstddef>
#include <vector>

namespace veer::test {

using SimilarityState = std::array<double, 3>;

/// `count` rows from `start`, `rhs(y)` giving dy/deta.
template <class Rhs>
std::vector<SimilarityState> similarity_rk4(const Rhs& rhs, SimilarityState start, double step,
                                            std::size_t count) {
    std::vector<SimilarityState> rows;
    rows.reserve(count);
    SimilarityState s = start;
    for (std::size_t k = 0; k < count; ++k) {
        rows.push_back(s);
        std::array<SimilarityState, 4> g;
        SimilarityState t = s;
        for (int st = 0; st < 4; ++st) {
            g[st] = rhs(t);
            for (int c = 0; c < 3; ++c) t[c] = s[c] + (st < 2 ? 0.5 * step : step) * g[st][c];
        }
        for (int c = 0; c < 3; ++c)
            s[c] += step / 6.0 * (g[0][c] + 2 * g[1][c] + 2 * g[2][c] + g[3][c]);
    }
    return rows;
}

}  // namespace veer::test
