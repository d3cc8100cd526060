#pragma once
/// The table a run ends with on stdout: the lift from each route and their largest
/// disagreement, Cm, the Kutta check, separation and the downwash behind the section (for the
/// circle: base pressure, separation angles, recirculation length); for time-accurate runs the
/// time means over whole cycles with their cycle-to-cycle spread; the cautions.
#include "io/case_spec.hpp"
#include "postprocess/run_analysis.hpp"

namespace veer {

struct UnsteadyFigures;  // app/run_report.hpp

/// Prints the closing table of the analysis `a` of the case `spec` (`unsteady`: the figures of
/// a time-accurate run).
void print_closing_table(const CaseSpec& spec, const RunAnalysis& a,
                         const UnsteadyFigures* unsteady = nullptr);

}  // namespace veer
