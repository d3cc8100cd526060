#pragma once
// The per-point table the sweep benchmarks print: one row per angle from the points' records.
#include <fmt/format.h>

#include <filesystem>
#include <optional>
#include <string>

#include "app/sweep_angles.hpp"
#include "app/sweep_record.hpp"

namespace veer::bench {

/// Returns the summed wall time of the listed angles' points (not of points a stall search added).
inline double print_point_table(const std::filesystem::path& sweep_dir, const std::string& angles) {
    const auto optional = [](const std::optional<double>& x) {
        return x ? fmt::format("{:.3f}", *x) : std::string("-");
    };
    fmt::print("{:>6} {:>9} {:>9} {:>9} {:>8} {:>8} {:>11} {:>8}\n", "alpha", "regime", "Cl", "Cd",
               "sep x/c", "St", "iterations", "wall s");
    double listed_wall = 0.0;
    for (const double a : parse_sweep_angles(angles)) {
        const std::optional<PointRecord> r = read_point_record(sweep_dir / point_folder_name(a));
        if (!r) {
            fmt::print("{:>6.1f} missing\n", a);
            continue;
        }
        fmt::print("{:>6.1f} {:>9} {:>9.4f} {:>9.5f} {:>8} {:>8} {:>11} {:>8.1f}  {}\n", r->alpha,
                   r->regime, r->cl, r->cd, optional(r->trailing_edge_separation_upper),
                   optional(r->strouhal), r->iterations, r->wall_seconds, r->note);
        listed_wall += r->wall_seconds;
    }
    return listed_wall;
}

}  // namespace veer::bench
