// Case-file reading: the documented keys, defaults, and one-line errors naming file, line and key.
#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>

#include "io/case_file.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

const char* minimal_case = R"([geometry]
naca = "0012"
[mesh]
around = 128
normal = 32
wake = 24
far_field = 30
first_cell = 2e-4
[flow]
reynolds = 1000
alpha = 4.0
model = "laminar"
)";

/// The message of the InputError that parsing `text` throws ("" if none).
std::string error_of(const std::string& text, std::vector<std::string> overrides = {}) {
    try {
        parse_case_text(text, "case.toml", ".", overrides);
    } catch (const InputError& e) {
        return e.what();
    }
    return "";
}

TEST(CaseFile, ReadsTheDocumentedKeys) {
    const CaseSpec c = parse_case_text(minimal_case, "case.toml", ".");
    EXPECT_EQ(c.geometry.naca, "0012");
    EXPECT_EQ(c.mesh.around, 128);
    EXPECT_EQ(c.mesh.normal, 32);
    EXPECT_EQ(c.mesh.wake, 24);
    EXPECT_DOUBLE_EQ(c.mesh.far_field, 30.0);
    EXPECT_DOUBLE_EQ(c.mesh.first_cell, 2e-4);
    EXPECT_DOUBLE_EQ(c.flow.reynolds, 1000.0);
    EXPECT_DOUBLE_EQ(c.flow.alpha_deg, 4.0);
    EXPECT_EQ(c.model.name, "laminar");
    EXPECT_EQ(c.run.mode, TimeMode::steady);
    EXPECT_EQ(c.text, minimal_case);
}

TEST(CaseFile, WakeDefaultsToThreeSixteenthsOfAround) {
    const CaseSpec c = parse_case_text(
        "[geometry]\nnaca = \"4412\"\n[mesh]\naround = 512\n"
        "[flow]\nreynolds = 500\n",
        "case.toml", ".");
    EXPECT_EQ(c.mesh.wake, 96);
}

TEST(CaseFile, UnknownKeyNamesFileLineAndKey) {
    std::string text = minimal_case;
    text.insert(text.find("[flow]"), "bogus_key = 3\n");
    const std::string msg = error_of(text);
    EXPECT_NE(msg.find("case.toml:9"), std::string::npos) << msg;
    EXPECT_NE(msg.find("bogus_key"), std::string::npos) << msg;
    EXPECT_NE(msg.find("allowed keys"), std::string::npos) << msg;
}

TEST(CaseFile, WrongTypeAndOutOfRangeNameTheAllowedValues) {
    std::string text = minimal_case;
    text.replace(text.find("around = 128"), 12, "around = \"many\"");
    std::string msg = error_of(text);
    EXPECT_NE(msg.find("case.toml:4"), std::string::npos) << msg;
    EXPECT_NE(msg.find("an integer"), std::string::npos) << msg;

    text = minimal_case;
    text.replace(text.find("alpha = 4.0"), 11, "alpha = 120");
    msg = error_of(text);
    EXPECT_NE(msg.find("case.toml:11"), std::string::npos) << msg;
    EXPECT_NE(msg.find("-90 to 90"), std::string::npos) << msg;

    text = minimal_case;
    text.replace(text.find("around = 128"), 12, "around = 127");
    EXPECT_NE(error_of(text).find("even"), std::string::npos);

    text = minimal_case;
    text.replace(text.find("\"laminar\""), 9, "\"k-omega\"");
    EXPECT_NE(error_of(text).find("spalart-allmaras"), std::string::npos);
}

TEST(CaseFile, SteadySchemeIsFastUnlessTheCaseAsksForClassic) {
    EXPECT_EQ(parse_case_text(minimal_case, "case.toml", ".").run.steady_scheme,
              SteadyScheme::fast);
    const std::string text = std::string(minimal_case) + "[run]\nsteady_scheme = \"classic\"\n";
    EXPECT_EQ(parse_case_text(text, "case.toml", ".").run.steady_scheme, SteadyScheme::classic);
    const std::string msg =
        error_of(std::string(minimal_case) + "[run]\nsteady_scheme = \"slow\"\n");
    EXPECT_NE(msg.find("case.toml:14"), std::string::npos) << msg;
    EXPECT_NE(msg.find("steady_scheme"), std::string::npos) << msg;
    EXPECT_NE(msg.find("\"classic\" or \"fast\""), std::string::npos) << msg;
}

TEST(CaseFile, SettleEstimateIsOnUnlessTheCaseTurnsItOff) {
    EXPECT_TRUE(parse_case_text(minimal_case, "case.toml", ".").run.settle_estimate);
    const std::string off = std::string(minimal_case) + "[run]\nsettle_estimate = false\n";
    EXPECT_FALSE(parse_case_text(off, "case.toml", ".").run.settle_estimate);
    const std::string msg =
        error_of(std::string(minimal_case) + "[run]\nsettle_estimate = \"no\"\n");
    EXPECT_NE(msg.find("case.toml:14"), std::string::npos) << msg;
    EXPECT_NE(msg.find("settle_estimate"), std::string::npos) << msg;
    EXPECT_NE(msg.find("true or false"), std::string::npos) << msg;
}

TEST(CaseFile, GeometryNeedsExactlyOneSource) {
    std::string text = minimal_case;
    text.replace(text.find("naca = \"0012\""), 13, "");
    EXPECT_NE(error_of(text).find("exactly one of"), std::string::npos);
    text = minimal_case;
    text.replace(text.find("naca = \"0012\""), 13, "naca = \"12a4\"");
    EXPECT_NE(error_of(text).find("four digits"), std::string::npos);
}

TEST(CaseFile, CoordinatePathsAreRelativeToTheCaseFile) {
    const auto dir = std::filesystem::temp_directory_path() / "veer_case_file_test";
    std::filesystem::create_directories(dir);
    std::ofstream(dir / "section.dat") << "1 0\n0 0\n";
    std::ofstream(dir / "c.toml") << "[geometry]\ncoordinates = \"section.dat\"\n[flow]\n"
                                     "reynolds = 1e4\n";
    const CaseSpec c = read_case_file(dir / "c.toml");
    EXPECT_EQ(c.geometry.coordinates, dir / "section.dat");
    std::ofstream(dir / "d.toml") << "[geometry]\ncoordinates = \"nowhere.dat\"\n[flow]\n"
                                     "reynolds = 1e4\n";
    try {
        read_case_file(dir / "d.toml");
        FAIL() << "a missing coordinate file was accepted";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("d.toml:2"), std::string::npos) << e.what();
    }
}

TEST(CaseFile, ChordLineKeyChoosesTheConventionForCoordinateFiles) {
    const auto dir = std::filesystem::temp_directory_path() / "veer_case_chord_line";
    std::filesystem::create_directories(dir);
    std::ofstream(dir / "section.dat") << "1 0\n0 0\n";
    const std::string head = "[geometry]\ncoordinates = \"section.dat\"\n";
    const std::string flow = "[flow]\nreynolds = 1e4\n";
    const auto parse = [&](const std::string& line) {
        return parse_case_text(head + line + flow, "c.toml", dir);
    };
    EXPECT_EQ(parse("").geometry.chord_line, ChordLineChoice::automatic);
    EXPECT_EQ(parse("chord_line = \"auto\"\n").geometry.chord_line, ChordLineChoice::automatic);
    EXPECT_EQ(parse("chord_line = \"file-axes\"\n").geometry.chord_line,
              ChordLineChoice::file_axes);
    EXPECT_EQ(parse("chord_line = \"nose-to-tail\"\n").geometry.chord_line,
              ChordLineChoice::nose_to_tail);
    try {
        parse("chord_line = \"leading-edge\"\n");
        FAIL() << "an unknown chord_line was accepted";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("c.toml:3: [geometry] chord_line = \"leading-edge\": "
                                             "expected \"auto\", \"file-axes\" or "
                                             "\"nose-to-tail\""),
                  std::string::npos)
            << e.what();
    }
    std::string naca = minimal_case;
    naca.insert(naca.find("[mesh]"), "chord_line = \"file-axes\"\n");
    EXPECT_NE(error_of(naca).find("chord_line only with coordinates (a NACA section keeps its "
                                  "analytic chord line)"),
              std::string::npos)
        << error_of(naca);
}

TEST(CaseFile, CommandLineOverridesReplaceValues) {
    const CaseSpec c =
        parse_case_text(minimal_case, "case.toml", ".", {"flow.alpha=-6", "run.mode=unsteady"});
    EXPECT_DOUBLE_EQ(c.flow.alpha_deg, -6.0);
    EXPECT_EQ(c.run.mode, TimeMode::time_accurate);
    EXPECT_NE(c.text.find("unsteady"), std::string::npos);
    EXPECT_NE(error_of(minimal_case, {"flow.alpha"}).find("table.key=value"), std::string::npos);
    EXPECT_NE(error_of(minimal_case, {"mesh.nonsense=3"}).find("nonsense"), std::string::npos);
}

TEST(CaseFile, SpalartAllmarasDefaultsToYPlusOne) {
    const CaseSpec c = parse_case_text(
        "[geometry]\nnaca = \"0012\"\n[flow]\nreynolds = 6e6\n"
        "model = \"spalart-allmaras\"\n",
        "case.toml", ".");
    ASSERT_TRUE(c.y_plus.has_value());
    EXPECT_DOUBLE_EQ(*c.y_plus, 1.0);
    EXPECT_NE(error_of(std::string(minimal_case) + "[post]\ncontours = [0.5, 50]\n")
                  .find("outside the grid"),
              std::string::npos);
}

TEST(CaseFile, ChoiceKeysAreTypedWithOneSpelling) {
    const CaseSpec c = parse_case_text(
        std::string(minimal_case) + "[run]\nmode = \"unsteady\"\npressure_solver = \"eigen-cg\"\n",
        "case.toml", ".");
    EXPECT_EQ(c.run.mode, TimeMode::time_accurate);
    EXPECT_EQ(c.run.pressure_solver, PressureSolverKind::eigen_cg);
    EXPECT_EQ(
        parse_case_text(minimal_case, "case.toml", ".", {"run.pressure_solver=eigen-bicgstab"})
            .run.pressure_solver,
        PressureSolverKind::eigen_bicgstab);
    EXPECT_EQ(parse_case_text(minimal_case, "case.toml", ".", {"geometry.trailing_edge=closed"})
                  .geometry.trailing_edge,
              TrailingEdge::closed);
    // The underscore spelling the solver once took is refused, naming the line, the value and
    // the words allowed.
    const std::string msg =
        error_of(std::string(minimal_case) + "[run]\npressure_solver = \"eigen_cg\"\n");
    EXPECT_NE(msg.find("case.toml:14"), std::string::npos) << msg;
    EXPECT_NE(msg.find("\"eigen_cg\""), std::string::npos) << msg;
    EXPECT_NE(msg.find("\"multigrid\", \"eigen-cg\" or \"eigen-bicgstab\""), std::string::npos)
        << msg;
    EXPECT_NE(error_of(minimal_case, {"flow.model=k-epsilon"}).find("\"spalart-allmaras\""),
              std::string::npos);
}

TEST(CaseFile, SteadyCflBelowThePressureSmoothingLimitIsRefused) {
    // rhie_chow_scale 0.5: the steady pseudo CFL must exceed 0.25 with "classic" and
    // 0.25 / 0.6 with "fast" (projection fraction 0.6; solver/README.md), as the solver demands.
    const std::string classic = "run.steady_scheme=classic";
    const std::string msg = error_of(minimal_case, {"run.cfl=0.2", classic});
    EXPECT_NE(msg.find("cfl = 0.2"), std::string::npos) << msg;
    EXPECT_NE(msg.find("above 0.25"), std::string::npos) << msg;
    EXPECT_EQ(error_of(minimal_case, {"run.cfl=0.3", classic}), "");
    const std::string fast = error_of(minimal_case, {"run.cfl=0.4"});
    EXPECT_NE(fast.find("above 0.417"), std::string::npos) << fast;
    EXPECT_NE(fast.find("\"fast\""), std::string::npos) << fast;
    EXPECT_EQ(error_of(minimal_case, {"run.cfl=0.42"}), "");
    EXPECT_EQ(error_of(minimal_case, {"run.cfl=0.2", "run.mode=unsteady"}), "");
}

TEST(CaseFile, InvalidTomlGivesLine) {
    const std::string msg = error_of("[geometry]\nnaca = \"0012\n");
    EXPECT_NE(msg.find("case.toml:2"), std::string::npos) << msg;
}

TEST(CaseFile, SurfaceSlopeIsReadCheckedAndNamed) {
    EXPECT_DOUBLE_EQ(parse_case_text(minimal_case, "case.toml", ".").mesh.surface_slope,
                     default_surface_slope);
    EXPECT_DOUBLE_EQ(parse_case_text(minimal_case, "case.toml", ".", {"mesh.surface_slope=0.2"})
                         .mesh.surface_slope,
                     0.2);
    const std::string msg = error_of(minimal_case, {"mesh.surface_slope=0"});
    EXPECT_NE(msg.find("surface_slope"), std::string::npos) << msg;
    EXPECT_NE(msg.find("0.01 to 2"), std::string::npos) << msg;
    const char* circle = "[geometry]\ncircle = true\n[flow]\nreynolds = 100\n";
    EXPECT_NE(error_of(circle, {"mesh.surface_slope=0.2"}).find("no surface_slope key"),
              std::string::npos);
}

TEST(CaseFile, CircleIsASectionOfItsOwn) {
    const char* circle =
        "[geometry]\ncircle = true\n[mesh]\naround = 128\nfar_field = 60\n"
        "[flow]\nreynolds = 100\n[run]\nmode = \"unsteady\"\nstart_spin = 0.25\n";
    const CaseSpec c = parse_case_text(circle, "case.toml", ".");
    EXPECT_TRUE(c.geometry.circle);
    EXPECT_TRUE(c.geometry.naca.empty());
    EXPECT_EQ(c.geometry.name, "circle");
    EXPECT_DOUBLE_EQ(c.run.start_spin, 0.25);
    EXPECT_DOUBLE_EQ(parse_case_text(minimal_case, "case.toml", ".").run.start_spin, 0.0);
    // Exactly one section; the circle has no trailing edge, no wake cut, no angle of attack.
    std::string msg = error_of(std::string(circle), {"geometry.naca=\"0012\""});
    EXPECT_NE(msg.find("exactly one of"), std::string::npos) << msg;
    EXPECT_NE(msg.find("circle = true"), std::string::npos) << msg;
    msg = error_of(circle, {"geometry.circle=false"});
    EXPECT_NE(msg.find("circle = false"), std::string::npos) << msg;
    msg = error_of(circle, {"geometry.trailing_edge=\"closed\""});
    EXPECT_NE(msg.find("trailing_edge"), std::string::npos) << msg;
    msg = error_of(circle, {"mesh.wake=24"});
    EXPECT_NE(msg.find("no wake key"), std::string::npos) << msg;
    msg = error_of(circle, {"flow.alpha=4"});
    EXPECT_NE(msg.find("no angle of attack"), std::string::npos) << msg;
    EXPECT_NE(msg.find("alpha = 4"), std::string::npos) << msg;
}

TEST(CaseFile, StartSpinOnlyForAnUnsteadyCircle) {
    std::string msg =
        error_of(std::string(minimal_case) + "[run]\nmode = \"unsteady\"\nstart_spin = 0.3\n");
    EXPECT_NE(msg.find("case.toml:15"), std::string::npos) << msg;
    EXPECT_NE(msg.find("only a circle"), std::string::npos) << msg;
    msg = error_of("[geometry]\ncircle = true\n[flow]\nreynolds = 100\n[run]\nstart_spin = 0.3\n");
    EXPECT_NE(msg.find("mode = \"unsteady\""), std::string::npos) << msg;
    msg = error_of(
        "[geometry]\ncircle = true\n[flow]\nreynolds = 100\n[run]\nmode = "
        "\"unsteady\"\nstart_spin = 5\n");
    EXPECT_NE(msg.find("from 0 to 2"), std::string::npos) << msg;
}

}  // namespace
}  // namespace veer

namespace veer {
namespace {

std::string transition_case(const std::string& model, const std::string& keys) {
    return "[geometry]\nnaca = \"0012\"\n[flow]\nreynolds = 1e6\nmodel = \"" + model + "\"\n" +
           keys;
}

TEST(CaseFile, TransitionKeysReachTheModel) {
    const CaseSpec c = parse_case_text(
        transition_case("sa-aft",
                        "trip_upper = 0.05\ntrip_lower = 0.1\nturbulence_percent = 0.2\n"),
        "case.toml", ".");
    EXPECT_EQ(c.model.name, "sa-aft");
    ASSERT_EQ(c.model.options.size(), 3u);
    EXPECT_EQ(c.model.options.at("trip_upper"), 0.05);
    EXPECT_EQ(c.model.options.at("trip_lower"), 0.1);
    EXPECT_EQ(c.model.options.at("turbulence_percent"), 0.2);
    // Trips alone with the fully turbulent model.
    const CaseSpec sa = parse_case_text(transition_case("spalart-allmaras", "trip_upper = 0.3\n"),
                                        "case.toml", ".");
    EXPECT_EQ(sa.model.options.at("trip_upper"), 0.3);
}

TEST(CaseFile, TransitionKeysAreCheckedAndNamed) {
    // Out of range: the key, its value and the range.
    const std::string far = error_of(transition_case("sa-aft", "trip_upper = 1.5\n"));
    EXPECT_NE(far.find("trip_upper = 1.5"), std::string::npos) << far;
    EXPECT_NE(far.find("from 0 to 1"), std::string::npos) << far;
    // Excluding each other.
    const std::string both = error_of(
        transition_case("sa-aft", "turbulence_percent = 0.1\ncritical_amplification = 9\n"));
    EXPECT_NE(both.find("not both"), std::string::npos) << both;
    EXPECT_NE(both.find("case.toml"), std::string::npos) << both;
    // A key the chosen model does not read is an unknown key, with the model's keys listed.
    const std::string laminar = error_of(transition_case("laminar", "trip_upper = 0.1\n"));
    EXPECT_NE(laminar.find("unknown key 'trip_upper'"), std::string::npos) << laminar;
    const std::string sa =
        error_of(transition_case("spalart-allmaras", "critical_amplification = 9\n"));
    EXPECT_NE(sa.find("unknown key 'critical_amplification'"), std::string::npos) << sa;
    EXPECT_NE(sa.find("trip_upper"), std::string::npos) << sa;
}

}  // namespace
}  // namespace veer
