// `veer check` and `veer run` accept and refuse the same case values: every choice key with
// every word it takes and with near misses of those words (the other separator, a capital, a
// word of another key), and the rules run applies beyond the reader's (the steady CFL limit,
// the places of the analysis). Each value goes in through --set, as a user would try it.
#include <fmt/format.h>
#include <gtest/gtest.h>

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdio>
#include <set>

#include "app/commands.hpp"
#include "app_test_support.hpp"
#include "io/case_choices.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

/// Whether a command accepted the case (no InputError, not exit status 2).
template <class Command>
bool accepted(Command command) {
    try {
        return command() != 2;
    } catch (const InputError&) {
        return false;
    }
}

struct Verdicts {
    bool check = false, run = false;
};

/// The tiny case with its section from a coordinate file (NACA 0012 thickness, 41 points on
/// a cosine spacing, closed at the trailing edge): [geometry] chord_line needs coordinates.
std::string tiny_file_case_text(const test::AppScratch& scratch) {
    std::string dat = "tiny section\n";
    constexpr int n = 20;
    for (int side : {1, -1})
        for (int k = 0; k <= n; ++k) {
            const int m = side > 0 ? n - k : k;
            if (side < 0 && m == 0) continue;  // the nose once
            const double x = 0.5 * (1.0 - std::cos(M_PI * m / n));
            const double t = 0.6 * (0.2969 * std::sqrt(x) - 0.1260 * x - 0.3516 * x * x +
                                    0.2843 * x * x * x - 0.1036 * x * x * x * x);
            dat += fmt::format("{:.8f} {:.8f}\n", x, side * t);
        }
    test::write_text(scratch / "tiny.dat", dat);
    std::string text = test::tiny_case_text();
    const std::string naca = "naca = \"0012\"";
    text.replace(text.find(naca), naca.size(), "coordinates = \"tiny.dat\"");
    return text;
}

/// `veer check` and a one-step `veer run` of the case `name` with `overrides` (the step cap
/// of one is left out when the overrides set run.steps themselves).
Verdicts both_paths(const test::AppScratch& scratch, const std::vector<std::string>& overrides,
                    int& runs, const std::string& name = "tiny.toml") {
    CaseOptions input{scratch / name, overrides};
    if (std::none_of(overrides.begin(), overrides.end(),
                     [](const std::string& o) { return o.starts_with("run.steps="); }))
        input.overrides.push_back("run.steps=1");
    Verdicts v;
    v.check = accepted([&] { return run_check_command(input); });
    RunOptions run;
    run.input = input;
    run.out_dir = scratch / ("run_" + std::to_string(runs++));
    run.quiet = true;
    v.run = accepted([&] { return run_run_command(run); });
    return v;
}

/// The words of a key and near misses of them, each once.
std::vector<std::string> candidates(const ChoiceKey& key) {
    std::set<std::string> out(key.words.begin(), key.words.end());
    for (std::string w : key.words) {
        std::string swapped = w;
        std::replace(swapped.begin(), swapped.end(), '-', '_');
        out.insert(swapped);
        std::replace(swapped.begin(), swapped.end(), '_', ' ');
        out.insert(swapped);
        w[0] = static_cast<char>(std::toupper(static_cast<unsigned char>(w[0])));
        out.insert(w);
    }
    out.insert("steady-state");
    return {out.begin(), out.end()};
}

TEST(ChoiceKeys, CheckAndRunAgreeOnEveryWordOfEveryChoiceKey) {
    test::AppScratch scratch;
    test::write_text(scratch / "tiny.toml", test::tiny_case_text());
    test::write_text(scratch / "tiny_file.toml", tiny_file_case_text(scratch));
    const std::vector<ChoiceKey> keys = case_choice_keys();
    // trailing_edge, chord_line, model, mode, pressure_solver, steady_scheme
    ASSERT_EQ(keys.size(), 6u);
    int runs = 0, accepted_words = 0;
    for (const ChoiceKey& key : keys) {
        ASSERT_FALSE(key.words.empty()) << key.key;
        for (const std::string& value : candidates(key)) {
            const std::string item = key.table + "." + key.key + "=\"" + value + "\"";
            // chord_line is for coordinate files, trailing_edge for NACA sections.
            const Verdicts v = both_paths(scratch, {item}, runs,
                                          key.key == "chord_line" ? "tiny_file.toml" : "tiny.toml");
            const bool documented =
                std::find(key.words.begin(), key.words.end(), value) != key.words.end();
            EXPECT_EQ(v.check, v.run) << item;
            EXPECT_EQ(v.check, documented) << item;
            accepted_words += v.check && v.run;
        }
    }
    // open/closed, three chord lines, four models, two modes, three pressure solvers, two
    // steady schemes
    EXPECT_EQ(accepted_words, 2 + 3 + 4 + 2 + 3 + 2);
}

TEST(ChoiceKeys, CheckAppliesTheRulesRunApplies) {
    test::AppScratch scratch;
    test::write_text(scratch / "tiny.toml", test::tiny_case_text());
    int runs = 0;
    // The steady pressure smoothing needs a pseudo CFL above 0.25 with "classic" and above
    // 0.25 / 0.6 with "fast" (the default); the tiny grid reaches 10 chords, so a contour or
    // wake station at 50 chords has no grid line.
    const std::vector<std::pair<std::vector<std::string>, bool>> cases = {
        {{"run.cfl=0.2", "run.steady_scheme=\"classic\""}, false},
        {{"run.cfl=0.3", "run.steady_scheme=\"classic\""}, true},
        {{"run.cfl=0.4"}, false},
        {{"run.cfl=0.45"}, true},
        {{"run.cfl=0.2", "run.mode=\"unsteady\""}, true},
        {{"post.wake_stations=[50.0]"}, false},
        {{"post.wake_stations=[2.0]"}, true},
        {{"post.contours=[50.0]"}, false},
        // The transition keys (forced trips with any model of the Spalart-Allmaras family; the
        // critical amplification factor or the turbulence intensity, not both).
        {{"flow.model=\"spalart-allmaras\"", "flow.trip_upper=0.1"}, true},
        {{"flow.model=\"sa-aft\"", "flow.trip_lower=1.2"}, false},
        {{"flow.model=\"sa-aft\"", "flow.turbulence_percent=0.1", "flow.critical_amplification=9"},
         false},
        {{"flow.trip_upper=0.1"}, false},  // the tiny case's laminar model has no trips
        {{"flow.model=\"sa-bcm\"", "flow.turbulence_percent=0.5", "flow.trip_upper=0.2"}, true},
        {{"flow.model=\"sa-bcm\"", "flow.critical_amplification=9"}, false},
    };
    for (const auto& [overrides, ok] : cases) {
        const Verdicts v = both_paths(scratch, overrides, runs);
        EXPECT_EQ(v.check, ok) << overrides.front();
        EXPECT_EQ(v.run, ok) << overrides.front();
    }
}

TEST(ChoiceKeys, CheckAndRunAgreeOnEveryValueOfEveryOtherKey) {
    // Every key that is not a choice key (README, "Case files"; the choice keys are covered
    // above, the coordinates path by the fuzz corpus) with values in and out of range, of the
    // wrong type, and at the ends of the doubles (the trial's run.cfl = 1e-3 passed check and
    // failed run).
    test::AppScratch scratch;
    test::write_text(scratch / "tiny.toml", test::tiny_case_text());
    const std::vector<std::string> keys = {
        "geometry.naca",       "geometry.circle",     "geometry.name",     "mesh.around",
        "mesh.normal",         "mesh.wake",           "mesh.far_field",    "mesh.first_cell",
        "mesh.y_plus",         "mesh.max_growth",     "flow.reynolds",     "flow.alpha",
        "run.steps",           "run.end_time",        "run.cfl",           "run.residual_drop",
        "run.force_tolerance", "run.settle_estimate", "run.output_every",  "run.checkpoint_every",
        "run.start_spin",      "post.contours",       "post.wake_stations"};
    // [50.0]: a contour or wake station beyond the tiny grid's far field (10 chords), a rule
    // only the run's set-up knows.
    const std::vector<std::string> values = {"0",     "-1",     "1e-3",  "0.5",  "3",     "50",
                                             "1e308", "1e-308", "\"3\"", "true", "[2.0]", "[50.0]"};
    int runs = 0, agreed = 0, accepted_values = 0;
    for (const std::string& key : keys)
        for (const std::string& value : values) {
            const Verdicts v = both_paths(scratch, {key + "=" + value}, runs);
            EXPECT_EQ(v.check, v.run) << key << "=" << value;
            agreed += v.check == v.run;
            accepted_values += v.check && v.run;
        }
    EXPECT_EQ(agreed, 23 * 12);
    // Some values must pass both (e.g. mesh.far_field = 3, run.cfl = 3), or the comparison
    // would only show that both refuse everything.
    std::printf("check and run agree on %d key values, %d accepted by both\n", agreed,
                accepted_values);
    EXPECT_GE(accepted_values, 15);
}

}  // namespace
}  // namespace veer
