#pragma once
/// The report page: a self-contained HTML file (inline style, pictures by relative path, no
/// network resources) made of headed sections of tables and pictures.
#include <string>
#include <vector>

#include "app/report_pictures.hpp"

namespace veer {

/// A table of text cells; the first row is the header.
struct ReportTable {
    std::string caption;
    std::vector<std::vector<std::string>> rows;
};

struct ReportSection {
    std::string heading;
    std::vector<std::string> paragraphs;  ///< plain text (escaped on output)
    std::vector<ReportTable> tables;
    std::vector<ReportPicture> pictures;
};

struct ReportPage {
    std::string title;
    std::vector<ReportSection> sections;
    std::string caution;  ///< shown boxed under the title, before anything else (plain text)
};

/// The page as HTML text.
std::string render_report_html(const ReportPage& page);

}  // namespace veer
