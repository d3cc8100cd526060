#pragma once
/// Time averages of time-accurate runs, in one place: whole-cycle detection from a lift signal,
/// means and half ranges of sampled signals over a window, the statistics of a force history
/// (the run summary and the sweep records report the same figures), the spectral peak of the
/// lift, and running means of the fields per cycle.
///
/// Cycles start at upward crossings of the signal's level, with hysteresis: after one crossing
/// the signal must fall below level - band (band = half the signal's standard deviation) before
/// the next counts. Crossing times are interpolated linearly between samples. For a force
/// history (unsteady_stats) the first half of the record is the start-up transient: level and
/// band are the time mean and standard deviation of the second half, and only its crossings
/// count. Online (CycleAverager) level and band come from the second half of the record until
/// two crossings are seen, and are then fixed at each crossing to those of the kept cycles.
///
/// What to average how: quantities linear in the fields (surface forces, Cp, Cf, circulation,
/// wake v profiles) can be evaluated on mean fields; the control-volume route is quadratic in the
/// velocity (u (u.n)), so its average is the average of its instantaneous values over the window.
#include <deque>
#include <optional>
#include <string>
#include <vector>

#include "solver/flow_fields.hpp"

namespace veer {

/// A time window of whole cycles.
struct CycleWindow {
    double begin = 0.0;  ///< time of the first upward crossing of the window
    double end = 0.0;    ///< time of the last one
    int cycles = 0;
    double period() const { return (end - begin) / cycles; }
};

/// Upward crossings of `level` by a sampled signal, with hysteresis `band` (see above).
std::vector<double> upward_crossings(const std::vector<double>& time,
                                     const std::vector<double>& signal, double level, double band);

/// The last `max_cycles` whole cycles of a record (fewer when it holds fewer, at least one);
/// nullopt when it holds no whole cycle or the signal is steady (its spread below
/// 1e-6 * max(1, |mean|)).
std::optional<CycleWindow> last_whole_cycles(const std::vector<double>& time,
                                             const std::vector<double>& signal, int max_cycles);

/// The linear interpolant of a sampled signal (times t, values f) at `at`, held constant beyond the
/// record's ends.
double signal_at(const std::vector<double>& t, const std::vector<double>& f, double at);

/// Mean over [begin, end] of the linear interpolant of a sampled signal (trapezoidal, ends
/// interpolated), taken over the part of the window the samples cover; nullopt where they cover
/// none of it.
std::optional<double> interval_mean(const std::vector<double>& t, const std::vector<double>& f,
                                    double begin, double end);

/// Mean of a sampled signal over [w.begin, w.end] (interval_mean of a window inside the record).
double window_average(const std::vector<double>& t, const std::vector<double>& f,
                      const CycleWindow& w);

/// Half the peak-to-peak excursion of the samples in [begin, end] and the signal at begin.
double half_range(const std::vector<double>& t, const std::vector<double>& f, double begin,
                  double end);

/// A sampled force history (time in chord / U_inf).
struct ForceRecord {
    std::vector<double> time, cl, cd, cm;
};

/// What the force history of a time-accurate run shows (see above for the windows).
struct UnsteadyStats {
    bool periodic = false;  ///< whole cycles were found; otherwise the flow settled (or did not
                            ///< complete a cycle) and the averages are over the second half
    int cycles = 0;
    double window_begin = 0.0, window_end = 0.0;
    double cl_mean = 0.0, cd_mean = 0.0, cm_mean = 0.0;
    /// Half the peak-to-peak excursion over the window.
    double cl_amplitude = 0.0, cd_amplitude = 0.0, cm_amplitude = 0.0;
    std::optional<double> strouhal;  ///< f c / U_inf of the lift's spectral peak
    /// Mean length of the whole cycles (periodic records).
    double period() const { return cycles > 0 ? (window_end - window_begin) / cycles : 0.0; }
};

/// The statistics of a record (see above). Needs at least 4 samples.
UnsteadyStats unsteady_stats(const ForceRecord& record);

/// Frequency (1 / time unit) of the largest peak of the spectrum of `signal` over
/// [begin, end]: the signal is resampled uniformly, its mean removed, a Hann window applied,
/// the peak bin found and refined by maximising |DFT(f)| between its neighbours. nullopt when
/// the window holds fewer than 8 samples or no variation.
std::optional<double> dominant_frequency(const std::vector<double>& time,
                                         const std::vector<double>& signal, double begin,
                                         double end);

/// (q(end) - q(begin)) / (end - begin), q interpolated linearly between samples: the window
/// mean of dq/dt (for the rate-of-change term of the control-volume route).
double window_change_rate(const std::vector<double>& time, const std::vector<double>& q,
                          const CycleWindow& window);

/// The upward crossings that delimit the whole cycles of a record, as last_whole_cycles finds
/// them (level and band from the second half); empty for a steady signal.
std::vector<double> cycle_crossings(const std::vector<double>& time,
                                    const std::vector<double>& signal);

/// A figure over the window of whole cycles and its cycle-to-cycle spread: the largest
/// deviation of one cycle's own figure from it.
struct CycleFigure {
    double value = 0.0;
    double spread = 0.0;
};

/// When the cycles of a record count as one periodic state (a limit cycle): at least
/// `min_cycles`, and every cycle's period and lift amplitude within these fractions of the
/// window's. On the cylinder at Re 100 the cycles of a settled run agree to about 1e-4; a
/// start-up whose lift still grows or decays changes its amplitude by several percent a cycle.
struct PeriodicityTolerance {
    int min_cycles = 3;
    double period = 0.01;     ///< relative spread of the period
    double amplitude = 0.02;  ///< relative spread of the lift amplitude (half peak-to-peak)
};

/// What a shedding run is read by, over its last whole cycles of the lift (the cycles of
/// cycle_crossings). Means are trapezoidal over the window; per cycle, over that cycle.
struct SheddingStatistics {
    int cycles = 0;  ///< whole cycles used
    CycleWindow window;
    CycleFigure strouhal;  ///< 1 / period (reference length / U_inf units); per cycle 1 / its own
    CycleFigure cl_mean;   ///< time mean of Cl
    CycleFigure cd_mean;   ///< time mean of Cd
    CycleFigure cm_mean;   ///< time mean of Cm
    CycleFigure cl_rms;    ///< root mean square of Cl - (window mean of Cl)
    CycleFigure cl_peak;   ///< largest |Cl - window mean| (sampled values)
    CycleFigure cl_amplitude;  ///< half the peak-to-peak range of Cl
    CycleFigure cd_amplitude;  ///< half the peak-to-peak range of Cd
    bool periodic = false;     ///< the cycles pass the PeriodicityTolerance
    std::string not_periodic;  ///< why they do not, in words (empty when periodic)
};

/// Statistics of the last `max_cycles` whole cycles (fewer when the record holds fewer);
/// nullopt when it holds no whole cycle. Histories are sampled at the same times.
std::optional<SheddingStatistics> shedding_statistics(const std::vector<double>& time,
                                                      const std::vector<double>& cl,
                                                      const std::vector<double>& cd,
                                                      const std::vector<double>& cm, int max_cycles,
                                                      const PeriodicityTolerance& tolerance = {});

/// Time-weighted running mean of the flow fields (u, v, pressure, eddy viscosity).
class FieldMean {
public:
    /// Adds fields that stand for a time span `weight` (the step that produced them).
    void add(const FlowFields& fields, double weight);
    /// Adds another mean (for combining cycles).
    void add(const FieldMean& other);
    FlowFields mean() const;
    double duration() const { return m_duration; }
    bool empty() const { return m_duration <= 0.0; }

private:
    void add_weighted(const FlowFields& fields, double weight);
    FlowFields m_sum;
    double m_duration = 0.0;
};

/// Per-cycle field means, fed once per time step; cycles detected online from the lift.
class CycleAverager {
public:
    /// Keeps the means of the last `keep_cycles` completed cycles.
    explicit CycleAverager(int keep_cycles = 8);

    /// The step that ended at `time` took `dt` and produced `fields` with lift coefficient `cl`.
    void add(double time, double dt, double cl, const FlowFields& fields);

    int completed_cycles() const { return static_cast<int>(m_cycles.size()); }
    /// The window of the last n completed cycles (n clamped to those kept); nullopt if none.
    std::optional<CycleWindow> window(int n) const;
    /// Mean fields over the last n completed cycles (n clamped); throws if none is complete.
    FlowFields mean_of_last(int n) const;

private:
    struct Cycle {
        double begin = 0.0, end = 0.0;
        FieldMean fields;
    };
    void start_cycle(double at);
    /// Level and spread of the signal over the second half of the record (before two
    /// crossings), then fixed at each crossing to those of the kept whole cycles, integrated
    /// between the crossing times, so that the level does not wander within a cycle.
    void level_and_spread(double& level, double& spread) const;
    void update_level();

    int m_keep;
    std::vector<double> m_time, m_signal, m_signal_sq, m_sum, m_sum_sq;  // with prefix sums
    bool m_armed = false;
    std::optional<double> m_cycle_begin;  // none before the first crossing
    std::deque<double> m_crossings;       // times of the kept crossings
    std::optional<double> m_level, m_spread;
    FieldMean m_current;
    std::deque<Cycle> m_cycles;
};

}  // namespace veer
