#include "app/progress_line.hpp"

#include <fmt/format.h>
#include <unistd.h>

#include <cmath>
#include <cstdio>

namespace veer {

std::string format_duration(double seconds) {
    if (!std::isfinite(seconds) || seconds < 0) return "?";
    const long s = std::lround(seconds);
    if (s >= 3600) return fmt::format("{}h{:02}m", s / 3600, (s % 3600) / 60);
    if (s >= 60) return fmt::format("{}m{:02}s", s / 60, s % 60);
    return fmt::format("{}s", s);
}

std::string progress_text(const ProgressFigures& f, double elapsed, const std::string& label) {
    const double left =
        f.fraction_done > 0.02 ? elapsed * (1 - f.fraction_done) / f.fraction_done : std::nan("");
    const std::string when = f.steady ? fmt::format("iter {:6}", f.step)
                                      : fmt::format("step {:6} t {:8.4f}", f.step, f.time);
    std::string model;
    for (const auto& [name, residual] : f.model_residuals)
        model += fmt::format(" {} {:8.2e}", name, residual);
    const std::string eta =
        f.forces_settling
            ? std::string("residuals down, Cl and Cd settling")
            : fmt::format("{:3.0f}%  left {}", 100 * f.fraction_done, format_duration(left));
    return fmt::format(
        "{}{}  res u {:8.2e} v {:8.2e} continuity {:8.2e}{}  Cl {:8.5f}  Cd {:8.5f}  {}", label,
        when, f.residual_u, f.residual_v, f.residual_continuity, model, f.cl, f.cd, eta);
}

ProgressLine::ProgressLine(bool enabled, std::string label)
    : m_enabled(enabled),
      m_terminal(isatty(fileno(stderr)) != 0),
      m_label(std::move(label)),
      m_start(std::chrono::steady_clock::now()),
      m_last(m_start) {}

void ProgressLine::update(const ProgressFigures& f, bool force) {
    if (!m_enabled) return;
    const auto now = std::chrono::steady_clock::now();
    const double since_last = std::chrono::duration<double>(now - m_last).count();
    if (!force && since_last < (m_terminal ? 0.25 : 5.0)) return;
    m_last = now;
    const double elapsed = std::chrono::duration<double>(now - m_start).count();
    const std::string line = progress_text(f, elapsed, m_label);
    if (m_terminal)
        std::fprintf(stderr, "\r%s\033[K", line.c_str());
    else
        std::fprintf(stderr, "%s\n", line.c_str());
    std::fflush(stderr);
    m_drawn = true;
}

void ProgressLine::finish() const {
    if (m_enabled && m_terminal && m_drawn) std::fprintf(stderr, "\n");
}

}  // namespace veer
