#pragma once
/// NACA 0012 runs of the transition validation, each through `veer run`'s own path
/// (run_run_command) on the grid of the project's transition check: 320 cells around, 112
/// normal, far field 60 chords, first cell at y+ 1 (the wake default), steady, the case files'
/// default scheme and criteria. Each run is computed once per build (computed_once.hpp) and
/// shared by the tests that read it.
#include <cmath>
#include <filesystem>
#include <fstream>
#include <optional>
#include <sstream>
#include <stdexcept>
#include <string>

#include "app/commands.hpp"
#include "computed_once.hpp"
#include "io/json_writer.hpp"

namespace veer::test {

/// What the tests read from a run's summary.json.
struct SectionRun {
    double cl = 0.0, cd = 0.0;
    long iterations = 0;
    bool converged = false;
    std::optional<double> transition_upper, transition_lower;  ///< x/c; none: laminar to the TE
    std::filesystem::path run_dir;                             ///< the run folder (surface.csv)
};

/// `key` of summary.json as a number, NaN where it is absent or not a number.
inline double number_or_nan(const nlohmann::json& s, const char* key) {
    return s.contains(key) && s.at(key).is_number() ? s.at(key).get<double>() : std::nan("");
}

/// The case text of one point; `flow_keys` are further [flow] lines (model options); `wall`
/// the [mesh] line of the first cell (y+ 1 by default; a first_cell line for a grid family).
inline std::string naca0012_case(double reynolds, double alpha, const std::string& model,
                                 const std::string& flow_keys, int around = 320, int normal = 112,
                                 const std::string& wall = "y_plus = 1.0") {
    std::ostringstream s;
    s << "[geometry]\nnaca = \"0012\"\n[mesh]\naround = " << around << "\nnormal = " << normal
      << "\nfar_field = 60\n"
      << wall << "\n[flow]\nreynolds = " << reynolds << "\nalpha = " << alpha << "\nmodel = \""
      << model << "\"\n"
      << flow_keys << "[run]\nmode = \"steady\"\nsteps = 6000\n";
    return s.str();
}

/// The run of `case_text`, computed once per build under `name`.
inline SectionRun section_run(const std::string& name, const std::string& case_text) {
    const std::filesystem::path dir =
        computed_once(name, case_text, [&](const std::filesystem::path& d) {
            std::ofstream(d / "case.toml") << case_text;
            RunOptions run;
            run.input.case_file = d / "case.toml";
            run.out_dir = d / "run";
            run.quiet = true;
            // 0 converged, 1 the step cap (read from the summary); anything else (an interrupt,
            // bad input, divergence) throws, so that no stamp marks the folder as computed.
            const int status = run_run_command(run);
            if (status != 0 && status != 1)
                throw std::runtime_error("veer run ended with exit status " +
                                         std::to_string(status) + " in " + d.string());
        });
    const nlohmann::json s = read_json_file(dir / "run" / "summary.json");
    const auto x_or_none = [&](const char* key) {
        return s.at(key).is_null() ? std::optional<double>() : s.at(key).get<double>();
    };
    return {s.at("cl").get<double>(),
            s.at("cd").get<double>(),
            s.at("iterations").get<long>(),
            s.at("converged").get<bool>(),
            x_or_none("transition_upper"),
            x_or_none("transition_lower"),
            dir / "run"};
}

}  // namespace veer::test
