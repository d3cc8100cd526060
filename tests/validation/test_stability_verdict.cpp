/// The sweep's steady/unsteady verdict where it sat on its threshold: laminar NACA 0012 at
/// Re 1000 and 8 degrees on the default grid (the case-file defaults), as `veer sweep` runs the
/// point (converged steady, then the disturbed time-accurate check: app/sweep_stability.hpp).
/// The old rule read the largest |Cl - Cl steady| over the check's last quarter against 1e-3;
/// there the time-accurate flow settles 6.8e-4 away from the pseudo-time solution while its
/// oscillation decays at about 0.09 per time unit, so the figure sat at 1.1e-3 and the verdict
/// could go either way. Two equivalent runs -- the time-accurate check at CFL 4 (the default)
/// and at CFL 3 -- must now reach the same verdict, each decided within the default check of
/// 6 time units (app/SWEEPS.md gives the measured ratios and the rule's margin).
///
/// Whether 8 degrees is steady is not checked against a published value here: Kurtulus (2015,
/// abstract; tests/reference/kurtulus2015_naca0012_re1000.csv) places the onset "at about
/// 8 deg", which either verdict satisfies (tests/validation/test_sweep_low_re.cpp).
///
/// Measured: ratio 0.751 at CFL 4 and 0.708 at CFL 3, both kept (steady). Cost: two points, each
/// about 900 steady iterations and 600 time-accurate steps, 5.3 CPU minutes (13.6 minutes of wall
/// time on a heavily loaded 2-core machine).
#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <iostream>

#include "app/commands.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_record.hpp"
#include "io/json_writer.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

PointRecord eight_degrees(const fs::path& work, const char* cfl) {
    SweepOptions o;
    o.input.case_file = work / "case.toml";
    o.input.overrides = {std::string("run.cfl=").append(cfl)};
    o.alpha = std::to_string(8);  // (a one-letter literal trips a false -Wrestrict in GCC 12)
    o.out_dir = work / std::string("cfl_").append(cfl);
    o.quiet = true;
    EXPECT_EQ(run_sweep_command(o), 0);
    const fs::path p = record_path(o.out_dir / point_folder_name(8.0));
    return record_from_json(read_json_file(p), p.string());
}

TEST(StabilityVerdict, EightDegreesAtReynolds1000IsTheSameOnTwoTimeSteps) {
    const fs::path work = fs::temp_directory_path() / "veer_validation_stability_verdict";
    fs::remove_all(work);
    fs::create_directories(work);
    std::ofstream(work / "case.toml") << "[geometry]\nnaca = \"0012\"\n[flow]\nreynolds = 1000\n"
                                         "model = \"laminar\"\n[run]\nmode = \"steady\"\n";
    const PointRecord a = eight_degrees(work, "4"), b = eight_degrees(work, "3");
    for (const PointRecord* r : {&a, &b})
        std::cout << "8 deg: " << r->regime << ", Cl " << r->cl << " -- " << r->note << "\n";
    EXPECT_EQ(a.regime, b.regime);
    for (const PointRecord* r : {&a, &b}) {
        EXPECT_NE(r->regime, "failed") << r->note;
        // Decided at the first judgement, not after extending the check.
        EXPECT_NE(r->note.find("check of 6 time units"), std::string::npos) << r->note;
        EXPECT_EQ(r->note.find("undecided"), std::string::npos) << r->note;
    }
    fs::remove_all(work);
}

}  // namespace
}  // namespace veer
