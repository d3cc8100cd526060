#include "io/case_choices.hpp"

#include <utility>

#include "mesh/errors.hpp"
#include "solver/model_registry.hpp"

namespace veer {
namespace {

template <class E>
using WordTable = std::vector<std::pair<E, std::string_view>>;

const WordTable<TimeMode>& mode_table() {
    static const WordTable<TimeMode> t = {{TimeMode::steady, "steady"},
                                          {TimeMode::time_accurate, "unsteady"}};
    return t;
}

const WordTable<TrailingEdge>& trailing_edge_table() {
    static const WordTable<TrailingEdge> t = {{TrailingEdge::open, "open"},
                                              {TrailingEdge::closed, "closed"}};
    return t;
}

const WordTable<ChordLineChoice>& chord_line_table() {
    static const WordTable<ChordLineChoice> t = {{ChordLineChoice::automatic, "auto"},
                                                 {ChordLineChoice::file_axes, "file-axes"},
                                                 {ChordLineChoice::nose_to_tail, "nose-to-tail"}};
    return t;
}

const WordTable<PressureSolverKind>& pressure_solver_table() {
    static const WordTable<PressureSolverKind> t = [] {
        WordTable<PressureSolverKind> words;
        for (PressureSolverKind k : pressure_solver_kinds)
            words.emplace_back(k, pressure_solver_kind_name(k));
        return words;
    }();
    return t;
}

/// The message lists the words in this order (tests/unit/io/test_case_file.cpp).
const WordTable<SteadyScheme>& steady_scheme_table() {
    static const WordTable<SteadyScheme> t = {{SteadyScheme::classic, "classic"},
                                              {SteadyScheme::fast, "fast"}};
    return t;
}

template <class E>
std::string_view word_of(const WordTable<E>& table, E value) {
    for (const auto& [e, w] : table)
        if (e == value) return w;
    VEER_VERIFY(false, "a choice without a word");
}

template <class E>
E value_of(const WordTable<E>& table, std::string_view word) {
    for (const auto& [e, w] : table)
        if (w == word) return e;
    std::string message = "not a word of this choice: ";
    message += word;
    VEER_VERIFY(false, message);
}

template <class E>
std::vector<std::string> words_of(const WordTable<E>& table) {
    std::vector<std::string> out;
    for (const auto& entry : table) out.emplace_back(entry.second);
    return out;
}

}  // namespace

std::string_view mode_word(TimeMode mode) { return word_of(mode_table(), mode); }
std::string_view trailing_edge_word(TrailingEdge edge) {
    return word_of(trailing_edge_table(), edge);
}

std::string_view steady_scheme_word(SteadyScheme scheme) {
    return word_of(steady_scheme_table(), scheme);
}

TimeMode mode_of(std::string_view word) { return value_of(mode_table(), word); }
TrailingEdge trailing_edge_of(std::string_view word) {
    return value_of(trailing_edge_table(), word);
}
ChordLineChoice chord_line_of(std::string_view word) { return value_of(chord_line_table(), word); }
PressureSolverKind pressure_solver_of(std::string_view word) {
    return value_of(pressure_solver_table(), word);
}
SteadyScheme steady_scheme_of(std::string_view word) {
    return value_of(steady_scheme_table(), word);
}

std::vector<ChoiceKey> case_choice_keys() {
    return {{"geometry", "trailing_edge", words_of(trailing_edge_table())},
            {"geometry", "chord_line", words_of(chord_line_table())},
            {"flow", "model", model_names()},
            {"run", "mode", words_of(mode_table())},
            {"run", "pressure_solver", words_of(pressure_solver_table())},
            {"run", "steady_scheme", words_of(steady_scheme_table())}};
}

std::vector<std::string> choice_words(std::string_view table, std::string_view key) {
    for (const ChoiceKey& k : case_choice_keys())
        if (k.table == table && k.key == key) return k.words;
    return {};
}

std::string quoted_choices(const std::vector<std::string>& words) {
    std::string out;
    for (std::size_t k = 0; k < words.size(); ++k) {
        if (k > 0) out.append(k + 1 == words.size() ? " or " : ", ");
        out.append(1, '"').append(words[k]).append(1, '"');
    }
    return out;
}

}  // namespace veer
