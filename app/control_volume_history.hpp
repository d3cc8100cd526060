#pragma once
/// The control-volume route of a time-accurate run, sampled after its steps on each contour of
/// [post] contours, for its time means over whole cycles. The route is quadratic in the
/// velocity (u (u.A)), so its mean is the mean of its instantaneous values, not its value on
/// mean fields (postprocess/time_average.hpp). Each sample keeps the contour terms (pressure,
/// momentum flux, viscous stress) and the momentum inside; the window mean of the rate-of-change
/// term is the change of that momentum over the window divided by its length, so the means need
/// no previous fields.
#include <optional>
#include <vector>

#include "app/simulation.hpp"
#include "postprocess/grid_contour.hpp"
#include "postprocess/time_average.hpp"

namespace veer {

/// A contour's time-mean lift and drag coefficients.
struct RouteMean {
    GridContour contour;
    double cl = 0.0;
    double cd = 0.0;
};

class ControlVolumeHistory {
public:
    /// Samples on the contours at `distances` (reference lengths from the section) every `every`
    /// steps. No contours without a section's layout.
    ControlVolumeHistory(const StructuredGrid& grid, const std::vector<double>& distances,
                         long every = 1);

    /// Called after a step of `sim` (step number `step`, time `time`).
    void after_step(const Simulation& sim, long step, double time);

    /// Time means over `window` on each contour, for a free stream at `alpha_deg`; nullopt when
    /// the samples do not cover the window (a run restarted inside it keeps no samples from
    /// before the restart).
    std::optional<std::vector<RouteMean>> means(const CycleWindow& window, double alpha_deg) const;

private:
    struct Series {
        GridContour contour;
        std::vector<double> force_x, force_y, momentum_x, momentum_y;
    };
    long m_every;
    std::vector<double> m_time;
    std::vector<Series> m_series;
};

}  // namespace veer
