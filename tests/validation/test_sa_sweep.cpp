/// Spalart-Allmaras angle-of-attack sweep of NACA 0012 at Re = 6e6, fully turbulent, run as
/// `veer sweep` runs it (run_sweep_command on the shipped case cases/wind-turbine-sweep-sa.toml:
/// the steady attempts, the stall detector, the polar figures of summary.json),
/// against experiment:
/// - Ladson, C. L. (1988) NASA TM-4074, M = 0.15, Re = 6e6, 80-grit trip [P], as distributed by
///   the NASA Turbulence Modeling Resource (tests/reference/ladson1988_naca0012.csv); its
///   least-squares lift slopes are derived here from the table (0.1080/deg over -4..4 deg,
///   0.1074/deg over -4..10 deg, as the file's header gives them [D]).
/// - McCroskey, W. J. (1987) NASA TM-100019, best fit of the lift slope at Re = 6e6, M = 0.15:
///   0.1075/deg [D], evaluated here from the fit (tests/reference/mccroskey1987_lift_slope.csv).
///
/// Mach number: the experiment ran at M = 0.15; veer is incompressible. Our Cl and lift slope
/// are multiplied by the Prandtl-Glauert factor 1 / sqrt(1 - 0.15^2) = 1.0114 before every
/// comparison (a small-angle correction, as in test_sa_naca0012.cpp).
///
/// Stall: not gated. Ladson's Cl max (about 1.61-1.63 near 17 deg, 80/120/180 grit) comes from a
/// flow that is not two-dimensional near stall (the csv's own warning), and the model's maximum
/// depends on the grid here (below): the test only asks that the sweep finds a maximum (Cl falls
/// at a higher angle) past the linear range and prints how it compares.
///
/// Run as a user runs it: one `veer sweep`, each point from the previous one, the default stop
/// criteria (residuals 1e-6 of a start from the free stream, Cl and Cd settled to 1e-5), with
/// one setting stated rather than hidden:
/// - stability_time = 0: the disturbed time-accurate check of separated points takes about 10^4
///   physical steps on this y+ 1 grid (time step 5.8e-4 chords / U at CFL 0.8, about 4.5 steps a
///   second on 2 threads), more than the whole budget of this test. The points past the
///   trailing-edge separation onset are therefore the steady model's solutions, as a steady SA
///   computation gives them.
/// (Until the wake-cut spacing opened downstream, the residual references of a continued point
/// came from a start from the free stream and the SA pseudo CFL went from 3 to 2, this test needed
/// every point from the free stream and looser residual and force criteria.)
///
/// Grid: the case's 384 x 128 grid coarsened to 256 x 96 (192 cells on the surface, 32 along each
/// side of the wake cut, 96 normal; first cell still at y+ 1, far field 100 chords), for cost.
/// Measured against the 384 x 128 sweep of app/SWEEPS.md ("A measured turbulent sweep"), same
/// settings: Cl 0.44163 / 0.44184 at 4 deg, 0.86792 / 0.87065 at 8, 1.0661 / 1.0744 at 10 (0.8 %
/// lower), 1.40899 / 1.43350 at 14; lift slope 0.10686 / 0.10586 per degree (over 0..10 here,
/// 0..12 there). Near stall the two grids part: 1.4461 / 1.6080 at 18 deg, where the coarse
/// grid's upper surface separates from x/c 0.41 and the fine grid's from 0.58; the coarse grid
/// stalls between 18 and 20 deg at a lower Cl. Cl max is therefore printed, not gated (as
/// Ladson's data ask anyway).
///
/// How the model's stall compares with the experiment: Ladson's Cl rises to about 1.61-1.63 at
/// 17 deg and drops abruptly just past 18 deg: to 0.9967 at 18.02 deg (80 grit), 1.1886 at
/// 18.18 deg (120 grit) and 1.0104 at 18.21 deg (180 grit) (Ladson 1988, NASA TM-4074, in
/// tests/reference/ladson1988_naca0012.csv). The steady model on the
/// 384 x 128 grid reaches 1.608 at 18 deg (x 1.0114 = 1.626, within the measured maximum) and
/// drops to 1.061 at 20 deg (each point from the free stream): about the measured Cl max and
/// post-stall level, one to three degrees later. On this grid it peaks lower (1.446 at 18 deg,
/// x 1.0114 = 1.463) and drops as abruptly (0.922 at 20 deg).
///
/// Cost: eight points, 200 s on 2 threads (chained, default criteria; lift slope x 1.0114 0.10815
/// per degree over 0..10, Cl max 1.458 at 18 deg, 0.924 at 20), once for the four tests: the
/// sweep folder is kept under the build tree and shared (computed_once.hpp).
/// Labelled validation (the folder).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <filesystem>
#include <fstream>
#include <iostream>
#include <nlohmann/json.hpp>
#include <sstream>
#include <string>
#include <vector>

#include "app/commands.hpp"
#include "app/sweep_angles.hpp"
#include "app/sweep_record.hpp"
#include "computed_once.hpp"
#include "io/json_writer.hpp"
#include "tests/reference_table.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

const double prandtl_glauert = 1.0 / std::sqrt(1.0 - 0.15 * 0.15);

// The sweep: the linear range (0, 4, 8), the end of it (10), and far enough past the maximum of
// the steady model for Cl to fall (on 384 x 128 Cl still rises at 18 deg: 1.5668 at 16, 1.598
// at 18).
constexpr const char* sweep_angles = "0,4,8,10,14,18,20,22";
const std::vector<std::string> sweep_overrides = {"mesh.around=192", "mesh.wake=32",
                                                  "mesh.normal=96"};

/// One (alpha, cl) row of Ladson (1988) for one grit.
struct MeasuredPoint {
    double alpha, cl;
};

/// Ladson 1988 (ladson1988_naca0012.csv, 53 rows: 17 at 80 grit, 18 at 120, 18 at 180), the
/// points of one grit sorted by angle.
std::vector<MeasuredPoint> ladson_points(int grit) {
    const test::ReferenceTable t = test::ReferenceTable::read("ladson1988_naca0012.csv", 53);
    std::vector<MeasuredPoint> out;
    for (std::size_t row = 0; row < t.rows(); ++row)
        if (t.number(row, "grit") == grit)
            out.push_back({t.number(row, "alpha_deg"), t.number(row, "cl")});
    std::sort(out.begin(), out.end(),
              [](const MeasuredPoint& a, const MeasuredPoint& b) { return a.alpha < b.alpha; });
    return out;
}

/// Least-squares lift slope (per degree) of the measured points with alpha in [lo, hi];
/// `count` returns how many there were.
double least_squares_slope(const std::vector<MeasuredPoint>& points, double lo, double hi,
                           int* count) {
    double n = 0, sa = 0, sc = 0, saa = 0, sac = 0;
    for (const MeasuredPoint& p : points)
        if (p.alpha >= lo && p.alpha <= hi) {
            n += 1;
            sa += p.alpha;
            sc += p.cl;
            saa += p.alpha * p.alpha;
            sac += p.alpha * p.cl;
        }
    *count = static_cast<int>(n);
    return (n * sac - sa * sc) / (n * saa - sa * sa);
}

/// Linear interpolation in the measured points (the angle must lie inside them).
double interpolate_cl(const std::vector<MeasuredPoint>& points, double alpha) {
    for (std::size_t k = 1; k < points.size(); ++k)
        if (points[k].alpha >= alpha && points[k - 1].alpha <= alpha) {
            const MeasuredPoint& a = points[k - 1];
            const MeasuredPoint& b = points[k];
            return a.cl + (b.cl - a.cl) * (alpha - a.alpha) / (b.alpha - a.alpha);
        }
    throw std::runtime_error("alpha " + std::to_string(alpha) + " outside the measured points");
}

/// McCroskey's (1987) best-fit lift slope per degree at Reynolds number `re` and Mach number
/// `mach` (mccroskey1987_lift_slope.csv).
double mccroskey_slope(double re, double mach) {
    const test::ReferenceTable t = test::ReferenceTable::read("mccroskey1987_lift_slope.csv", 2);
    return (t.value("slope_at_1e6_per_deg") +
            t.value("slope_per_decade_per_deg") * std::log10(re / 1e6)) /
           std::sqrt(1.0 - mach * mach);
}

/// The sweep, run once per build for the whole group (computed_once.hpp): each test process
/// reads the records and the summary from the shared folder.
class SaSweep : public ::testing::Test {
protected:
    static void SetUpTestSuite() {
        const fs::path case_file =
            fs::path(VEER_SOURCE_DIR) / "cases" / "wind-turbine-sweep-sa.toml";
        std::ifstream case_text(case_file);
        std::ostringstream inputs;
        inputs << case_text.rdbuf() << "\nalpha " << sweep_angles;
        for (const std::string& o : sweep_overrides) inputs << "\n--set " << o;
        const fs::path dir = test::computed_once("sa_sweep", inputs.str(), [&](const fs::path& d) {
            SweepOptions o;
            o.input.case_file = case_file;
            o.input.overrides = sweep_overrides;
            o.alpha = sweep_angles;
            o.out_dir = d / "sweep";
            o.quiet = true;
            o.stability_time = 0.0;
            // The angles were chosen past the maximum by hand; the stall search (on by default
            // at this Reynolds number) is checked in test_sa_stall_bracket.cpp.
            o.stall_search = "off";
            // A guard on the cost only: a point that does not settle is run time-accurately for
            // 2 chords / U (about 3400 steps), enough for its record, not for cycle statistics.
            o.unsteady_time = 2.0;
            const int code = run_sweep_command(o);
            std::ofstream(d / "exit_status") << code;
        });
        std::ifstream(dir / "exit_status") >> status;
        for (const double a : parse_sweep_angles(sweep_angles)) {
            const fs::path p = record_path(dir / "sweep" / point_folder_name(a));
            records.push_back(record_from_json(read_json_file(p), p.string()));
            const PointRecord& r = records.back();
            std::cout << "alpha " << r.alpha << ": " << r.regime << ", Cl " << r.cl
                      << " (x 1.0114 = " << prandtl_glauert * r.cl << "), Cd " << r.cd
                      << ", upper separation "
                      << (r.separation_upper ? std::to_string(*r.separation_upper)
                                             : std::string("none"))
                      << ", " << r.iterations << " iterations, " << r.wall_seconds << " s"
                      << (r.note.empty() ? "" : " -- " + r.note) << "\n";
        }
        summary = read_json_file(dir / "sweep" / "summary.json");
        std::cout << "summary: " << summary.dump() << "\n";
    }

    static const PointRecord& at(double alpha) {
        for (const PointRecord& r : records)
            if (r.alpha == alpha) return r;
        throw std::runtime_error("no point at alpha " + std::to_string(alpha));
    }

    static inline int status = -1;
    static inline std::vector<PointRecord> records;
    static inline nlohmann::json summary;
};

TEST_F(SaSweep, EveryPointHasASteadyResult) {
    EXPECT_EQ(status, 0);
    ASSERT_EQ(records.size(), parse_sweep_angles(sweep_angles).size());
    for (const PointRecord& r : records) EXPECT_EQ(r.regime, "steady") << r.alpha << ": " << r.note;
}

TEST_F(SaSweep, LiftSlopeMatchesLadsonAndMcCroskey) {
    ASSERT_FALSE(summary["lift_slope_per_deg"].is_null());
    const double slope = prandtl_glauert * summary["lift_slope_per_deg"].get<double>();
    const double range_end = summary["linear_range"]["alpha_max"].get<double>();
    // The linear range starts at 0 (a symmetric section: 0..A is -A..A mirrored). Ladson's
    // 80-grit points are fitted here by least squares over -4..4 deg for a range that ends at
    // 4 deg or below, over -4..10 deg for one that reaches further (the closer of the two ranges
    // the csv header names: 0.1080 and 0.1074 per degree [D]).
    int fitted = 0;
    const double ladson =
        least_squares_slope(ladson_points(80), -4.1, range_end <= 4.0 ? 4.1 : 10.2, &fitted);
    ASSERT_GE(fitted, 5) << "Ladson points in the fitting range";
    const double mccroskey = mccroskey_slope(6e6, 0.15);  // 0.1075 per degree [D]
    std::cout << "lift slope x 1.0114 = " << slope << "/deg over 0.." << range_end
              << " deg; Ladson 1988, 80 grit, least squares over " << fitted << " points " << ladson
              << "; McCroskey 1987 " << mccroskey << "\n";
    // The linear range must reach past the first interval: a slope of two points is no test.
    EXPECT_GE(range_end, 8.0);
    // 3 %: the steady model itself, grid-converged, lies above the measurements by about 1.8 %
    // (the TMR SA mean Cl 1.0935 at 10 deg, tmr_naca0012_sa.csv, is 0.1094/deg over 0..10,
    // against McCroskey's 0.1075 and Ladson's 0.1074); the rest, 1.2 %, is for the grid (this
    // grid's Cl at 10 deg is 1.4 % below the TMR mean after Prandtl-Glauert) and the fitting
    // range, and it is wider than the scatter of the two experimental fits (0.6 %).
    EXPECT_NEAR(slope, ladson, 0.03 * ladson);
    EXPECT_NEAR(slope, mccroskey, 0.03 * mccroskey);
}

TEST_F(SaSweep, LiftAtTenDegreesMatchesLadson) {
    const double cl = prandtl_glauert * at(10.0).cl;
    // Ladson 1988, 80 grit, linear between his 8.30 and 10.12 deg points [P].
    const double measured = interpolate_cl(ladson_points(80), 10.0);
    // The model's own, grid-converged answer (TMR, alpha 10, with the point-vortex far field [P]),
    // printed beside to show how much of the band it takes.
    const test::ReferenceTable converged =
        test::ReferenceTable::read("tmr_naca0012_sa_grid_converged.csv", 10);
    std::size_t row = converged.rows();
    for (std::size_t k = 0; k < converged.rows(); ++k)
        if (converged.text(k, "far_field") == "point_vortex" &&
            converged.text(k, "quantity") == "cl")
            row = k;
    ASSERT_LT(row, converged.rows()) << "no grid-converged Cl in " << converged.path();
    const double model = 0.5 * (converged.number(row, "min") + converged.number(row, "max"));
    std::cout << "Cl(10 deg) x 1.0114 = " << cl << "; Ladson 80 grit " << measured
              << "; grid-converged SA (TMR) " << model << ", " << 100.0 * (model / measured - 1.0)
              << "% from Ladson\n";
    // 5 %: the grid-converged SA answer at 10 deg (TMR, 1.0912, tmr_naca0012_sa_grid_converged.csv)
    // is itself 3.1 % above this measurement, and the trip (80, 120, 180 grit) moves the measured
    // Cl at 10 deg by about 0.9 % (1.059 to 1.067 interpolated): the band holds the model's own
    // difference from the experiment and a 2 % grid allowance, not more.
    EXPECT_NEAR(cl, measured, 0.05 * measured);
}

TEST_F(SaSweep, FindsALiftMaximum) {
    ASSERT_FALSE(summary["cl_max"].is_null());
    const double cl_max = prandtl_glauert * summary["cl_max"].get<double>();
    const double alpha_max = summary["alpha_cl_max"].get<double>();
    std::cout << "Cl max x 1.0114 = " << cl_max << " at " << alpha_max
              << " deg; Ladson 1988 (not 2D near stall, not gated): about 1.61-1.63 near 17 deg\n";
    EXPECT_TRUE(summary["stall_in_range"].get<bool>()) << "Cl does not fall after its maximum";
    // The maximum must lie past the linear range, where the experiment still rises.
    EXPECT_GT(alpha_max, 10.0);
}

}  // namespace
}  // namespace veer
