#include "io/field_series.hpp"

#include <algorithm>
#include <cctype>
#include <charconv>
#include <cstdio>
#include <fstream>
#include <sstream>

#include "io/atomic_file.hpp"
#include "io/input_file.hpp"
#include "io/markup_escape.hpp"
#include "mesh/errors.hpp"
#include "postprocess/vorticity.hpp"

namespace veer {
namespace fs = std::filesystem;

namespace {

// The frame number of a file named fields_<digits>.vts, or -1.
int frame_number(const std::string& file) {
    const std::string head = "fields_", tail = ".vts";
    if (file.size() <= head.size() + tail.size() || !file.starts_with(head) ||
        !file.ends_with(tail))
        return -1;
    const std::string digits = file.substr(head.size(), file.size() - head.size() - tail.size());
    int n = 0;
    const auto r = std::from_chars(digits.data(), digits.data() + digits.size(), n);
    return r.ec == std::errc() && r.ptr == digits.data() + digits.size() ? n : -1;
}

// Shortest text that reads back to the same double: the .pvd times are exact.
std::string exact_text(double v) {
    char buf[64];
    const auto r = std::to_chars(buf, buf + sizeof buf, v);
    return std::string(buf, r.ptr);
}

// The value of name="..." in one XML tag; empty when absent.
std::string attribute(const std::string& tag, const std::string& name) {
    const std::string key = name + "=\"";
    for (std::size_t at = tag.find(key); at != std::string::npos; at = tag.find(key, at + 1)) {
        if (at == 0 || !std::isspace(static_cast<unsigned char>(tag[at - 1]))) continue;
        const std::size_t begin = at + key.size(), end = tag.find('"', begin);
        if (end != std::string::npos) return tag.substr(begin, end - begin);
    }
    return {};
}

}  // namespace

std::vector<SeriesFrame> read_pvd(const fs::path& path) {
    const std::string text = read_input_file(path, "frame list", record_file_cap);
    if (text.find("<Collection") == std::string::npos)
        throw InputError(path.string() +
                         ": not a VTK collection file (no <Collection>); move it away or start "
                         "the run afresh");
    std::vector<SeriesFrame> frames;
    for (std::size_t at = text.find("<DataSet"); at != std::string::npos;
         at = text.find("<DataSet", at + 1)) {
        const std::size_t end = text.find('>', at);
        const std::string tag = text.substr(at, end == std::string::npos ? end : end - at + 1);
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

namespace {

/// Removes the frames of an earlier series in `dir` so that a fresh series never lists beside
/// them (a viewer opening the folder's frames would mix two runs). Only veer's own frames go: the
/// files the old fields.pvd lists under veer's frame names, and frames of that name numbered
/// after the last listed one (written by a run killed before it listed them). Nothing else.
void remove_earlier_frames(const fs::path& dir, const fs::path& pvd) {
    std::error_code ec;
    if (!fs::is_regular_file(pvd, ec)) return;
    std::vector<SeriesFrame> old;
    try {
        old = read_pvd(pvd);
    } catch (const InputError&) {
        return;  // not a list veer wrote: leave every file alone
    }
    int last = -1;
    for (const SeriesFrame& f : old) {
        const int n = frame_number(f.file);
        if (n < 0 || f.file.find('/') != std::string::npos) continue;
        last = std::max(last, n);
        fs::remove(dir / f.file, ec);
    }
    for (const fs::directory_entry& e : fs::directory_iterator(dir, ec))
        if (frame_number(e.path().filename().string()) > last && e.is_regular_file(ec))
            fs::remove(e.path(), ec);
    fs::remove(pvd, ec);
}

}  // namespace

FieldSeries::FieldSeries(fs::path dir, SeriesStart start) : m_dir(std::move(dir)) {
    std::error_code ec;
    fs::create_directories(m_dir, ec);
    if (ec) throw InputError(m_dir.string() + ": cannot create the folder: " + ec.message());
    if (start == SeriesStart::resume && fs::exists(pvd_path(), ec)) m_frames = read_pvd(pvd_path());
    if (start == SeriesStart::fresh) remove_earlier_frames(m_dir, pvd_path());
}

void FieldSeries::discard_after(double time) {
    std::erase_if(m_frames, [time](const SeriesFrame& f) { return f.time > time; });
}

int FieldSeries::next_number() const {
    int next = 0;
    for (const SeriesFrame& f : m_frames) next = std::max(next, frame_number(f.file) + 1);
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
    for (const NamedArray& a : flow.model_fields) arrays.push_back({a.name, 1, &a.values});
    arrays.insert(arrays.end(), extra.begin(), extra.end());

    char name[32];
    std::snprintf(name, sizeof name, "fields_%06d.vts", next_number());
    fs::path frame = m_dir / name;
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
                markup_escaped(f.file) + "\"/>\n";
    text += "  </Collection>\n</VTKFile>\n";
    write_text_atomically(pvd_path(), text);
}

}  // namespace veer
