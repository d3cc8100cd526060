// A checkpoint that changed on disk is refused, never restarted from: every dataset carries a
// checksum checked on reading (io/hdf5_support.hpp), and the file's own structure carries HDF5's
// metadata checksums. The trial that found this (issue 19) flipped bytes at a few offsets and saw
// Cl jump from 1.07 to -15 after a silent restart.
#include <gtest/gtest.h>
#include <hdf5.h>

#include <cmath>
#include <cstdio>
#include <fstream>
#include <string>
#include <vector>

#include "io/checkpoint.hpp"
#include "io_test_support.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

CheckpointData drone_wing_checkpoint() {
    CheckpointData d;
    d.grid = test::curved_grid(10, 4);
    d.grid.c_layout() = CGridLayout{2, 6};
    d.grid.segments() = {{Side::j_min, 2, 8, SegmentKind::wall, "wall"},
                         {Side::j_max, 0, 10, SegmentKind::far_field, "far_field"}};
    d.case_text = "# survey drone wing section, cruise\n[flow]\nreynolds = 2.0e5\n";
    d.step = 400;
    d.time = 12.5;
    d.scalars = {{"dt", 0.01}};
    NamedArray u{"u", {}}, p{"pressure", {}};
    for (int k = 0; k < 40; ++k) {
        u.values.push_back(1.0 + 0.01 * std::sin(0.3 * k));
        p.values.push_back(-0.5 * std::cos(0.2 * k));
    }
    d.arrays = {u, p};
    return d;
}

/// Where the raw values of each numeric dataset sit in the file: (name, offset, bytes).
struct DataPlace {
    std::string name;
    haddr_t offset;
    hsize_t bytes;
};

std::vector<DataPlace> data_places(const std::filesystem::path& file) {
    std::vector<DataPlace> places;
    const hid_t f = H5Fopen(file.c_str(), H5F_ACC_RDONLY, H5P_DEFAULT);
    EXPECT_GE(f, 0);
    for (const std::string path :
         {"veer/mesh/node_x", "veer/mesh/node_y", "veer/mesh/segment_begin", "veer/state/u",
          "veer/state/pressure"}) {
        const hid_t d = H5Dopen2(f, path.c_str(), H5P_DEFAULT);
        places.push_back(
            {path.substr(path.rfind('/') + 1), H5Dget_offset(d), H5Dget_storage_size(d)});
        H5Dclose(d);
    }
    H5Fclose(f);
    return places;
}

void flip_byte(const std::filesystem::path& file, std::uint64_t offset) {
    std::fstream f(file, std::ios::in | std::ios::out | std::ios::binary);
    f.seekg(static_cast<std::streamoff>(offset));
    const char c = static_cast<char>(f.get());
    f.seekp(static_cast<std::streamoff>(offset));
    f.put(static_cast<char>(c ^ 0x10));
}

std::string refusal_of(const std::filesystem::path& file) {
    try {
        read_checkpoint(file);
    } catch (const InputError& e) {
        return e.what();
    }
    return "";
}

TEST(CheckpointIntegrity, AFlippedByteInAnyDatasetIsRefusedNamingTheDataset) {
    test::ScratchDir dir;
    const auto good = dir / "good.h5";
    write_checkpoint(good, drone_wing_checkpoint());
    const std::vector<DataPlace> places = data_places(good);
    ASSERT_EQ(places.size(), 5u);
    int refused = 0;
    for (const DataPlace& place : places) {
        ASSERT_NE(place.offset, HADDR_UNDEF) << place.name;
        ASSERT_GT(place.bytes, 0u) << place.name;
        // First byte, a middle one and the last byte of the dataset's values.
        for (hsize_t at : {hsize_t{0}, place.bytes / 2 + 3, place.bytes - 1}) {
            const auto bad = dir / "bad.h5";
            std::filesystem::copy_file(good, bad,
                                       std::filesystem::copy_options::overwrite_existing);
            flip_byte(bad, place.offset + at);
            const std::string why = refusal_of(bad);
            EXPECT_NE(why.find("'" + place.name + "'"), std::string::npos)
                << place.name << " +" << at << ": " << why;
            EXPECT_NE(why.find("checksum"), std::string::npos) << why;
            refused += !why.empty();
        }
    }
    EXPECT_EQ(refused, 15);  // 5 datasets x 3 offsets
}

TEST(CheckpointIntegrity, NoFlippedByteAnywhereChangesWhatARestartReadsSilently) {
    // Every 7th byte of the whole file (data, object headers, attributes, heaps): the read either
    // refuses the file or returns exactly what was written (a byte HDF5 never reads, e.g. free
    // space). A silent change of the state, step, time or case text would fail here.
    test::ScratchDir dir;
    const auto good = dir / "good.h5";
    const CheckpointData written = drone_wing_checkpoint();
    write_checkpoint(good, written);
    const auto size = std::filesystem::file_size(good);
    ASSERT_GT(size, 1000u);
    int refused = 0, unchanged = 0;
    // HDF5 objects open in this process before (other tests in the same executable may leave
    // some): a damaged read must not add any.
    const ssize_t open_before = H5Fget_obj_count(H5F_OBJ_ALL, H5F_OBJ_ALL);
    for (std::uint64_t at = 0; at < size; at += 7) {
        const auto bad = dir / "bad.h5";
        std::filesystem::copy_file(good, bad, std::filesystem::copy_options::overwrite_existing);
        flip_byte(bad, at);
        CheckpointData read;
        bool was_refused = false;
        try {
            read = read_checkpoint(bad);
        } catch (const InputError&) {
            was_refused = true;
        }
        // Nothing of a damaged file stays open: HDF5 looped or crashed at exit otherwise.
        ASSERT_EQ(H5Fget_obj_count(H5F_OBJ_ALL, H5F_OBJ_ALL), open_before) << "byte " << at;
        if (was_refused) {
            ++refused;
            continue;
        }
        ++unchanged;
        EXPECT_EQ(read.step, written.step) << "byte " << at;
        EXPECT_EQ(read.time, written.time) << "byte " << at;
        EXPECT_EQ(read.case_text, written.case_text) << "byte " << at;
        EXPECT_EQ(read.scalars, written.scalars) << "byte " << at;
        ASSERT_EQ(read.arrays.size(), written.arrays.size()) << "byte " << at;
        for (std::size_t a = 0; a < read.arrays.size(); ++a)
            EXPECT_EQ(read.arrays[a].values, written.arrays[a].values) << "byte " << at;
        ASSERT_EQ(read.grid.nodes().size(), written.grid.nodes().size()) << "byte " << at;
        for (std::size_t k = 0; k < read.grid.nodes().size(); ++k) {
            EXPECT_EQ(read.grid.nodes()[k].x, written.grid.nodes()[k].x) << "byte " << at;
            EXPECT_EQ(read.grid.nodes()[k].y, written.grid.nodes()[k].y) << "byte " << at;
        }
    }
    std::printf("flipped %d bytes: %d refused, %d read back unchanged\n", refused + unchanged,
                refused, unchanged);
    EXPECT_GT(refused, 0);
}

}  // namespace
}  // namespace veer
