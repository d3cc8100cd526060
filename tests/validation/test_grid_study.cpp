/// `veer grid-study` end to end on the issue-14 acceptance cases (each study computed once per
/// build, tests/validation/computed_once.hpp):
/// - Laminar NACA 0012, Re 1000, alpha 4 (the indoor flyer's section): case grid 128 x 32, wake
///   24, far field 30, first cell 2e-3 as the finest, ratio sqrt 2 (128/92/64 around, 32/24/16
///   normal, 24/16/12 wake). Observed order of Cl and Cd between 1.5 and 2.5, the second-order
///   scheme's asymptotic range (Celik et al. 2008 ask for an observed order near the formal one).
///   Measured 2.26 and 2.11. (The family one step finer, 256/180/128, gives 4.8 on Cl and 1.96 on
///   Cd: Cl changes by only 3e-4 between its two finest grids, and the per-dimension ratios after
///   rounding to multiples of 4 differ by up to 10 %; it is not the family gated here.)
/// - Spalart-Allmaras NACA 0012, Re 6e6, alpha 10, fully turbulent: the family of
///   test_sa_naca0012.cpp (384 x 160, wake 64, y+ 1, far field 100, ratio 4/3) with the far field
///   doubled on the finest grid. Compared with the NASA Turbulence Modeling Resource SA results of
///   seven codes on 897 x 257 [P] (tests/reference/tmr_naca0012_sa.csv): the extrapolated Cl
///   (times the Prandtl-Glauert factor 1 / sqrt(1 - 0.15^2) for the resource's M = 0.15, as in
///   test_sa_naca0012.cpp) and Cd must lie in the codes' band widened by our own GCI band.
///   The far-boundary force check (outermost contour, momentum balance) within 1 % of the surface
///   lift on the finest grid.
#include <gtest/gtest.h>

#include <cmath>
#include <fstream>
#include <iostream>
#include <nlohmann/json.hpp>

#include "app/commands.hpp"
#include "computed_once.hpp"
#include "io/json_writer.hpp"
#include "tests/reference_table.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

const double prandtl_glauert = 1.0 / std::sqrt(1.0 - 0.15 * 0.15);

const char* const laminar_case =
    "[geometry]\nnaca = \"0012\"\n[mesh]\naround = 128\nnormal = 32\nwake = 24\n"
    "far_field = 30\nfirst_cell = 2e-3\n[flow]\nreynolds = 1000\nalpha = 4\n"
    "model = \"laminar\"\n[run]\nsteps = 20000\n";

const char* const sa_case =
    "[geometry]\nnaca = \"0012\"\ntrailing_edge = \"closed\"\n[mesh]\naround = 384\n"
    "normal = 160\nwake = 64\nfar_field = 100\ny_plus = 1.0\n[flow]\nreynolds = 6e6\n"
    "alpha = 10\nmodel = \"spalart-allmaras\"\n[run]\nsteps = 8000\n";

/// The study folder of `case_text` run with `ratio` (and the far-boundary grid if asked).
fs::path study(const std::string& name, const std::string& case_text, double ratio, bool far) {
    const std::string inputs = case_text + "ratio " + std::to_string(ratio) + (far ? " far" : "");
    const fs::path dir = test::computed_once(name, inputs, [&](const fs::path& d) {
        std::ofstream(d / "case.toml") << case_text;
        GridStudyOptions o;
        o.input.case_file = d / "case.toml";
        o.out_dir = d / "study";
        o.ratio = ratio;
        o.far_boundary = far;
        o.quiet = true;
        if (run_grid_study_command(o) != 0) throw std::runtime_error("grid study failed");
    });
    return dir / "study";
}

void print_figure(const nlohmann::json& s, const std::string& key) {
    const nlohmann::json& f = s["figures"][key];
    std::cout << key << ": " << f["values"].dump() << ", order " << f["observed_order"]
              << ", extrapolated " << f["extrapolated"] << ", GCI fine " << f["gci_fine"]
              << ", band " << f["band"] << "; " << f["verdict_text"].get<std::string>() << "\n";
}

TEST(GridStudyValidation, LaminarOrderOfClAndCdNearTwo) {
    const nlohmann::json s = read_json_file(
        study("grid_study_laminar", laminar_case, std::sqrt(2.0), false) / "grid_study.json");
    ASSERT_TRUE(s["all_converged"].get<bool>());
    for (const char* k : {"cl", "cd"}) {
        print_figure(s, k);
        const double p = s["figures"][k]["observed_order"];
        EXPECT_GE(p, 1.5) << k;
        EXPECT_LE(p, 2.5) << k;
    }
}

TEST(GridStudyValidation, SaTenDegreesInsideTheCodesBandWidenedByItsGci) {
    const fs::path dir = study("grid_study_sa10", sa_case, 4.0 / 3.0, true);
    const nlohmann::json s = read_json_file(dir / "grid_study.json");
    ASSERT_TRUE(s["all_converged"].get<bool>());
    const test::ReferenceTable tmr = test::ReferenceTable::read("tmr_naca0012_sa.csv", 3);
    const std::size_t ten = tmr.row_where("alpha_deg", "10");
    int compared = 0;
    for (const char* k : {"cl", "cd"}) {
        print_figure(s, k);
        const nlohmann::json& f = s["figures"][k];
        ASSERT_TRUE(f["extrapolated"].is_number()) << k << ": " << f["verdict_text"];
        const double scale = std::string(k) == "cl" ? prandtl_glauert : 1.0;
        const double ext = scale * f["extrapolated"].get<double>();
        const double band = scale * f["band"].get<double>();
        const double lo = tmr.number(ten, std::string(k) + "_min") - band;
        const double hi = tmr.number(ten, std::string(k) + "_max") + band;
        std::cout << k << " extrapolated " << ext << " against the codes' band widened by ours ["
                  << lo << ", " << hi << "]\n";
        EXPECT_GE(ext, lo) << k;
        EXPECT_LE(ext, hi) << k;
        ++compared;
    }
    ASSERT_EQ(compared, 2);
    // The far-boundary component is reported (the change when the far field is twice as far).
    ASSERT_TRUE(s["figures"]["cl"]["far_boundary_change"].is_number());
    std::cout << "far field 100 -> 200 chords: Cl change "
              << s["figures"]["cl"]["far_boundary_change"] << ", Cd change "
              << s["figures"]["cd"]["far_boundary_change"] << "\n";
    // The outermost contour's momentum lift within 1 % of the surface lift (issue 14).
    const nlohmann::json fine = read_json_file(dir / "fine" / "summary.json");
    const double cl = fine["cl"], outer = fine["cl_momentum_outermost"];
    std::cout << "outermost contour at " << fine["outermost_contour_distance"] << " chords: Cl "
              << outer << " against the surface's " << cl << "\n";
    EXPECT_LT(std::abs(outer - cl), 0.01 * std::abs(cl));
}

}  // namespace
}  // namespace veer
