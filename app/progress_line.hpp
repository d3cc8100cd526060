#pragma once
/// The live progress line of a run: step, residuals, Cl, Cd and the estimated time left, redrawn
/// in place on a terminal and printed as plain lines (at most every few seconds) otherwise.
#include <chrono>
#include <string>
#include <utility>
#include <vector>

namespace veer {

struct ProgressFigures {
    long step = 0;
    double time = 0.0;
    double residual_u = 0.0, residual_v = 0.0, residual_continuity = 0.0;
    double cl = 0.0, cd = 0.0;
    double fraction_done = 0.0;  ///< 0..1 estimate of the way to the end
    bool steady = true;
    /// The model's residuals with their labels (ModelVariable::label), shown after continuity.
    std::vector<std::pair<std::string, double>> model_residuals;
    /// Steady: every residual is down but Cl and Cd have not settled yet, so no time left can
    /// be estimated from the residuals (the line says so instead of "100 %, left 0s").
    bool forces_settling = false;
};

class ProgressLine {
public:
    explicit ProgressLine(bool enabled, std::string label = "");
    void update(const ProgressFigures& f, bool force = false);
    /// Ends the line (a newline on a terminal).
    void finish() const;

private:
    bool m_enabled;
    bool m_terminal;
    std::string m_label;
    std::chrono::steady_clock::time_point m_start, m_last;
    bool m_drawn = false;
};

/// The text of one progress line, `elapsed` seconds after the start.
std::string progress_text(const ProgressFigures& f, double elapsed, const std::string& label);

/// "1h02m", "3m05s", "12s".
std::string format_duration(double seconds);

}  // namespace veer
