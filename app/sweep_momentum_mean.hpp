#pragma once
/// The control-volume lift of a time-accurate sweep point as a time mean over the same whole
/// cycles as its surface coefficients. The control-volume route is quadratic in the velocity, so
/// its mean is the mean of its instantaneous values (postprocess/time_average.hpp), sampled here
/// every few steps on the largest contour; the d/dt term of the momentum inside averages to zero
/// over whole cycles and is left out.
#include <optional>
#include <vector>

#include "app/simulation.hpp"
#include "postprocess/grid_contour.hpp"

namespace veer {

class MomentumLiftSampler {
public:
    /// Samples on the largest of `distances` (chords from the section) every `every` steps.
    MomentumLiftSampler(const StructuredGrid& grid, const std::vector<double>& distances,
                        long every = 10);

    /// Called after a step of `sim` (step number `step`, time `time`).
    void after_step(const Simulation& sim, long step, double time);

    /// Records a sample (what after_step does on its steps).
    void add(double time, double cl);

    /// The trapezoidal mean of the samples over [begin, end]; nullopt with fewer than two.
    std::optional<double> mean(double begin, double end) const;

    const std::vector<double>& times() const { return m_time; }
    const std::vector<double>& lifts() const { return m_cl; }

private:
    std::optional<GridContour> m_contour;
    long m_every;
    std::vector<double> m_time, m_cl;
};

}  // namespace veer
