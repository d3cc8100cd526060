// JSON result files: pretty, complete, atomic; and the small atomic-file helper under them.
#include <gtest/gtest.h>
#include <unistd.h>

#include <cmath>
#include <fstream>
#include <limits>

#include "io/atomic_file.hpp"
#include "io/json_writer.hpp"
#include "io_test_support.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace {

TEST(JsonWriter, WritesPrettyJsonThatReadsBack) {
    test::ScratchDir dir;
    nlohmann::json j;
    j["cl"] = 0.1 + 0.2;  // no short decimal: the number must survive the text form exactly
    j["converged"] = true;
    j["case"] = "slow indoor flyer, Re 3e4";
    j["polar"] = {{{"alpha", 2.0}, {"cl", 0.21}}, {{"alpha", 4.0}, {"cl", 0.43}}};
    write_json_file(dir / "summary.json", j);
    const std::string text = test::read_file_text(dir / "summary.json");
    EXPECT_NE(text.find("\n  \"cl\": "), std::string::npos) << text;  // 2-space pretty print
    EXPECT_EQ(text.back(), '\n');
    const nlohmann::json back = read_json_file(dir / "summary.json");
    EXPECT_EQ(back, j);
    EXPECT_EQ(back["cl"].get<double>(), 0.1 + 0.2);
    EXPECT_FALSE(std::filesystem::exists(dir / "summary.json.tmp"));
}

TEST(JsonWriter, NonFiniteBecomesNullAndBadUtf8IsReplaced) {
    test::ScratchDir dir;
    nlohmann::json j;
    j["cd"] = std::numeric_limits<double>::quiet_NaN();
    j["note"] = std::string("bad \xff byte");
    write_json_file(dir / "s.json", j);
    const nlohmann::json back = read_json_file(dir / "s.json");
    EXPECT_TRUE(back["cd"].is_null());
    EXPECT_TRUE(back["note"].is_string());
}

TEST(JsonWriter, ReplacesTheOldFileWhole) {
    test::ScratchDir dir;
    write_json_file(dir / "s.json",
                    nlohmann::json{{"iterations", 1}, {"long", std::string(500, 'x')}});
    write_json_file(dir / "s.json", nlohmann::json{{"iterations", 2}});
    EXPECT_EQ(read_json_file(dir / "s.json"), (nlohmann::json{{"iterations", 2}}));
}

TEST(JsonWriter, ErrorsNameTheFile) {
    test::ScratchDir dir;
    std::ofstream(dir / "broken.json") << "{\"cl\": 0.5,";
    try {
        read_json_file(dir / "broken.json");
        FAIL() << "expected an InputError";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("broken.json: not valid JSON"), std::string::npos)
            << e.what();
    }
    EXPECT_THROW(read_json_file(dir / "missing.json"), InputError);
    EXPECT_THROW(write_json_file(dir / "no_folder" / "s.json", nlohmann::json::object()),
                 InputError);
}

TEST(AtomicFile, TemporaryNameSitsBesideTheTargetAndNamesTheProcess) {
    const std::filesystem::path t = temporary_path_for("/runs/a4/checkpoint.h5");
    // Two runs writing one target never share a temporary file: the name holds the pid.
    EXPECT_EQ(
        t, std::filesystem::path("/runs/a4/checkpoint.h5." + std::to_string(::getpid()) + ".tmp"));
    EXPECT_EQ(t, temporary_path_for("/runs/a4/checkpoint.h5"));  // stable within a process
    EXPECT_FALSE(is_stale_temporary(t));                         // ours, not stale
    EXPECT_TRUE(is_stale_temporary("/runs/a4/checkpoint.h5.4242424.tmp"));
    EXPECT_FALSE(is_stale_temporary("/runs/a4/notes.tmp"));  // not a name veer writes
    EXPECT_FALSE(is_stale_temporary("/runs/a4/checkpoint.h5"));
}

TEST(AtomicFile, AStaleTemporaryDoesNotDisturbTheTarget) {
    test::ScratchDir dir;
    write_text_atomically(dir / "history.csv", "step,cl\n1,0.5\n");
    const std::filesystem::path tmp = temporary_path_for(dir / "history.csv");
    std::ofstream(tmp) << "half a li";  // a crash mid-write
    EXPECT_EQ(test::read_file_text(dir / "history.csv"), "step,cl\n1,0.5\n");
    write_text_atomically(dir / "history.csv", "step,cl\n2,0.6\n");
    EXPECT_EQ(test::read_file_text(dir / "history.csv"), "step,cl\n2,0.6\n");
    EXPECT_FALSE(std::filesystem::exists(tmp));
}

}  // namespace
}  // namespace veer
