#include "io/field_series.hpp"

#include <algorithm>
#include <charconv>
#include <cstdio>
#include <fstream>
#include <regex>
#include <sstream>

#include "io/atomic_file.hpp"
#include "mesh/errors.hpp"
#include "postprocess/vorticity.hpp"

namespace veer {
namespace fs = std::filesystem;

namespace {

const std::regex frame_name_pattern(R"(fields_(\d+)\.vts)");

// Shortest text that reads back to the same double: the .pvd times are exact.
std::string exact_text(double v) {
    char buf[64];
    const auto r = std::to_chars(buf, buf + sizeof buf, v);
    return std::string(buf, r.ptr);
}

std::string attribute(const std::string& tag, const std::string& name) {
    const std::regex pattern("\\b" + name + "\\s*=\\s*\"([^\"]*)\"");
    std::smatch m;
    return std::regex_search(tag, m, pattern) ? m[1].str() : std::string();
}

std::string xml_escaped(const std::string& s) {
    std::string out;
    for (char c : s) {
        switch (c) {
            case '&':
                out += "&amp;";
                break;
            case '"':
                out += "&quot;";
                break;
            case '<':
                out += "&lt;";
                break;
            case '>':
                out += "&gt;";
                break;
            default:
                out += c;
        }
    }
    return out;
}

}  // namespace

std::vector<SeriesFrame> read_pvd(const fs::path& path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) throw InputError(path.string() + ": cannot open the frame list");
    std::ostringstream s;
    s << in.rdbuf();
    const std::string text = s.str();
    if (text.find("<Collection") == std::string::npos)
        throw InputError(path.string() +
                         ": not a VTK collection file (no <Collection>); move it away or start "
                         "the run afresh");
    std::vector<SeriesFrame> frames;
    const std::regex dataset_tag(R"(<DataSet\b[^>]*>)");
    for (auto it = std::sregex_iterator(text.begin(), text.end(), dataset_tag);
         it != std::sregex_iterator(); ++it) {
        const std::string tag = it->str();
        const std::string t = attribute(tag, "timestep");
        SeriesFrame f;
        const auto r = std::from_chars(t.data(), t.data() + t.size(), f.time);
        if (t.empty() || r.ec != std::errc() || r.ptr != t.data() + t.size())
            throw InputError(path.string() + ": DataSet timestep '" + t +
                             "' is not a number; expected timestep=\"<time>\"");
        f.file = attribute(tag, "file");
        if (f.file.empty())
            throw InputError(path.string() + ": DataSet without a file attribute: " + tag);
        frames.push_back(f);
    }
    return frames;
}

FieldSeries::FieldSeries(fs::path dir, SeriesStart start) : m_dir(std::move(dir)) {
    std::error_code ec;
    fs::create_directories(m_dir, ec);
    if (ec) throw InputError(m_dir.string() + ": cannot create the folder: " + ec.message());
    if (start == SeriesStart::resume && fs::exists(pvd_path(), ec)) m_frames = read_pvd(pvd_path());
}

void FieldSeries::discard_after(double time) {
    std::erase_if(m_frames, [time](const SeriesFrame& f) { return f.time > time; });
}

int FieldSeries::next_number() const {
    int next = 0;
    for (const SeriesFrame& f : m_frames) {
        std::smatch m;
        if (std::regex_match(f.file, m, frame_name_pattern))
            next = std::max(next, std::stoi(m[1].str()) + 1);
    }
    return next;
}

fs::path FieldSeries::write_frame(double time, const StructuredGrid& grid,
                                  const GridMetrics& metrics, const FlowFields& flow,
                                  const std::vector<CellArray>& extra) {
    const auto cells = static_cast<std::size_t>(grid.cell_count());
    VEER_VERIFY(flow.u.size() == cells && flow.v.size() == cells && flow.pressure.size() == cells,
                "flow fields do not match the grid");
    std::erase_if(m_frames, [time](const SeriesFrame& f) { return f.time >= time; });

    const std::vector<double> velocity = interleave_xy0(flow.u, flow.v);
    std::vector<double> cp(cells);
    for (std::size_t c = 0; c < cells; ++c) cp[c] = 2.0 * flow.pressure[c];  // q_inf = 1/2
    const std::vector<double> vorticity = compute_vorticity(grid, metrics, flow);
    std::vector<CellArray> arrays{{"velocity", 3, &velocity},
                                  {"pressure", 1, &flow.pressure},
                                  {"Cp", 1, &cp},
                                  {"vorticity", 1, &vorticity}};
    if (!flow.eddy_viscosity.empty()) arrays.push_back({"eddy_viscosity", 1, &flow.eddy_viscosity});
    if (!flow.nu_tilde.empty()) arrays.push_back({"nu_tilde", 1, &flow.nu_tilde});
    arrays.insert(arrays.end(), extra.begin(), extra.end());

    char name[32];
    std::snprintf(name, sizeof name, "fields_%06d.vts", next_number());
    const fs::path frame = m_dir / name;
    write_grid_vts(frame, grid, arrays, {}, time);
    m_frames.push_back({time, name});
    write_pvd();
    return frame;
}

void FieldSeries::write_pvd() const {
    std::string text =
        "<?xml version=\"1.0\"?>\n"
        "<VTKFile type=\"Collection\" version=\"1.0\" byte_order=\"LittleEndian\">\n"
        "  <Collection>\n";
    for (const SeriesFrame& f : m_frames)
        text += "    <DataSet timestep=\"" + exact_text(f.time) + "\" part=\"0\" file=\"" +
                xml_escaped(f.file) + "\"/>\n";
    text += "  </Collection>\n</VTKFile>\n";
    write_text_atomically(pvd_path(), text);
}

}  // namespace veer
