// The residual references of a start from the free stream, which a run started from another
// solution (a sweep's previous point) is held to: they are the largest residuals of the first
// steps of a single run of the case, read here from that run's own history.csv.
#include <gtest/gtest.h>

#include <algorithm>

#include "app/free_stream_reference.hpp"
#include "app/mesh_pipeline.hpp"
#include "app/report_csv.hpp"
#include "app/simulation.hpp"
#include "app_test_support.hpp"
#include "io/case_file.hpp"

namespace veer {
namespace {

CaseSpec sa_case(long steps) {
    return parse_case_text(
        "[geometry]\nnaca = \"0012\"\n[mesh]\naround = 64\nnormal = 16\nwake = 12\n"
        "far_field = 10\nfirst_cell = 1e-3\n[flow]\nreynolds = 1e5\nalpha = 3\n"
        "model = \"spalart-allmaras\"\n[run]\nmode = \"steady\"\nsteps = " +
            std::to_string(steps) + "\n",
        "small.toml", ".");
}

TEST(FreeStreamReference, EqualsTheLargestResidualsOfASingleRunsFirstSteps) {
    test::AppScratch scratch;
    constexpr int steps = 20;
    const CaseSpec spec = sa_case(steps);
    const StructuredGrid grid = build_mesh(spec).grid;
    SimulationOptions quiet;
    quiet.progress = false;
    Simulation single(spec, grid, scratch.path(), quiet);
    single.run();
    const CsvTable history = CsvTable::read(scratch / "history.csv");
    ASSERT_EQ(history.rows(), static_cast<std::size_t>(steps));
    const auto refs = free_stream_references(grid, spec.flow, solver_settings_for(spec), steps);
    const char* columns[] = {"residual_u", "residual_v", "residual_continuity",
                             "residual_nu_tilde"};
    for (std::size_t k = 0; k < refs.size(); ++k) {
        const std::vector<double> r = history.numbers(columns[k]);
        const double largest = *std::max_element(r.begin(), r.end());
        // history.csv prints 7 significant digits.
        EXPECT_NEAR(refs[k], largest, 1e-6 * largest) << columns[k];
        EXPECT_GT(refs[k], 0.0) << columns[k];
    }
}

}  // namespace
}  // namespace veer
