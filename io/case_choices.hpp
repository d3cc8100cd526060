#pragma once
/// The words of the case file's choice keys, one spelling each (README, "Case files"): [geometry]
/// trailing_edge and chord_line, [flow] model (the model registry's names), [run] mode, [run]
/// pressure_solver and [run] steady_scheme. The case file reader (io/case_file.cpp) reads them
/// through these tables and nowhere else; `veer check`, `veer run`, `veer sweep` and `--set` all go
/// through it, so they accept and refuse the same words.
#include <string>
#include <string_view>
#include <vector>

#include "mesh/naca.hpp"
#include "mesh/section.hpp"
#include "solver/pressure_solver.hpp"
#include "solver/solver_settings.hpp"
#include "solver/steady_scheme.hpp"

namespace veer {

/// "steady" or "unsteady" (TimeMode::time_accurate).
std::string_view mode_word(TimeMode mode);
/// "open" or "closed".
std::string_view trailing_edge_word(TrailingEdge edge);
/// "classic" or "fast".
std::string_view steady_scheme_word(SteadyScheme scheme);

/// The value of a word the choice key accepts (case_choice_keys(); the reader checks the word
/// first, so a word not in the table is an internal error).
TimeMode mode_of(std::string_view word);
TrailingEdge trailing_edge_of(std::string_view word);
ChordLineChoice chord_line_of(std::string_view word);
PressureSolverKind pressure_solver_of(std::string_view word);
SteadyScheme steady_scheme_of(std::string_view word);

/// A choice key and the words it accepts.
struct ChoiceKey {
    std::string table;               ///< e.g. "run"
    std::string key;                 ///< e.g. "pressure_solver"
    std::vector<std::string> words;  ///< the accepted words, in the order the README gives them
};

/// Every choice key of the case file with its words.
std::vector<ChoiceKey> case_choice_keys();

/// The words of one choice key (an empty list for a key that is not a choice).
std::vector<std::string> choice_words(std::string_view table, std::string_view key);

/// "\"a\", \"b\" or \"c\"": the words of a choice for messages.
std::string quoted_choices(const std::vector<std::string>& words);

}  // namespace veer
