#pragma once
/// Decides when a steady run has converged: residuals fallen by the requested factor from their
/// reference (the largest of the first steps) and Cl, Cd settled over a window of steps. The
/// residuals are those of every equation solved: u, v, continuity and, with a turbulence model,
/// nu_tilde (a residual that stays 0, as nu_tilde's does in laminar runs, is left out).
#include <array>
#include <deque>
#include <vector>

namespace veer {

struct ConvergenceCriteria {
    double residual_drop = 1e-6;    ///< residuals must fall below this fraction of the reference
    double force_tolerance = 1e-5;  ///< max |change| of Cl and Cd across the window
    int reference_steps = 20;       ///< the reference is the largest residual of these steps
    int force_window = 100;         ///< steps over which the forces must have settled
};

/// One step's figures as the monitor sees them (nu_tilde last, so that older five-value
/// initialisations keep their meaning).
struct ConvergenceSample {
    double residual_u = 0.0, residual_v = 0.0, residual_continuity = 0.0;
    double cl = 0.0, cd = 0.0;
    double residual_nu_tilde = 0.0;  ///< 0 when laminar
};

class ConvergenceMonitor {
public:
    explicit ConvergenceMonitor(ConvergenceCriteria criteria) : m_criteria(criteria) {}

    static constexpr int residual_count = 4;  ///< u, v, continuity, nu_tilde

    /// Raises the references to at least `floor` (u, v, continuity, nu_tilde). A run started
    /// from another solution (a sweep's previous point) has small residuals of its own at the
    /// start; held to a fraction of those, it would chase round-off. Raised to the residuals of
    /// a start from the free stream, it meets the criterion of a single run.
    void raise_references(const std::array<double, residual_count>& floor);

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
    /// Reads save()'s record, or the older one without nu_tilde (its nu_tilde reference is then
    /// unknown: see legacy_record()).
    void load(const std::vector<double>& saved);
    /// True after load() of a record written before nu_tilde was monitored.
    bool legacy_record() const { return m_legacy; }
    /// Steps recorded so far (restarts included).
    long count() const { return m_count; }

private:
    ConvergenceCriteria m_criteria;
    long m_count = 0;
    double m_reference[residual_count] = {0.0, 0.0, 0.0, 0.0};
    bool m_legacy = false;
    double m_relative = 1.0;
    std::deque<double> m_cl, m_cd;
};

}  // namespace veer
