#pragma once
/// Decides when a steady run has converged: residuals fallen by the requested factor from their
/// reference (the largest of the first steps) and Cl, Cd settled: either moved less than the
/// tolerance over a window of steps, or settling geometrically with an estimated remaining
/// change (app/geometric_tail.hpp) below a fraction of the tolerance. The
/// residuals are those of every equation solved: u, v, continuity, then each transported
/// variable of the turbulence model (a residual that stays 0 is left out).
#include <deque>
#include <vector>

#include "io/case_spec.hpp"
#include "solver/flow_solver.hpp"

namespace veer {

struct ConvergenceCriteria {
    double residual_drop = 1e-6;    ///< residuals must fall below this fraction of the reference
    double force_tolerance = 1e-5;  ///< max |change| of Cl and Cd across the window
    int reference_steps = 20;       ///< the reference is the largest residual of these steps
    int force_window = 100;         ///< steps over which the forces must have settled
    /// Steps per block of the remaining-change estimate (three blocks are read); 0, or more
    /// than a third of the force window: the window alone decides.
    int tail_block = 10;
    /// The estimated remaining change of Cl and Cd must be below this fraction of
    /// force_tolerance (and their change over the last block below force_tolerance).
    double tail_fraction = 0.1;
    /// A block-to-block ratio of the changes above this is too slow to extrapolate.
    double tail_ratio_max = 0.9;
};

/// The criteria of a case's [run] table (residual_drop, force_tolerance, settle_estimate).
ConvergenceCriteria convergence_criteria(const RunSpec& run);

/// One step's figures as the monitor sees them.
struct ConvergenceSample {
    std::vector<double> residuals;  ///< u, v, continuity, then the model's (step_residuals())
    double cl = 0.0, cd = 0.0;
};

/// A step's residuals in the monitor's order: u, v, continuity, then the model's variables.
std::vector<double> step_residuals(const StepReport& step);

class ConvergenceMonitor {
public:
    explicit ConvergenceMonitor(ConvergenceCriteria criteria) : m_criteria(criteria) {}

    /// Raises the references to at least `floor` (step_residuals() order). A run started
    /// from another solution (a sweep's previous point) has small residuals of its own at the
    /// start; held to a fraction of those, it would chase round-off. Raised to the residuals of
    /// a start from the free stream, it meets the criterion of a single run.
    void raise_references(const std::vector<double>& floor);

    /// Records a step; returns true once both criteria hold.
    bool add(const ConvergenceSample& s);

    /// Largest residual relative to its reference, for the progress line (1 at the start).
    double relative_residual() const { return m_relative; }
    /// Largest change of Cl or Cd over the current window (infinity until the window is full).
    double force_change() const;
    /// True when Cl and Cd settle geometrically with an estimated remaining change below
    /// tail_fraction x force_tolerance (ConvergenceCriteria::tail_block).
    bool forces_settling() const;
    /// True when the residuals have grown far past their reference (a blow-up).
    bool blowing_up() const { return m_relative > 1e6; }

    /// The monitor's memory, for checkpoints (restarts continue bit for bit).
    std::vector<double> save() const;
    /// Reads save()'s record, or an older one: that of four references (u, v, continuity and
    /// the model's one variable) or the oldest, of three (no model reference: see
    /// legacy_record()).
    void load(const std::vector<double>& saved);
    /// True after load() of a record written before the model's residual was monitored.
    bool legacy_record() const { return m_legacy; }
    /// Steps recorded so far (restarts included).
    long count() const { return m_count; }

private:
    ConvergenceCriteria m_criteria;
    long m_count = 0;
    std::vector<double> m_reference;  ///< one per residual (step_residuals() order)
    bool m_legacy = false;
    double m_relative = 1.0;
    std::deque<double> m_cl, m_cd;
};

}  // namespace veer
