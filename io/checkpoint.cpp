#include "io/checkpoint.hpp"

#include <array>
#include <optional>
#include <set>
#include <string_view>
#include <system_error>

#include "io/atomic_file.hpp"
#include "io/hdf5_support.hpp"
#include "mesh/errors.hpp"

namespace veer {
namespace fs = std::filesystem;
using hdf5::Handle;

namespace {

constexpr const char* format_name = "veer checkpoint";

constexpr std::array<std::pair<Side, std::string_view>, 4> side_names{{{Side::i_min, "i_min"},
                                                                       {Side::i_max, "i_max"},
                                                                       {Side::j_min, "j_min"},
                                                                       {Side::j_max, "j_max"}}};
constexpr std::array<std::pair<SegmentKind, std::string_view>, 5> kind_names{
    {{SegmentKind::wall, "wall"},
     {SegmentKind::wake_cut, "wake_cut"},
     {SegmentKind::far_field, "far_field"},
     {SegmentKind::outflow, "outflow"},
     {SegmentKind::periodic, "periodic"}}};

template <class E, std::size_t N>
std::string name_of(const std::array<std::pair<E, std::string_view>, N>& table, E value) {
    for (const auto& [e, n] : table)
        if (e == value) return std::string(n);
    VEER_VERIFY(false, "enum value without a name");
    return {};
}

template <class E, std::size_t N>
E value_of(const std::array<std::pair<E, std::string_view>, N>& table, const std::string& name) {
    for (const auto& [e, n] : table)
        if (n == name) return e;
    throw hdf5::Hdf5Error("unknown segment side or kind '" + name + "'");
}

void write_mesh(hid_t veer_group, const StructuredGrid& grid) {
    Handle mesh = hdf5::create_group(veer_group, "mesh");
    hdf5::write_attribute(mesh.get(), "ni", std::int64_t{grid.ni()});
    hdf5::write_attribute(mesh.get(), "nj", std::int64_t{grid.nj()});
    if (grid.c_layout()) {
        hdf5::write_attribute(mesh.get(), "c_wake", std::int64_t{grid.c_layout()->wake});
        hdf5::write_attribute(mesh.get(), "c_around", std::int64_t{grid.c_layout()->around});
    }
    std::vector<double> x, y;
    for (const Vec2& p : grid.nodes()) {
        x.push_back(p.x);
        y.push_back(p.y);
    }
    const std::vector<hsize_t> dims{static_cast<hsize_t>(grid.nj() + 1),
                                    static_cast<hsize_t>(grid.ni() + 1)};
    hdf5::write_doubles(mesh.get(), "node_x", x, dims);
    hdf5::write_doubles(mesh.get(), "node_y", y, dims);
    std::vector<std::string> sides, kinds, names;
    std::vector<std::int64_t> begins, ends;
    for (const BoundarySegment& s : grid.segments()) {
        sides.push_back(name_of(side_names, s.side));
        kinds.push_back(name_of(kind_names, s.kind));
        names.push_back(s.name);
        begins.push_back(s.begin);
        ends.push_back(s.end);
    }
    hdf5::write_attribute(mesh.get(), "segment_count", static_cast<std::int64_t>(names.size()));
    hdf5::write_strings(mesh.get(), "segment_side", sides);
    hdf5::write_strings(mesh.get(), "segment_kind", kinds);
    hdf5::write_strings(mesh.get(), "segment_name", names);
    hdf5::write_ints(mesh.get(), "segment_begin", begins);
    hdf5::write_ints(mesh.get(), "segment_end", ends);
}

int as_int(std::int64_t v, const char* what) {
    if (v < 0 || v > (1 << 30)) throw hdf5::Hdf5Error(std::string(what) + " out of range");
    return static_cast<int>(v);
}

StructuredGrid read_mesh(hid_t veer_group) {
    Handle mesh = hdf5::open_group(veer_group, "mesh");
    const int ni = as_int(hdf5::read_int_attribute(mesh.get(), "ni"), "ni");
    const int nj = as_int(hdf5::read_int_attribute(mesh.get(), "nj"), "nj");
    if (ni < 1 || nj < 1) throw hdf5::Hdf5Error("mesh without cells");
    StructuredGrid grid(ni, nj);
    const std::vector<double> x = hdf5::read_doubles(mesh.get(), "node_x");
    const std::vector<double> y = hdf5::read_doubles(mesh.get(), "node_y");
    if (x.size() != grid.nodes().size() || y.size() != x.size())
        throw hdf5::Hdf5Error("node_x/node_y do not hold (ni+1) x (nj+1) nodes");
    for (int j = 0; j <= nj; ++j)
        for (int i = 0; i <= ni; ++i) {
            const auto k = static_cast<std::size_t>(j) * static_cast<std::size_t>(ni + 1) +
                           static_cast<std::size_t>(i);
            grid.node(i, j) = {x[k], y[k]};
        }
    if (hdf5::has_attribute(mesh.get(), "c_wake"))
        grid.c_layout() =
            CGridLayout{as_int(hdf5::read_int_attribute(mesh.get(), "c_wake"), "c_wake"),
                        as_int(hdf5::read_int_attribute(mesh.get(), "c_around"), "c_around")};
    const auto sides = hdf5::read_strings(mesh.get(), "segment_side");
    const auto kinds = hdf5::read_strings(mesh.get(), "segment_kind");
    const auto names = hdf5::read_strings(mesh.get(), "segment_name");
    const auto begins = hdf5::read_ints(mesh.get(), "segment_begin");
    const auto ends = hdf5::read_ints(mesh.get(), "segment_end");
    const auto count =
        static_cast<std::size_t>(hdf5::read_int_attribute(mesh.get(), "segment_count"));
    if (sides.size() != count || kinds.size() != count || names.size() != count ||
        begins.size() != count || ends.size() != count)
        throw hdf5::Hdf5Error("segment lists differ in length");
    for (std::size_t s = 0; s < count; ++s)
        grid.segments().push_back({value_of(side_names, sides[s]), as_int(begins[s], "begin"),
                                   as_int(ends[s], "end"), value_of(kind_names, kinds[s]),
                                   names[s]});
    return grid;
}

bool usable_name(const std::string& name) {
    return !name.empty() && name != "." && name.find('/') == std::string::npos;
}

void check_names(const CheckpointData& data) {
    std::set<std::string> seen;
    for (const NamedArray& a : data.arrays) {
        VEER_VERIFY(usable_name(a.name),
                    "checkpoint array name '" + a.name + "' is empty or holds '/'");
        VEER_VERIFY(seen.insert(a.name).second, "checkpoint array '" + a.name + "' given twice");
    }
    for (const auto& entry : data.scalars)
        VEER_VERIFY(usable_name(entry.first),
                    "checkpoint scalar name '" + entry.first + "' is empty or holds '/'");
}

void write_file(const fs::path& tmp, const CheckpointData& data) {
    Handle access = hdf5::checksummed_file_access();
    Handle file(H5Fcreate(tmp.c_str(), H5F_ACC_TRUNC, H5P_DEFAULT, access.get()), H5Fclose,
                "cannot create " + tmp.string());
    {
        Handle veer = hdf5::create_group(file.get(), "veer");
        hdf5::write_attribute(veer.get(), "format", std::string(format_name));
        hdf5::write_attribute(veer.get(), "format_version", checkpoint_format_version);
        hdf5::write_attribute(veer.get(), "step", data.step);
        hdf5::write_attribute(veer.get(), "time", data.time);
        hdf5::write_string(veer.get(), "case_text", data.case_text);
        write_mesh(veer.get(), data.grid);
        Handle scalars = hdf5::create_group(veer.get(), "scalars");
        for (const auto& [name, value] : data.scalars)
            hdf5::write_attribute(scalars.get(), name, value);
        Handle state = hdf5::create_group(veer.get(), "state", /*track_order=*/true);
        for (const NamedArray& a : data.arrays)
            hdf5::write_doubles(state.get(), a.name, a.values,
                                {static_cast<hsize_t>(a.values.size())});
    }
    file.close("closing " + tmp.string());  // buffered data reaches the file here
}

CheckpointData read_layout(hid_t file, const fs::path& path) {
    if (!hdf5::has_link(file, "veer"))
        throw InputError(path.string() + ": not a veer checkpoint (no /veer group)");
    Handle veer = hdf5::open_group(file, "veer");
    if (!hdf5::has_attribute(veer.get(), "format_version") ||
        hdf5::read_string_attribute(veer.get(), "format") != format_name)
        throw InputError(path.string() + ": not a veer checkpoint (/veer has no format tag)");
    const std::int64_t version = hdf5::read_int_attribute(veer.get(), "format_version");
    if (version < 1 || version > checkpoint_format_version)
        throw InputError(path.string() + ": checkpoint format version " + std::to_string(version) +
                         "; this build reads versions 1 to " +
                         std::to_string(checkpoint_format_version));
    std::optional<hdf5::RequireChecksums> checked;
    if (version >= 2) checked.emplace();  // every dataset of version 2 carries its checksum
    CheckpointData data;
    data.step = hdf5::read_int_attribute(veer.get(), "step");
    data.time = hdf5::read_double_attribute(veer.get(), "time");
    data.case_text = hdf5::read_string(veer.get(), "case_text");
    data.grid = read_mesh(veer.get());
    Handle scalars = hdf5::open_group(veer.get(), "scalars");
    for (const std::string& name : hdf5::attribute_names(scalars.get()))
        data.scalars[name] = hdf5::read_double_attribute(scalars.get(), name);
    Handle state = hdf5::open_group(veer.get(), "state");
    for (const std::string& name : hdf5::link_names_in_creation_order(state.get()))
        data.arrays.push_back({name, hdf5::read_doubles(state.get(), name)});
    return data;
}

/// Reads the new file back before it replaces the last good one: a full disk can swallow a
/// buffered write without any call reporting it (seen with the disk filling during a write), and a
/// checkpoint that does not restart must never take the good one's place.
void verify_written(const fs::path& tmp) {
    Handle access = hdf5::strict_file_access();
    Handle file(H5Fopen(tmp.c_str(), H5F_ACC_RDONLY, access.get()), H5Fclose,
                "reading back " + tmp.string());
    try {
        read_layout(file.get(), tmp);
    } catch (const InputError&) {
        throw hdf5::Hdf5Error("read back, it is not a whole veer checkpoint");
    } catch (const hdf5::Hdf5Error& e) {
        throw hdf5::Hdf5Error(std::string("read back, ") + e.what());
    }
}

}  // namespace

void write_checkpoint(const fs::path& path, const CheckpointData& data) {
    check_names(data);
    const fs::path tmp = temporary_path_for(path);
    const hdf5::SilenceErrors quiet;
    try {
        write_file(tmp, data);
        verify_written(tmp);
    } catch (const hdf5::Hdf5Error& e) {
        std::error_code ec;
        fs::remove(tmp, ec);
        throw InputError(path.string() + ": cannot write the checkpoint (" + e.what() +
                         "); is the disk full? The previous checkpoint is kept");
    }
    commit_temporary(tmp, path);
}

CheckpointData read_checkpoint(const fs::path& path) {
    std::error_code ec;
    if (!fs::is_regular_file(path, ec))
        throw InputError(path.string() + ": no such file; expected a veer checkpoint (HDF5)");
    const hdf5::SilenceErrors quiet;
    if (H5Fis_hdf5(path.c_str()) <= 0)
        throw InputError(path.string() + ": not an HDF5 file; expected a veer checkpoint");
    try {
        Handle access = hdf5::strict_file_access();
        Handle file(H5Fopen(path.c_str(), H5F_ACC_RDONLY, access.get()), H5Fclose,
                    "cannot open the file");
        return read_layout(file.get(), path);
    } catch (const hdf5::Hdf5Error& e) {
        throw InputError(path.string() + ": damaged veer checkpoint: " + e.what());
    }
}

}  // namespace veer
