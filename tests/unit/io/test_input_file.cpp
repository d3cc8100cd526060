// Every input file veer reads goes through read_input_file: only regular files, never more than
// a cap. The trial of issue 19 ran `veer check /dev/zero` until the kernel killed it for lack of
// memory, and a FIFO with no writer hung it.
#include <fcntl.h>
#include <gtest/gtest.h>
#include <sys/stat.h>

#include <chrono>
#include <filesystem>
#include <fstream>

#include "io/case_file.hpp"
#include "io/coordinate_file.hpp"
#include "io/input_file.hpp"
#include "io_test_support.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

namespace fs = std::filesystem;

std::string refusal_of(const fs::path& path, std::uintmax_t cap = 1u << 20) {
    try {
        read_input_file(path, "case file", cap);
    } catch (const InputError& e) {
        return e.what();
    }
    return "";
}

TEST(InputFile, ReadsARegularFileWhole) {
    test::ScratchDir dir;
    std::ofstream(dir / "a.toml", std::ios::binary) << "[flow]\r\nreynolds = 1000\n";
    EXPECT_EQ(read_input_file(dir / "a.toml", "case file", 100), "[flow]\r\nreynolds = 1000\n");
}

TEST(InputFile, RefusesDevicesPipesFoldersAndLinksToDevicesAtOnce) {
    test::ScratchDir dir;
    ASSERT_EQ(::mkfifo((dir / "pipe").c_str(), 0600), 0);
    fs::create_symlink("/dev/urandom", dir / "random_link");
    const auto start = std::chrono::steady_clock::now();
    const std::vector<std::pair<fs::path, std::string>> cases = {
        {"/dev/zero", "a device"},
        {dir / "random_link", "a device"},
        {dir / "pipe", "a pipe"},
        {dir.path(), "a folder"},
        {dir / "missing.toml", "cannot open"}};
    for (const auto& [path, kind] : cases) {
        const std::string why = refusal_of(path);
        EXPECT_NE(why.find(path.string()), std::string::npos) << why;
        EXPECT_NE(why.find(kind), std::string::npos) << why;
    }
    // Refused before any read: a wait for a FIFO writer or a read of /dev/zero would take
    // forever (the ctest timeout); this bound only says "no waiting", hence the slack.
    EXPECT_LT(std::chrono::steady_clock::now() - start, std::chrono::seconds(2));
}

TEST(InputFile, RefusesAFileLargerThanTheCapWithoutReadingIt) {
    test::ScratchDir dir;
    { std::ofstream(dir / "big.dat"); }
    fs::resize_file(dir / "big.dat", std::uintmax_t{8} << 30);  // sparse: 8 GB, no disk used
    const std::string why = refusal_of(dir / "big.dat", 16u << 20);
    EXPECT_NE(why.find("too large"), std::string::npos) << why;
    EXPECT_NE(why.find("at most 16 MB"), std::string::npos) << why;
    std::ofstream(dir / "small.dat") << std::string(101, 'x');
    EXPECT_NE(refusal_of(dir / "small.dat", 100).find("too large"), std::string::npos);
    EXPECT_EQ(refusal_of(dir / "small.dat", 101), "");
}

TEST(InputFile, CaseAndCoordinateReadersUseIt) {
    test::ScratchDir dir;
    EXPECT_THROW(read_case_file("/dev/zero", {}), InputError);
    EXPECT_THROW(read_coordinate_file("/dev/zero"), InputError);
    try {
        read_coordinate_file(dir.path());
        ADD_FAILURE() << "a folder read as a coordinate file";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("coordinate file"), std::string::npos) << e.what();
    }
}

TEST(InputFile, CaseFileWithCarriageReturnLineEndsReads) {
    test::ScratchDir dir;
    std::ofstream(dir / "cr.toml", std::ios::binary)
        << "[geometry]\rnaca = \"2412\"\r[flow]\rreynolds = 2.5e5\ralpha = 3\r";
    const CaseSpec c = read_case_file(dir / "cr.toml", {});
    EXPECT_EQ(c.flow.alpha_deg, 3.0);
    EXPECT_EQ(c.flow.reynolds, 2.5e5);
}

}  // namespace
}  // namespace veer
