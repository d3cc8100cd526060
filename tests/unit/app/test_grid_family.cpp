// The grid family of the sweep's error bars (app/grid_family.hpp): every count divided by the
// ratio per level, the first cell (or its y+) multiplied, the far field kept; refusals.
#include <gtest/gtest.h>

#include <algorithm>
#include <string>

#include "app/grid_family.hpp"
#include "io/case_file.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

CaseSpec case_of(const std::string& mesh_lines, const std::string& model = "laminar") {
    const std::string text = "[geometry]\nnaca = \"0012\"\n[mesh]\n" + mesh_lines +
                             "far_field = 30\n[flow]\nreynolds = 6e6\nalpha = 4\nmodel = \"" +
                             model + "\"\n";
    return parse_case_source(CaseSource{"family.toml", text}, {});
}

bool has(const std::vector<std::string>& items, const std::string& item) {
    return std::find(items.begin(), items.end(), item) != items.end();
}

TEST(GridFamily, EveryCountAndTheFirstCellScaleByTheRatio) {
    const CaseSpec fine = case_of("around = 192\nnormal = 64\nwake = 36\nfirst_cell = 1e-4\n");
    EXPECT_TRUE(coarser_grid_overrides(fine, 1.5, 0).empty());
    const auto one = coarser_grid_overrides(fine, 1.5, 1);
    EXPECT_TRUE(has(one, "mesh.around=128")) << one[0];
    EXPECT_TRUE(has(one, "mesh.normal=43"));  // 42.67 rounded
    EXPECT_TRUE(has(one, "mesh.wake=24"));
    EXPECT_TRUE(has(one, "mesh.first_cell=0.00015"));
    const auto two = coarser_grid_overrides(fine, 1.5, 2);
    EXPECT_TRUE(has(two, "mesh.around=86")) << "192 / 2.25 = 85.3, to the nearest even count";
    EXPECT_TRUE(has(two, "mesh.normal=28"));
    EXPECT_TRUE(has(two, "mesh.first_cell=0.000225"));
    // The overrides make a case the reader accepts, with the far field untouched.
    const CaseSpec coarse = parse_case_source(CaseSource{"family.toml", fine.text}, two);
    EXPECT_EQ(coarse.mesh.around, 86);
    EXPECT_DOUBLE_EQ(coarse.mesh.far_field, 30.0);
}

TEST(GridFamily, FirstCellSetByYPlusScalesThroughYPlus) {
    const CaseSpec fine = case_of("around = 192\nnormal = 64\nwake = 36\ny_plus = 1.0\n");
    const auto two = coarser_grid_overrides(fine, 1.5, 2);
    EXPECT_TRUE(has(two, "mesh.y_plus=2.25"));
    for (const std::string& item : two) EXPECT_EQ(item.find("first_cell"), std::string::npos);
    EXPECT_NO_THROW(parse_case_source(CaseSource{"family.toml", fine.text}, two));
}

TEST(GridFamily, RefusesTooSmallARatioAndTooCoarseAGrid) {
    const CaseSpec fine = case_of("around = 32\nnormal = 8\nwake = 6\nfirst_cell = 1e-3\n");
    EXPECT_THROW(coarser_grid_overrides(fine, 1.2, 1), InputError);
    try {
        coarser_grid_overrides(fine, 2.0, 2);
        FAIL() << "around 32 / 4 = 8 is below the reader's 16";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("mesh.around = 32"), std::string::npos) << e.what();
    }
}

}  // namespace
}  // namespace veer
