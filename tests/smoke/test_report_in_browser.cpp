// The report page of a short sweep opened in a real browser (Debian's chromium, headless): the
// page loads without script errors, every picture it references loads and decodes, the caution
// is visible at the top. Optional: without chromium on the PATH the test skips and says so
// (.ci/setup installs it, so CI runs it).
#include <gtest/gtest.h>

#include <array>
#include <cstdio>
#include <filesystem>
#include <memory>
#include <regex>
#include <string>

#include "../unit/app/app_test_support.hpp"
#include "app/commands.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

bool have_chromium() { return std::system("command -v chromium >/dev/null 2>&1") == 0; }

std::string output_of(const std::string& command) {
    std::string out;
    std::unique_ptr<FILE, int (*)(FILE*)> pipe(popen(command.c_str(), "r"), pclose);
    if (!pipe) return out;
    std::array<char, 4096> buffer{};
    while (std::fgets(buffer.data(), buffer.size(), pipe.get())) out += buffer.data();
    return out;
}

/// After loading, the probe writes what it found into an attribute of <body>, which
/// --dump-dom prints: images, images that failed to decode, script errors, caution visible.
constexpr const char* probe_script = R"(<script>
var veerErrors = 0;
window.addEventListener('error', function () { veerErrors++; }, true);
window.addEventListener('load', function () {
  var bad = 0, n = document.images.length;
  for (var i = 0; i < n; i++) {
    var im = document.images[i];
    if (!(im.complete && im.naturalWidth > 0)) bad++;
  }
  var c = document.querySelector('.caution'), shown = 0;
  if (c) {
    var r = c.getBoundingClientRect(), s = getComputedStyle(c);
    shown = (r.height > 0 && r.top >= 0 && r.top < window.innerHeight &&
             s.visibility !== 'hidden' && s.display !== 'none') ? 1 : 0;
  }
  document.body.setAttribute('data-probe',
    'images=' + n + ' broken=' + bad + ' errors=' + veerErrors + ' caution=' + shown);
});
</script>)";

int probe_value(const std::string& dom, const std::string& name) {
    std::smatch m;
    if (!std::regex_search(dom, m, std::regex(name + "=([0-9]+)"))) return -1;
    return std::stoi(m[1].str());
}

TEST(ReportInBrowser, ShortSweepPageRendersWithPicturesAndCaution) {
    if (!have_chromium())
        GTEST_SKIP() << "chromium is not installed: the report page was not rendered in a "
                        "browser (bash .ci/setup installs it)";
    test::AppScratch tmp;
    test::write_text(tmp / "c.toml", test::quick_case_text());
    SweepOptions sweep;
    sweep.input.case_file = tmp / "c.toml";
    sweep.alpha = "0:2:2";
    sweep.out_dir = tmp / "sw";
    sweep.quiet = true;
    ASSERT_EQ(run_sweep_command(sweep), 0);
    ASSERT_EQ(run_report_command({tmp / "sw"}), 0);
    // The probe is the page itself with the script appended, beside it so its pictures resolve.
    std::string html = test::read_text(tmp / "sw" / "report.html");
    const std::size_t end = html.rfind("</body>");
    ASSERT_NE(end, std::string::npos);
    html.insert(end, probe_script);
    test::write_text(tmp / "sw" / "probe.html", html);

    const std::string browser =
        "timeout 90 chromium --headless --no-sandbox --disable-gpu --window-size=1280,900 "
        "--virtual-time-budget=5000 ";
    const std::string dom = output_of(browser + "--dump-dom 'file://" +
                                      (tmp / "sw" / "probe.html").string() + "' 2>/dev/null");
    ASSERT_NE(dom.find("data-probe"), std::string::npos) << "the page did not finish loading";
    EXPECT_GE(probe_value(dom, "images"), 5);
    EXPECT_EQ(probe_value(dom, "broken"), 0);
    EXPECT_EQ(probe_value(dom, "errors"), 0);
    EXPECT_EQ(probe_value(dom, "caution"), 1);
    // And it renders to a picture (what a reader sees).
    const fs::path shot = tmp / "shot.png";
    std::system((browser + "--screenshot='" + shot.string() + "' 'file://" +
                 (tmp / "sw" / "report.html").string() + "' >/dev/null 2>&1")
                    .c_str());
    EXPECT_TRUE(test::is_png(shot));
}

}  // namespace
}  // namespace veer
