#pragma once
/// Tells early that a steady (pseudo-time) iteration has stopped converging: its relative
/// residual no longer falls while the lift keeps moving, the signature of a flow that sheds (a
/// limit cycle of the iteration) rather than of one that is slow to settle. A sweep then goes
/// time-accurate at once instead of waiting for the step cap.
///
/// Over the last `window` steps: the residual has stalled when the smallest relative residual of
/// the window's last tenth is above the smallest of its first tenth divided by `required_drop`
/// (the smallest of a block, so that an oscillating residual is judged by its troughs); the lift
/// keeps moving when its range over the window's second half exceeds `force_tolerance`. Both
/// must hold. A steady flow that converges slowly still falls by `required_drop` over a window;
/// a flow that has settled to a residual floor has a still lift.
///
/// Frozen: a residual that stalls far above any round-off floor (its last tenth's minimum above
/// `frozen_level`) while the lift is still is not a floor either: the iteration circles a fixed
/// pattern in a few cells (measured: NACA 0012, SA, Re 6e6, 128 x 32, y+ 2, surface_slope 0.2,
/// 2 degrees continued from 0: the wall cells five cells behind the leading edge alternate
/// every iteration, u by 0.03 and the SA variable by 35 %, with the relative residual fixed at
/// 0.13 and Cl fixed to 1e-8, for 19000 iterations up to the step cap). It counts as stalled
/// too, so that the sweep judges the point at once (a bounded cycle) instead of at its cap.
#include <deque>

namespace veer {

struct PlateauCriteria {
    long window = 3000;             ///< steps looked back over
    double required_drop = 10.0;    ///< the residual must fall at least this much per window
    double force_tolerance = 1e-5;  ///< Cl range below this over the second half: settled
    long check_every = 100;         ///< steps between evaluations (each scans the window)
    /// A stalled residual above this (relative) is frozen, not a floor: a converged run's
    /// floor sits near 1e-6 of the reference (the default residual_drop), a frozen cycle at 0.13.
    double frozen_level = 1e-3;
};

class ResidualPlateau {
public:
    explicit ResidualPlateau(PlateauCriteria criteria);

    /// Records one step (the relative residual and Cl); returns true from the step at which the
    /// iteration is first judged stalled (and at every later evaluation that still finds it).
    bool add(double relative_residual, double cl);

    /// Whether the last evaluation found the iteration stalled.
    bool stalled() const { return m_stalled; }
    /// Whether the last evaluation found it stalled with a still lift (frozen, see above).
    bool frozen() const { return m_frozen; }
    /// Residual drop over the current window (first-tenth minimum over last-tenth minimum); 0
    /// until the window is full.
    double window_drop() const { return m_drop; }
    /// Cl range over the second half of the current window; 0 until the window is full.
    double lift_range() const { return m_lift_range; }

private:
    void evaluate();

    PlateauCriteria m_criteria;
    long m_count = 0;
    std::deque<double> m_residual, m_cl;
    double m_drop = 0.0, m_lift_range = 0.0;
    bool m_stalled = false;
    bool m_frozen = false;
};

}  // namespace veer
