#pragma once
/// Decides when a steady run has converged: residuals fallen by the requested factor from their
/// reference (the largest of the first steps) and Cl, Cd settled over a window of steps.
#include <deque>
#include <vector>

namespace veer {

struct ConvergenceCriteria {
    double residual_drop = 1e-6;    ///< residuals must fall below this fraction of the reference
    double force_tolerance = 1e-5;  ///< max |change| of Cl and Cd across the window
    int reference_steps = 20;       ///< the reference is the largest residual of these steps
    int force_window = 100;         ///< steps over which the forces must have settled
};

/// One step's figures as the monitor sees them.
struct ConvergenceSample {
    double residual_u = 0.0, residual_v = 0.0, residual_continuity = 0.0;
    double cl = 0.0, cd = 0.0;
};

class ConvergenceMonitor {
public:
    explicit ConvergenceMonitor(ConvergenceCriteria criteria) : m_criteria(criteria) {}

    /// Records a step; returns true once both criteria hold.
    bool add(const ConvergenceSample& s);

    /// Largest residual relative to its reference, for the progress line (1 at the start).
    double relative_residual() const { return m_relative; }
    /// Largest change of Cl or Cd over the current window (infinity until the window is full).
    double force_change() const;
    /// True when the residuals have grown far past their reference (a blow-up).
    bool blowing_up() const { return m_relative > 1e6; }

    /// The monitor's memory, for checkpoints (restarts continue bit for bit).
    std::vector<double> save() const;
    void load(const std::vector<double>& saved);

private:
    ConvergenceCriteria m_criteria;
    long m_count = 0;
    double m_reference[3] = {0.0, 0.0, 0.0};
    double m_relative = 1.0;
    std::deque<double> m_cl, m_cd;
};

}  // namespace veer
