#include "app/report_html.hpp"

#include <sstream>

namespace veer {
namespace {

constexpr const char* style = R"(body{font-family:sans-serif;margin:2em auto;max-width:1100px;
color:#222;line-height:1.4}h1{font-size:1.6em}h2{font-size:1.25em;border-bottom:1px solid #ccc;
padding-bottom:.2em;margin-top:2em}table{border-collapse:collapse;margin:.8em 0;font-size:.9em}
th,td{border:1px solid #ccc;padding:.25em .6em;text-align:right}th{background:#f2f2f2}
td:first-child,th:first-child{text-align:left}caption{text-align:left;font-weight:bold;
padding:.3em 0}figure{display:inline-block;margin:.5em 1em .5em 0;vertical-align:top}
figure img{max-width:100%;border:1px solid #ddd}figcaption{font-size:.85em;color:#555})";

void write_table(std::ostringstream& out, const ReportTable& t) {
    out << "<table>\n";
    if (!t.caption.empty()) out << "<caption>" << html_escape(t.caption) << "</caption>\n";
    for (std::size_t r = 0; r < t.rows.size(); ++r) {
        const char* tag = r == 0 ? "th" : "td";
        out << "<tr>";
        for (const std::string& c : t.rows[r])
            out << "<" << tag << ">" << html_escape(c) << "</" << tag << ">";
        out << "</tr>\n";
    }
    out << "</table>\n";
}

}  // namespace

std::string html_escape(const std::string& text) {
    std::string out;
    for (char c : text) {
        switch (c) {
            case '&':
                out += "&amp;";
                break;
            case '<':
                out += "&lt;";
                break;
            case '>':
                out += "&gt;";
                break;
            case '"':
                out += "&quot;";
                break;
            default:
                out += c;
        }
    }
    return out;
}

std::string render_report_html(const ReportPage& page) {
    std::ostringstream out;
    out << "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>"
        << html_escape(page.title) << "</title>\n<style>" << style << "</style>\n</head>\n<body>\n"
        << "<h1>" << html_escape(page.title) << "</h1>\n";
    for (const ReportSection& s : page.sections) {
        out << "<h2>" << html_escape(s.heading) << "</h2>\n";
        for (const std::string& p : s.paragraphs) out << "<p>" << html_escape(p) << "</p>\n";
        for (const ReportTable& t : s.tables) write_table(out, t);
        for (const ReportPicture& p : s.pictures)
            out << "<figure><img src=\"" << html_escape(p.file) << "\" alt=\""
                << html_escape(p.caption) << "\"><figcaption>" << html_escape(p.caption)
                << "</figcaption></figure>\n";
    }
    out << "</body>\n</html>\n";
    return out.str();
}

}  // namespace veer
