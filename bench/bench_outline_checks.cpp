// The outline checks of a coordinate file (mesh/outline_checks.hpp) on dense outlines: NACA 2412
// loops of 1000 to 100000 points (even stations) (the thickness and camber formulas of Abbott & von
// Doenhoff 1959, section 6.4), clean and with a dent that makes the upper surface cross the lower
// one. Prints the time of each; the self-crossing search is a sweep and prune, so the time grows
// about as n log n (issue 19 measured 17.7 s for 100000 points with the earlier all-pairs search).
#include <fmt/format.h>

#include <chrono>
#include <cmath>
#include <numbers>
#include <string>

#include "mesh/errors.hpp"
#include "mesh/outline_checks.hpp"

namespace {

veer::RawOutline naca2412_loop(int per_side, bool dented) {
    const double m = 0.02, p = 0.4, t = 0.12;
    veer::RawOutline raw;
    raw.source = "bench outline";
    for (int side : {1, -1})
        for (int k = 0; k <= per_side; ++k) {
            const int q = side > 0 ? per_side - k : k;
            if (side < 0 && q == 0) continue;  // the nose once
            // Even stations: a cosine spacing of 50000 per side puts nose points closer than the
            // duplicate tolerance (1e-7 chords), and the clean outline would be refused.
            const double x = static_cast<double>(q) / per_side;
            const double yt = 5 * t *
                              (0.2969 * std::sqrt(x) - 0.1260 * x - 0.3516 * x * x +
                               0.2843 * x * x * x - 0.1036 * x * x * x * x);
            const double yc = x < p ? m / (p * p) * (2 * p * x - x * x)
                                    : m / ((1 - p) * (1 - p)) * (1 - 2 * p + 2 * p * x - x * x);
            double y = yc + side * yt;
            if (dented && side > 0 && x > 0.4 && x < 0.6)
                y -= 0.2 * std::pow(std::sin((x - 0.4) / 0.2 * std::numbers::pi), 2);
            raw.points.push_back({x, y});
        }
    return raw;
}

double seconds_to_check(const veer::RawOutline& raw, bool& refused) {
    const auto start = std::chrono::steady_clock::now();
    refused = false;
    try {
        veer::check_outline(raw);
    } catch (const veer::InputError& e) {
        refused = true;
        if (std::string(e.what()).find("crosses itself") == std::string::npos)
            fmt::print("  refused for another reason: {}\n", e.what());
    }
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
}

}  // namespace

int main() {
    fmt::print("outline checks (wall time; a shared machine adds noise)\n");
    fmt::print("{:>8} {:>12} {:>12}\n", "points", "clean [s]", "dented [s]");
    for (int per_side : {500, 5000, 50000}) {
        bool clean_refused = false, dented_refused = false;
        const veer::RawOutline clean = naca2412_loop(per_side, false);
        const double tc = seconds_to_check(clean, clean_refused);
        const double td = seconds_to_check(naca2412_loop(per_side, true), dented_refused);
        fmt::print("{:>8} {:>12.4f} {:>12.4f}{}{}\n", clean.points.size(), tc, td,
                   clean_refused ? "  (clean outline refused!)" : "",
                   dented_refused ? "" : "  (dent not found!)");
    }
    return 0;
}
