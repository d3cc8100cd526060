// The reader of tests/reference/: a missing file, a wrong row count, an unknown column and a cell
// that is not a number all throw (so a test reading them fails), and the values come back by name.
#include <gtest/gtest.h>

#include <string>

#include "tests/reference_table.hpp"

namespace veer {
namespace {

using test::ReferenceTable;

/// The exception's message, or "" if `read` did not throw.
template <class Read>
std::string thrown_by(Read read) {
    try {
        read();
    } catch (const std::runtime_error& e) {
        return e.what();
    }
    return "";
}

TEST(ReferenceTable, MissingFileThrowsNamingIt) {
    const std::string what = thrown_by([] { (void)ReferenceTable::read("no_such_source.csv", 1); });
    EXPECT_NE(what.find("no_such_source.csv"), std::string::npos) << what;
    EXPECT_NE(what.find("missing"), std::string::npos) << what;
}

TEST(ReferenceTable, WrongRowCountThrowsWithBothCounts) {
    // kovasznay1948.csv holds two rows (Re 20 and 40).
    const std::string what = thrown_by([] { (void)ReferenceTable::read("kovasznay1948.csv", 3); });
    EXPECT_NE(what.find("has 2 rows, the test expects 3"), std::string::npos) << what;
}

TEST(ReferenceTable, ValuesByColumnAndByQuantity) {
    const ReferenceTable k = ReferenceTable::read("kovasznay1948.csv", 2);
    EXPECT_EQ(k.number(k.row_where("reynolds", "40"), "lambda"), -0.963741);  // the file's digits
    EXPECT_EQ(k.numbers("reynolds"), (std::vector<double>{20.0, 40.0}));
    const ReferenceTable b = ReferenceTable::read("blasius1908_flat_plate.csv", 3);
    EXPECT_EQ(b.value("wall_curvature_f2"), 0.332057);
    EXPECT_EQ(b.text(0, "mark"), "P");
}

TEST(ReferenceTable, UnknownColumnAndTextCellThrow) {
    const ReferenceTable k = ReferenceTable::read("kovasznay1948.csv", 2);
    EXPECT_NE(thrown_by([&] { (void)k.numbers("no_column"); }).find("no column 'no_column'"),
              std::string::npos);
    const ReferenceTable b = ReferenceTable::read("blasius1908_flat_plate.csv", 3);
    const std::string what = thrown_by([&] { (void)b.number(0, "mark"); });
    EXPECT_NE(what.find("blasius1908_flat_plate.csv:"), std::string::npos) << what;
    EXPECT_NE(what.find("not a number"), std::string::npos) << what;
    EXPECT_NE(thrown_by([&] { (void)b.value("no_quantity"); }).find("no row"), std::string::npos);
}

}  // namespace
}  // namespace veer
