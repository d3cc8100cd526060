#pragma once
/// Statistics of a time-accurate point of a sweep from its force history: whole cycles of the
/// lift signal, time averages and fluctuation amplitudes over them, and the Strouhal number of
/// the lift from a spectrum over the same whole cycles.
///
/// The first half of the record is taken as the start-up transient and left out. Cycles begin at
/// upward crossings of the mean of the second half, with hysteresis: after a crossing the signal
/// must fall below mean - std/2 before the next counts (so noise near the mean does not add
/// cycles). The window runs from the first to the last such crossing.
#include <optional>
#include <vector>

namespace veer {

/// A sampled force history (time in chord / U_inf).
struct ForceRecord {
    std::vector<double> time, cl, cd, cm;
};

/// What a time-accurate point shows.
struct UnsteadyStats {
    bool periodic = false;  ///< whole cycles were found; otherwise the flow settled (or did not
                            ///< complete a cycle) and the averages are over the second half
    int cycles = 0;
    double window_begin = 0.0, window_end = 0.0;
    double cl_mean = 0.0, cd_mean = 0.0, cm_mean = 0.0;
    /// Half the peak-to-peak excursion over the window.
    double cl_amplitude = 0.0, cd_amplitude = 0.0, cm_amplitude = 0.0;
    std::optional<double> strouhal;  ///< f c / U_inf of the lift's spectral peak
};

/// Times (linearly interpolated) of the upward crossings of `level` with hysteresis `band`.
std::vector<double> upward_level_crossings(const std::vector<double>& time,
                                           const std::vector<double>& signal, double level,
                                           double band);

/// Frequency (1 / time unit) of the largest peak of the spectrum of `signal` over
/// [begin, end]: the signal is resampled uniformly, its mean removed, a Hann window applied,
/// the peak bin found and refined by maximising |DFT(f)| between its neighbours. nullopt when
/// the window holds fewer than 8 samples or no variation.
std::optional<double> dominant_frequency(const std::vector<double>& time,
                                         const std::vector<double>& signal, double begin,
                                         double end);

/// The statistics of a record (see above). Needs at least 4 samples.
UnsteadyStats unsteady_stats(const ForceRecord& record);

}  // namespace veer
