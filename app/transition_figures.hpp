#pragma once
/// Transition and the kinds of separation (postprocess/transition_locator.hpp,
/// postprocess/separation_regimes.hpp) as a run states them: the summary.json keys and the
/// closing table's lines. The analysis itself lives in postprocess/; this file only words it.
#include <nlohmann/json.hpp>
#include <string>
#include <vector>

#include "postprocess/run_analysis.hpp"

namespace veer {

/// The summary.json keys: transition_upper, transition_lower (x/c, null when the surface stays
/// laminar or the model has no nu~; 0 at most), turbulent_from_leading_edge_upper and _lower
/// (true when the surface has no laminar part), turbulence_index_threshold and
/// turbulence_index_hold (the criterion), and per surface laminar_bubbles_* ([separation,
/// transition or null, reattachment] x/c), laminar_separation_* and turbulent_separation_* (x/c of
/// the first, or null).
nlohmann::json transition_summary(const RunAnalysis& a);

/// "transition (turbulence index through 0.5): upper x/c 0.312, lower laminar to the trailing
/// edge"; empty without a turbulence index (a laminar model).
std::string transition_line(const RunAnalysis& a);

/// "laminar bubble 0.280-0.352 (transition 0.331 inside), turbulent separation at 0.912"; empty
/// when the surface has no separated region.
std::string regions_text(const std::vector<SeparatedRegion>& regions);

/// The first region of a kind, if any.
const SeparatedRegion* first_of_kind(const std::vector<SeparatedRegion>& regions,
                                     SeparationKind kind);

}  // namespace veer
