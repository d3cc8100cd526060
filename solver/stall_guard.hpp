#pragma once
/// Notices a steady iteration that has stopped converging, so that the "fast" scheme can hand
/// the rest of the run to "classic" (steady_scheme.hpp; README.md, "Steady schemes").
///
/// The measure is the largest residual relative to its reference (the largest of the first
/// `reference_steps` steps, as the convergence monitor of the app takes it), over any number of
/// equations: u, v, continuity and each transported model variable. The iteration is stalled
/// when that measure has not fallen by `progress_factor` for `patience` steps. A stall rule of
/// this kind, not a published method: common practice.
#include <vector>

namespace veer {

struct StallRule {
    int reference_steps = 20;  ///< the references are the largest residuals of these steps
    /// Required fall of the measure within `patience` steps. "fast" on NACA 0012 SA (Re 6e6,
    /// 384 x 128) halved it every 10-60 steps at 0, 10 and 15 degrees; at 18 degrees from the
    /// free stream it wandered between 5e-4 and 1e-2 for 1500 steps (README.md).
    double progress_factor = 0.5;
    int patience = 200;
    /// Below this measure the run is as good as converged (100 times under the default
    /// criterion): round-off plateaus there are not stalls.
    double converged_floor = 1e-8;
};

class StallGuard {
public:
    explicit StallGuard(StallRule rule = {}) : m_rule(rule) {}

    /// Adds one step's residuals (the same equations in the same order every step); true from
    /// the step on which the iteration counts as stalled.
    bool stalled_after(const std::vector<double>& residuals);
    bool stalled() const { return m_stalled; }

    /// Everything needed to continue bit for bit after a restart (any length; load() of an
    /// empty record starts afresh).
    std::vector<double> save() const;
    void load(const std::vector<double>& saved);

private:
    StallRule m_rule;
    std::vector<double> m_reference;
    long m_count = 0;
    double m_mark = 0.0;   ///< measure at the last step that counted as progress
    long m_mark_step = 0;  ///< that step
    bool m_stalled = false;
};

}  // namespace veer
