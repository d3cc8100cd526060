/// Laminar NACA 0012 at Re = 1000, swept through the onset of unsteadiness on the default grid
/// (the case-file defaults: 256 cells around, 64 out, 48 along each side of the wake cut, far
/// field 40 chords), as `veer sweep` runs it: steady attempts, the stall detector, the disturbed
/// stability check of separated points and the time-accurate continuation.
///
/// Published reference (tests/reference/kurtulus2015_naca0012_re1000.csv):
/// - Kurtulus, D. F. (2015) Int. J. Micro Air Vehicles 7(3), 301-326, abstract [P]: 2D laminar
///   NACA 0012 at Re = 1000, "the unsteady vortex pattern is observed at about 8 deg".
/// - Gupta et al. (2023) J. Fluid Mech. map the steady -> periodic wake transition over
///   0 <= alpha <= 20 deg, 500 <= Re <= 5000; no number from it was found to quote here.
/// "About 8 deg" is read as: steady at 6 deg, periodic by 10 deg, so the first unsteady point of
/// a 2-degree sweep is 8 or 10 deg. A 2-degree sweep cannot place the onset more finely.
///
/// Not checked, and why: Cl and Cd against published values. No table of Cl, Cd (or of the
/// Strouhal number) at Re = 1000 from these papers or from Di Ilio et al. (2018, Computers &
/// Fluids 166, 200-208) was found in the sources searched (their abstracts only), and values
/// from memory may not gate a test. The Strouhal number of the shedding point is checked for
/// consistency of the shipped extraction only (spectral peak against the count of whole
/// cycles), not against a published value.
///
/// Cost: three points, two of them time-accurate, about 2 minutes on one core (time-accurate
/// points at CFL 4): labelled validation.
#include <gtest/gtest.h>

#include <cmath>
#include <filesystem>
#include <fstream>
#include <iostream>

#include "app/commands.hpp"
#include "app/report_csv.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_record.hpp"
#include "io/json_writer.hpp"
#include "postprocess/time_average.hpp"
#include "tests/reference_table.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

PointRecord record_at(const fs::path& sweep_dir, double alpha) {
    const fs::path p = record_path(sweep_dir / point_folder_name(alpha));
    return record_from_json(read_json_file(p), p.string());
}

TEST(SweepLowRe, UnsteadinessSetsInNearEightDegrees) {
    const fs::path work = fs::temp_directory_path() / "veer_validation_sweep_low_re";
    fs::remove_all(work);
    fs::create_directories(work);
    std::ofstream(work / "case.toml") << "[geometry]\nnaca = \"0012\"\n[flow]\nreynolds = 1000\n"
                                         "model = \"laminar\"\n[run]\nmode = \"steady\"\n";
    // Kurtulus (2015), abstract: unsteady from about 8 degrees at Re 1000 [P].
    const test::ReferenceTable kurtulus =
        test::ReferenceTable::read("kurtulus2015_naca0012_re1000.csv", 2);
    ASSERT_EQ(kurtulus.value("reynolds"), 1000.0);
    const double onset = kurtulus.value("unsteady_onset_alpha_deg");
    SweepOptions o;
    o.input.case_file = work / "case.toml";
    o.alpha = std::to_string(onset - 2.0) + ":" + std::to_string(onset + 2.0) + ":2";
    o.out_dir = work / "sweep";
    o.quiet = true;
    ASSERT_EQ(run_sweep_command(o), 0);

    const PointRecord at6 = record_at(o.out_dir, onset - 2.0);
    const PointRecord at8 = record_at(o.out_dir, onset);
    const PointRecord at10 = record_at(o.out_dir, onset + 2.0);
    for (const PointRecord* r : {&at6, &at8, &at10})
        std::cout << "alpha " << r->alpha << ": " << r->regime << ", Cl " << r->cl << ", Cd "
                  << r->cd << (r->strouhal ? ", St " + std::to_string(*r->strouhal) : "") << " -- "
                  << r->note << "\n";
    EXPECT_EQ(at6.regime, "steady") << at6.note;
    EXPECT_EQ(at10.regime, "unsteady") << at10.note;
    EXPECT_NE(at8.regime, "failed") << at8.note;

    // The shipped St extraction on the real run: the spectral peak and the number of whole
    // cycles over the window must agree to within one cycle's resolution of the count.
    ASSERT_TRUE(at10.strouhal);
    const CsvTable h = CsvTable::read(o.out_dir / at10.folder / at10.final_run / "history.csv");
    const UnsteadyStats s =
        unsteady_stats({h.numbers("time"), h.numbers("cl"), h.numbers("cd"), h.numbers("cm")});
    ASSERT_TRUE(s.periodic);
    ASSERT_GE(s.cycles, 3);
    const double counted = s.cycles / (s.window_end - s.window_begin);
    EXPECT_NEAR(*s.strouhal, counted, counted / s.cycles);
    // The record holds the same extraction. It reads the force history from memory at full
    // precision, this test from history.csv's printed digits (8 decimals), so they agree to the
    // rounding of the file, not to the last bit: measured 3e-9 relative.
    EXPECT_NEAR(*s.strouhal, *at10.strouhal, 1e-7 * *at10.strouhal);
    fs::remove_all(work);
}

}  // namespace
}  // namespace veer
