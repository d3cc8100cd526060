#pragma once
/// Judges whether a steady (pseudo-time) iteration that has stopped converging circles inside a
/// small, stated band: a bounded cycle. Its forces then have a mean and a band of their own, and
/// a sweep reports that mean with the band as the point's own uncertainty ("settled in a bounded
/// cycle"), never as a converged steady solution.
///
/// The band is our choice (not a published figure): over the last `window` iterations, the
/// peak-to-peak excursion of Cl within `cl_fraction` of |mean Cl| and that of Cd within
/// `cd_fraction` of mean Cd, with at least `min_cycles` upward crossings of the mean Cl (whole
/// cycles of the iteration seen, so a slow drift inside the band does not pass for a cycle).
/// Measured reason: the drone demo at 10 degrees (cases/drone-cruise-transition.toml, 352 x 96)
/// circles a cycle of about 70 iterations; over its last 1000 of 3000 iterations Cl swings by
/// 0.16 % (1.4243-1.4266) and Cd by 4 % (about 0.0196-0.0204) of their means, every iteration
/// sampled. A band of 0.5 % in Cl and 5 % in Cd holds it; the half band goes out with the mean.
#include <optional>
#include <vector>

namespace veer {

struct BoundedCycleCriteria {
    long window = 1000;         ///< iterations looked back over (0: the judge is off)
    double cl_fraction = 5e-3;  ///< Cl peak-to-peak at most this fraction of |mean Cl|
    double cd_fraction = 5e-2;  ///< Cd peak-to-peak at most this fraction of mean Cd
    int min_cycles = 3;         ///< upward crossings of the mean Cl at least this many
    double cl_floor = 1e-3;  ///< |mean Cl| below this is taken as this (a section near zero lift)
};

/// The mean and half peak-to-peak of the forces over the judged window.
struct BoundedCycle {
    double cl = 0.0, cd = 0.0, cm = 0.0;                                ///< means over the window
    double cl_half_band = 0.0, cd_half_band = 0.0, cm_half_band = 0.0;  ///< half peak-to-peak
    int cycles = 0;       ///< upward crossings of the mean Cl in the window
    long iterations = 0;  ///< the window's length
};

/// The bounded cycle of the last `criteria.window` samples of the histories (one per
/// iteration, of equal length), or nothing when the histories are shorter than the window or
/// the forces leave the band.
std::optional<BoundedCycle> bounded_cycle(const std::vector<double>& cl,
                                          const std::vector<double>& cd,
                                          const std::vector<double>& cm,
                                          const BoundedCycleCriteria& criteria);

}  // namespace veer
