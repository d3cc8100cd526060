#include "app/report_html.hpp"

#include <sstream>

#include "io/markup_escape.hpp"

namespace veer {
namespace {

constexpr const char* style = R"(body{font-family:sans-serif;margin:2em auto;max-width:1100px;
color:#222;line-height:1.4}h1{font-size:1.6em}h2{font-size:1.25em;border-bottom:1px solid #ccc;
padding-bottom:.2em;margin-top:2em}table{border-collapse:collapse;margin:.8em 0;font-size:.9em}
th,td{border:1px solid #ccc;padding:.25em .6em;text-align:right}th{background:#f2f2f2}
td:first-child,th:first-child{text-align:left}caption{text-align:left;font-weight:bold;
padding:.3em 0}figure{display:inline-block;margin:.5em 1em .5em 0;vertical-align:top}
figure img{max-width:100%;border:1px solid #ddd}figcaption{font-size:.85em;color:#555}
.caution{border:2px solid #b35900;background:#fff4e5;padding:.6em .9em;font-weight:bold})";

void write_table(std::ostringstream& out, const ReportTable& t) {
    out << "<table>\n";
    if (!t.caption.empty()) out << "<caption>" << markup_escaped(t.caption) << "</caption>\n";
    for (std::size_t r = 0; r < t.rows.size(); ++r) {
        const char* tag = r == 0 ? "th" : "td";
        out << "<tr>";
        for (const std::string& c : t.rows[r])
            out << "<" << tag << ">" << markup_escaped(c) << "</" << tag << ">";
        out << "</tr>\n";
    }
    out << "</table>\n";
}

}  // namespace

std::string render_report_html(const ReportPage& page) {
    std::ostringstream out;
    out << "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>"
        << markup_escaped(page.title) << "</title>\n<style>" << style
        << "</style>\n</head>\n<body>\n"
        << "<h1>" << markup_escaped(page.title) << "</h1>\n";
    if (!page.caution.empty())
        out << "<p class=\"caution\">" << markup_escaped(page.caution) << "</p>\n";
    for (const ReportSection& s : page.sections) {
        out << "<h2>" << markup_escaped(s.heading) << "</h2>\n";
        for (const std::string& p : s.paragraphs) out << "<p>" << markup_escaped(p) << "</p>\n";
        for (const ReportTable& t : s.tables) write_table(out, t);
        for (const ReportPicture& p : s.pictures)
            out << "<figure><img src=\"" << markup_escaped(p.file) << "\" alt=\""
                << markup_escaped(p.caption) << "\"><figcaption>" << markup_escaped(p.caption)
                << "</figcaption></figure>\n";
    }
    out << "</body>\n</html>\n";
    return out.str();
}

}  // namespace veer
