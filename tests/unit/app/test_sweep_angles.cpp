// Angle lists of `veer sweep --alpha`: ranges, lists, down-sweeps, refused forms, folder names.
#include <gtest/gtest.h>

#include "app/sweep_angles.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

// Angles are built as start + k * step, so they compare exactly for these binary-exact steps;
// for 0.1 steps the comparison allows the rounding of one multiplication.
TEST(SweepAngles, RangeIncludesEnd) {
    EXPECT_EQ(parse_sweep_angles("0:12:4"), (std::vector<double>{0, 4, 8, 12}));
    EXPECT_EQ(parse_sweep_angles("-2:3:2"), (std::vector<double>{-2, 0, 2}));
}

TEST(SweepAngles, RangeWithDecimalStepKeepsItsLastPoint) {
    const std::vector<double> a = parse_sweep_angles("0:1:0.1");
    ASSERT_EQ(a.size(), 11u);
    EXPECT_NEAR(a.back(), 1.0, 1e-12);
}

TEST(SweepAngles, ReversedRangeRunsDownwards) {
    EXPECT_EQ(parse_sweep_angles("12:0:-4"), (std::vector<double>{12, 8, 4, 0}));
}

TEST(SweepAngles, DownFlagRunsFromTheHighest) {
    EXPECT_EQ(parse_sweep_angles("0:12:4", true), (std::vector<double>{12, 8, 4, 0}));
    EXPECT_EQ(parse_sweep_angles("2, -1, 5", true), (std::vector<double>{5, 2, -1}));
}

TEST(SweepAngles, ListKeepsItsOrder) {
    EXPECT_EQ(parse_sweep_angles("4,0,-2.5"), (std::vector<double>{4, 0, -2.5}));
    EXPECT_EQ(parse_sweep_angles("7"), (std::vector<double>{7}));
}

TEST(SweepAngles, RefusesBadForms) {
    for (const char* bad : {"", "0:12", "0:12:0", "0:12:-4", "a,b", "1,,2", "0:12:4:1", "1,2,",
                            "200", "0:90:0.001", "1,1.001"})
        EXPECT_THROW(parse_sweep_angles(bad), InputError) << bad;
}

TEST(SweepAngles, MessageSaysWhatIsAllowed) {
    try {
        parse_sweep_angles("0:x:2");
        FAIL() << "no error";
    } catch (const InputError& e) {
        const std::string m = e.what();
        EXPECT_NE(m.find("--alpha \"0:x:2\""), std::string::npos) << m;
        EXPECT_NE(m.find("START:END:STEP"), std::string::npos) << m;
    }
}

TEST(SweepAngles, FolderNames) {
    EXPECT_EQ(point_folder_name(4.0), "alpha_+04.00");
    EXPECT_EQ(point_folder_name(-2.5), "alpha_-02.50");
    EXPECT_EQ(point_folder_name(0.0), "alpha_+00.00");
    EXPECT_EQ(point_folder_name(-0.001), "alpha_+00.00");  // no "-00.00"
    EXPECT_EQ(point_folder_name(12.345), "alpha_+12.35");
}

}  // namespace
}  // namespace veer
