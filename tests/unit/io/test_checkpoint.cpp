// HDF5 checkpoints: bit-exact round trip, crash safety of the tmp + rename, and the error messages
// for files that are not veer checkpoints.
#include <gtest/gtest.h>
#include <hdf5.h>

#include <cmath>
#include <cstring>
#include <fstream>
#include <limits>

#include "io/atomic_file.hpp"
#include "io/checkpoint.hpp"
#include "io_test_support.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

bool same_bits(double a, double b) { return std::memcmp(&a, &b, sizeof a) == 0; }

CheckpointData sample_checkpoint() {
    CheckpointData d;
    d.grid = test::curved_grid(12, 5);
    d.grid.c_layout() = CGridLayout{3, 6};
    d.grid.segments() = {{Side::j_min, 0, 3, SegmentKind::wake_cut, "wake_cut_lower"},
                         {Side::j_min, 3, 9, SegmentKind::wall, "wall"},
                         {Side::j_max, 0, 12, SegmentKind::far_field, "far_field"},
                         {Side::i_max, 0, 5, SegmentKind::outflow, "outflow_upper"}};
    d.case_text =
        "# survey drone wing section, cruise\n[flow]\nreynolds = 2.0e5\nnote = \"\xC3\xA9\"\n";
    d.step = 123456789012LL;
    d.time = 0.1 + 0.2;  // not a short decimal: any text round trip would show
    d.scalars = {{"dt", 1.0 / 3.0},
                 {"cl", -0.0},
                 {"tiny", std::numeric_limits<double>::denorm_min()},
                 {"unset", std::numeric_limits<double>::quiet_NaN()}};
    NamedArray u{"u", {}}, p{"pressure", {}}, empty{"a_empty", {}};
    for (int k = 0; k < 60; ++k) {
        u.values.push_back(std::sin(0.7 * k) / 3.0);
        p.values.push_back(std::exp(-0.1 * k) - 0.5);
    }
    d.arrays = {u, p, empty};  // deliberately not in name order: the order must survive
    return d;
}

void expect_same(const CheckpointData& a, const CheckpointData& b) {
    EXPECT_EQ(a.case_text, b.case_text);
    EXPECT_EQ(a.step, b.step);
    EXPECT_TRUE(same_bits(a.time, b.time));
    ASSERT_EQ(a.grid.ni(), b.grid.ni());
    ASSERT_EQ(a.grid.nj(), b.grid.nj());
    for (std::size_t k = 0; k < a.grid.nodes().size(); ++k) {
        EXPECT_TRUE(same_bits(a.grid.nodes()[k].x, b.grid.nodes()[k].x)) << k;
        EXPECT_TRUE(same_bits(a.grid.nodes()[k].y, b.grid.nodes()[k].y)) << k;
    }
    ASSERT_EQ(a.grid.c_layout().has_value(), b.grid.c_layout().has_value());
    if (a.grid.c_layout()) {
        EXPECT_EQ(a.grid.c_layout()->wake, b.grid.c_layout()->wake);
        EXPECT_EQ(a.grid.c_layout()->around, b.grid.c_layout()->around);
    }
    ASSERT_EQ(a.grid.segments().size(), b.grid.segments().size());
    for (std::size_t s = 0; s < a.grid.segments().size(); ++s) {
        const BoundarySegment &x = a.grid.segments()[s], &y = b.grid.segments()[s];
        EXPECT_TRUE(x.side == y.side && x.begin == y.begin && x.end == y.end && x.kind == y.kind &&
                    x.name == y.name)
            << s;
    }
    ASSERT_EQ(a.scalars.size(), b.scalars.size());
    for (const auto& [name, value] : a.scalars) {
        ASSERT_TRUE(b.scalars.count(name)) << name;
        EXPECT_TRUE(same_bits(value, b.scalars.at(name))) << name;
    }
    ASSERT_EQ(a.arrays.size(), b.arrays.size());
    for (std::size_t k = 0; k < a.arrays.size(); ++k) {
        EXPECT_EQ(a.arrays[k].name, b.arrays[k].name);
        ASSERT_EQ(a.arrays[k].values.size(), b.arrays[k].values.size());
        for (std::size_t n = 0; n < a.arrays[k].values.size(); ++n)
            EXPECT_TRUE(same_bits(a.arrays[k].values[n], b.arrays[k].values[n]));
    }
}

std::string error_of(const std::filesystem::path& p) {
    try {
        read_checkpoint(p);
    } catch (const InputError& e) {
        return e.what();
    }
    return "no error";
}

TEST(Checkpoint, RoundTripIsBitExact) {
    test::ScratchDir dir;
    const CheckpointData written = sample_checkpoint();
    write_checkpoint(dir / "run.h5", written);
    EXPECT_FALSE(std::filesystem::exists(temporary_path_for(dir / "run.h5")));
    // Bit for bit (NaN, -0 and a denormal included): a restart must continue the same run.
    expect_same(written, read_checkpoint(dir / "run.h5"));
}

TEST(Checkpoint, GridWithoutLayoutOrSegmentsRoundTrips) {
    test::ScratchDir dir;
    CheckpointData d;
    d.grid = test::curved_grid(3, 2);
    write_checkpoint(dir / "c.h5", d);
    expect_same(d, read_checkpoint(dir / "c.h5"));
}

TEST(Checkpoint, PartialTmpFileDoesNotReplaceAGoodCheckpoint) {
    test::ScratchDir dir;
    const auto path = dir / "run.h5";
    const CheckpointData good = sample_checkpoint();
    write_checkpoint(path, good);
    // A crash in the middle of the next write leaves a truncated temporary file behind.
    const std::string bytes = test::read_file_text(path);
    const std::filesystem::path tmp = temporary_path_for(path);
    std::ofstream(tmp, std::ios::binary) << bytes.substr(0, bytes.size() / 2);
    expect_same(good, read_checkpoint(path));
    const std::string truncated_error = error_of(tmp);
    EXPECT_NE(truncated_error.find(tmp.filename().string()), std::string::npos) << truncated_error;
    // The next write starts over and replaces both.
    CheckpointData later = good;
    later.step += 1;
    write_checkpoint(path, later);
    EXPECT_EQ(read_checkpoint(path).step, later.step);
    EXPECT_FALSE(std::filesystem::exists(temporary_path_for(dir / "run.h5")));
}

TEST(Checkpoint, MissingFileNamesItAndWhatWasExpected) {
    test::ScratchDir dir;
    const std::string e = error_of(dir / "nothing.h5");
    EXPECT_NE(e.find("nothing.h5: no such file"), std::string::npos) << e;
    EXPECT_NE(e.find("veer checkpoint"), std::string::npos) << e;
}

TEST(Checkpoint, TextFileIsNotHdf5) {
    test::ScratchDir dir;
    std::ofstream(dir / "notes.h5") << "wind-turbine blade section notes\n";
    const std::string e = error_of(dir / "notes.h5");
    EXPECT_NE(e.find("notes.h5: not an HDF5 file"), std::string::npos) << e;
}

TEST(Checkpoint, ForeignHdf5FileIsRefused) {
    test::ScratchDir dir;
    const auto path = dir / "foreign.h5";
    const hid_t f = H5Fcreate(path.c_str(), H5F_ACC_TRUNC, H5P_DEFAULT, H5P_DEFAULT);
    const hid_t g = H5Gcreate2(f, "measurements", H5P_DEFAULT, H5P_DEFAULT, H5P_DEFAULT);
    H5Gclose(g);
    H5Fclose(f);
    const std::string e = error_of(path);
    EXPECT_NE(e.find("foreign.h5: not a veer checkpoint (no /veer group)"), std::string::npos) << e;
}

TEST(Checkpoint, NewerFormatVersionIsRefused) {
    test::ScratchDir dir;
    const auto path = dir / "future.h5";
    write_checkpoint(path, sample_checkpoint());
    // Rewrite the version tag as a later build would.
    const hid_t f = H5Fopen(path.c_str(), H5F_ACC_RDWR, H5P_DEFAULT);
    const hid_t g = H5Gopen2(f, "veer", H5P_DEFAULT);
    H5Adelete(g, "format_version");
    const hid_t space = H5Screate(H5S_SCALAR);
    const hid_t a = H5Acreate2(g, "format_version", H5T_STD_I64LE, space, H5P_DEFAULT, H5P_DEFAULT);
    const std::int64_t future = 99;
    H5Awrite(a, H5T_NATIVE_INT64, &future);
    H5Aclose(a);
    H5Sclose(space);
    H5Gclose(g);
    H5Fclose(f);
    const std::string e = error_of(path);
    EXPECT_NE(e.find("future.h5: checkpoint format version 99"), std::string::npos) << e;
}

TEST(Checkpoint, BadArrayNameIsRefusedBeforeAnythingIsWritten) {
    test::ScratchDir dir;
    CheckpointData d;
    d.grid = test::curved_grid(2, 2);
    d.arrays = {{"u/v", {1.0}}};
    EXPECT_THROW(write_checkpoint(dir / "c.h5", d), InternalError);
    d.arrays = {{"u", {1.0}}, {"u", {2.0}}};
    EXPECT_THROW(write_checkpoint(dir / "c.h5", d), InternalError);
    d.arrays.clear();
    d.scalars[""] = 1.0;
    EXPECT_THROW(write_checkpoint(dir / "c.h5", d), InternalError);
    EXPECT_FALSE(std::filesystem::exists(dir / "c.h5"));
    EXPECT_FALSE(std::filesystem::exists(temporary_path_for(dir / "c.h5")));
}

}  // namespace
}  // namespace veer
