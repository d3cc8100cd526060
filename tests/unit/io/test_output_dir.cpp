// Output folders: never reuse another study's folder without --force; reuse our own.
#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>

#include "io/output_dir.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

fs::path fresh_dir(const std::string& name) {
    const fs::path d = fs::temp_directory_path() / ("veer_output_dir_" + name);
    fs::remove_all(d);
    return d;
}

TEST(OutputDir, CreatesAMissingFolder) {
    const fs::path d = fresh_dir("missing") / "nested";
    (void)prepare_output_dir(d, "case a", false);
    EXPECT_TRUE(fs::is_directory(d));
}

TEST(OutputDir, ReusesTheFolderOfTheSameCase) {
    const fs::path d = fresh_dir("same");
    (void)prepare_output_dir(d, "case a", false);
    std::ofstream(d / "mesh.vts") << "x";
    EXPECT_NO_THROW((void)prepare_output_dir(d, "case a", false));
    EXPECT_TRUE(fs::exists(d / "mesh.vts"));
}

TEST(OutputDir, RefusesAnotherStudyUnlessForced) {
    const fs::path d = fresh_dir("other");
    fs::create_directories(d);
    std::ofstream(d / "notes.txt") << "the user's own file";
    try {
        (void)prepare_output_dir(d, "case b", false);
        FAIL() << "a folder with someone else's file was reused";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("--force"), std::string::npos);
    }
    EXPECT_NO_THROW((void)prepare_output_dir(d, "case b", true));
    EXPECT_TRUE(fs::exists(d / "notes.txt"));  // forcing writes beside, never deletes
}

TEST(OutputDir, RefusesAFile) {
    const fs::path d = fresh_dir("file");
    std::ofstream(d) << "x";
    EXPECT_THROW((void)prepare_output_dir(d, "case", true), InputError);
    fs::remove(d);
}

}  // namespace
}  // namespace veer
