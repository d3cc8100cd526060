#include "io/hdf5_support.hpp"

#include <algorithm>
#include <cstring>

#include "io/checksum.hpp"

namespace veer::hdf5 {

namespace {

thread_local bool checksums_required = false;

// No clean-up of HDF5 at exit: after a damaged file or a full disk the library keeps internal
// blocks its error paths never free, and its exit handler then loops ("infinite loop closing
// library", a page of letters on stderr) or crashes (exit 139 after a failed checkpoint write).
// veer closes every file it opens itself (strong close), so there is nothing left to flush, and
// the system frees the memory. Must run before the library starts: a static initializer.
const bool no_exit_handler = [] {
    H5dont_atexit();
    return true;
}();

hid_t check(hid_t id, const std::string& what) {
    if (id < 0) throw Hdf5Error(what);
    return id;
}

void check_status(herr_t status, const std::string& what) {
    if (status < 0) throw Hdf5Error(what);
}

Handle vl_string_type() {
    Handle t(H5Tcopy(H5T_C_S1), H5Tclose, "string type");
    check_status(H5Tset_size(t.get(), H5T_VARIABLE), "string type");
    check_status(H5Tset_cset(t.get(), H5T_CSET_UTF8), "string type");
    return t;
}

/// A fixed-length string type of `size` bytes (at least 1), padded with NULs. Fixed-length strings
/// live in the object header (attributes) or the dataset's own data, where checksums cover them;
/// variable-length ones live in HDF5's global heap, which has no checksum and whose damaged
/// entries crash the library's reader (found by flipping bytes of a checkpoint).
Handle fixed_string_type(std::size_t size) {
    Handle t(H5Tcopy(H5T_C_S1), H5Tclose, "string type");
    check_status(H5Tset_size(t.get(), std::max<std::size_t>(size, 1)), "string type");
    check_status(H5Tset_strpad(t.get(), H5T_STR_NULLPAD), "string type");
    check_status(H5Tset_cset(t.get(), H5T_CSET_UTF8), "string type");
    return t;
}

/// `count` fixed-length strings of `size` bytes each, NUL padding removed.
std::vector<std::string> split_fixed(const std::vector<char>& bytes, std::size_t count,
                                     std::size_t size) {
    std::vector<std::string> out;
    for (std::size_t k = 0; k < count; ++k) {
        std::string s(bytes.data() + k * size, size);
        s.erase(s.find_last_not_of('\0') + 1);
        out.push_back(s);
    }
    return out;
}

Handle scalar_space() { return Handle(H5Screate(H5S_SCALAR), H5Sclose, "dataspace"); }

Handle simple_space(const std::vector<hsize_t>& dims) {
    return Handle(H5Screate_simple(static_cast<int>(dims.size()), dims.data(), nullptr), H5Sclose,
                  "dataspace");
}

Handle open_attribute(hid_t object, const std::string& name) {
    if (!has_attribute(object, name)) throw Hdf5Error("attribute '" + name + "' missing");
    return Handle(H5Aopen(object, name.c_str(), H5P_DEFAULT), H5Aclose, "attribute '" + name + "'");
}

Handle open_dataset(hid_t parent, const std::string& name) {
    if (!has_link(parent, name)) throw Hdf5Error("dataset '" + name + "' missing");
    return Handle(H5Dopen2(parent, name.c_str(), H5P_DEFAULT), H5Dclose, "dataset '" + name + "'");
}

hsize_t element_count(hid_t dataset, std::vector<hsize_t>* dims) {
    Handle space(H5Dget_space(dataset), H5Sclose, "dataspace");
    const int rank = H5Sget_simple_extent_ndims(space.get());
    check_status(rank, "dataspace rank");
    std::vector<hsize_t> d(static_cast<std::size_t>(rank));
    if (rank > 0) check_status(H5Sget_simple_extent_dims(space.get(), d.data(), nullptr), "dims");
    hsize_t n = 1;
    for (hsize_t k : d) n *= k;
    if (dims) *dims = d;
    return n;
}

template <class T>
void write_attribute_of(hid_t object, const std::string& name, hid_t file_type, hid_t mem_type,
                        const T& value) {
    Handle space = scalar_space();
    Handle a(H5Acreate2(object, name.c_str(), file_type, space.get(), H5P_DEFAULT, H5P_DEFAULT),
             H5Aclose, "attribute '" + name + "'");
    check_status(H5Awrite(a.get(), mem_type, &value), "attribute '" + name + "'");
}

template <class T>
T read_attribute_of(hid_t object, const std::string& name, hid_t mem_type, H5T_class_t cls) {
    Handle a = open_attribute(object, name);
    Handle t(H5Aget_type(a.get()), H5Tclose, "attribute type");
    if (H5Tget_class(t.get()) != cls) throw Hdf5Error("attribute '" + name + "' has another type");
    T value{};
    check_status(H5Aread(a.get(), mem_type, &value), "attribute '" + name + "'");
    return value;
}

void verify_checksum(hid_t dataset, const std::string& name, std::int64_t computed) {
    if (!has_attribute(dataset, checksum_attribute)) {
        if (checksums_required) throw Hdf5Error("dataset '" + name + "' has no checksum");
        return;
    }
    if (read_int_attribute(dataset, checksum_attribute) != computed)
        throw Hdf5Error("dataset '" + name +
                        "' does not match its checksum (the file was changed or damaged)");
}

}  // namespace

RequireChecksums::RequireChecksums() : m_previous(checksums_required) { checksums_required = true; }

RequireChecksums::~RequireChecksums() { checksums_required = m_previous; }

Handle checksummed_file_access() {
    Handle fapl = strict_file_access();
    check_status(H5Pset_libver_bounds(fapl.get(), H5F_LIBVER_V18, H5F_LIBVER_LATEST),
                 "file format bounds");
    return fapl;
}

Handle strict_file_access() {
    Handle fapl(H5Pcreate(H5P_FILE_ACCESS), H5Pclose, "file access properties");
    check_status(H5Pset_fclose_degree(fapl.get(), H5F_CLOSE_STRONG), "file close degree");
    return fapl;
}

Handle::Handle(hid_t id, Closer closer, const std::string& what)
    : m_id(check(id, what)), m_closer(closer) {}

Handle::~Handle() {
    if (m_id >= 0) m_closer(m_id);
}

void Handle::close(const std::string& what) {
    const herr_t status = m_closer(m_id);
    m_id = -1;
    check_status(status, what);
}

SilenceErrors::SilenceErrors() {
    H5Eget_auto2(H5E_DEFAULT, &m_func, &m_data);
    H5Eset_auto2(H5E_DEFAULT, nullptr, nullptr);
}

SilenceErrors::~SilenceErrors() { H5Eset_auto2(H5E_DEFAULT, m_func, m_data); }

Handle create_group(hid_t parent, const std::string& name, bool track_order) {
    Handle props(H5Pcreate(H5P_GROUP_CREATE), H5Pclose, "group properties");
    if (track_order)
        check_status(
            H5Pset_link_creation_order(props.get(), H5P_CRT_ORDER_TRACKED | H5P_CRT_ORDER_INDEXED),
            "group properties");
    return Handle(H5Gcreate2(parent, name.c_str(), H5P_DEFAULT, props.get(), H5P_DEFAULT), H5Gclose,
                  "group '" + name + "'");
}

Handle open_group(hid_t parent, const std::string& name) {
    if (!has_link(parent, name)) throw Hdf5Error("group '" + name + "' missing");
    return Handle(H5Gopen2(parent, name.c_str(), H5P_DEFAULT), H5Gclose, "group '" + name + "'");
}

bool has_link(hid_t parent, const std::string& name) {
    return H5Lexists(parent, name.c_str(), H5P_DEFAULT) > 0;
}

bool has_attribute(hid_t object, const std::string& name) {
    return H5Aexists(object, name.c_str()) > 0;
}

void write_attribute(hid_t object, const std::string& name, const std::string& value) {
    Handle t = fixed_string_type(value.size());
    Handle space = scalar_space();
    Handle a(H5Acreate2(object, name.c_str(), t.get(), space.get(), H5P_DEFAULT, H5P_DEFAULT),
             H5Aclose, "attribute '" + name + "'");
    std::string padded = value;
    padded.resize(std::max<std::size_t>(value.size(), 1), '\0');
    check_status(H5Awrite(a.get(), t.get(), padded.data()), "attribute '" + name + "'");
}

void write_attribute(hid_t object, const std::string& name, std::int64_t value) {
    write_attribute_of(object, name, H5T_STD_I64LE, H5T_NATIVE_INT64, value);
}

void write_attribute(hid_t object, const std::string& name, double value) {
    write_attribute_of(object, name, H5T_IEEE_F64LE, H5T_NATIVE_DOUBLE, value);
}

std::string read_string_attribute(hid_t object, const std::string& name) {
    Handle a = open_attribute(object, name);
    Handle file_type(H5Aget_type(a.get()), H5Tclose, "attribute type");
    if (H5Tget_class(file_type.get()) != H5T_STRING)
        throw Hdf5Error("attribute '" + name + "' is not a string");
    if (H5Tis_variable_str(file_type.get()) <= 0) {
        const std::size_t size = H5Tget_size(file_type.get());
        if (size == 0 || size > (1u << 20)) throw Hdf5Error("attribute '" + name + "' size");
        Handle t = fixed_string_type(size);
        std::vector<char> bytes(size);
        check_status(H5Aread(a.get(), t.get(), bytes.data()), "attribute '" + name + "'");
        return split_fixed(bytes, 1, size).front();
    }
    if (checksums_required)  // files with checksums write none: a damaged type, not a format
        throw Hdf5Error("attribute '" + name + "' is a variable-length string");
    Handle t = vl_string_type();
    char* c = nullptr;
    check_status(H5Aread(a.get(), t.get(), &c), "attribute '" + name + "'");
    std::string out = c ? c : "";
    H5free_memory(c);
    return out;
}

std::int64_t read_int_attribute(hid_t object, const std::string& name) {
    return read_attribute_of<std::int64_t>(object, name, H5T_NATIVE_INT64, H5T_INTEGER);
}

double read_double_attribute(hid_t object, const std::string& name) {
    return read_attribute_of<double>(object, name, H5T_NATIVE_DOUBLE, H5T_FLOAT);
}

std::vector<std::string> attribute_names(hid_t object) {
    H5O_info_t info;
    check_status(H5Oget_info2(object, &info, H5O_INFO_NUM_ATTRS), "object info");
    std::vector<std::string> names;
    for (hsize_t k = 0; k < info.num_attrs; ++k) {
        const ssize_t len =
            H5Aget_name_by_idx(object, ".", H5_INDEX_NAME, H5_ITER_INC, k, nullptr, 0, H5P_DEFAULT);
        check_status(static_cast<herr_t>(len < 0 ? -1 : 0), "attribute name");
        std::string name(static_cast<std::size_t>(len), '\0');
        H5Aget_name_by_idx(object, ".", H5_INDEX_NAME, H5_ITER_INC, k, name.data(),
                           static_cast<std::size_t>(len) + 1, H5P_DEFAULT);
        names.push_back(name);
    }
    return names;
}

void write_doubles(hid_t parent, const std::string& name, const std::vector<double>& values,
                   const std::vector<hsize_t>& dims) {
    Handle space = simple_space(dims);
    Handle d(H5Dcreate2(parent, name.c_str(), H5T_IEEE_F64LE, space.get(), H5P_DEFAULT, H5P_DEFAULT,
                        H5P_DEFAULT),
             H5Dclose, "dataset '" + name + "'");
    write_attribute(d.get(), checksum_attribute, hash_of(values));
    if (!values.empty())
        check_status(
            H5Dwrite(d.get(), H5T_NATIVE_DOUBLE, H5S_ALL, H5S_ALL, H5P_DEFAULT, values.data()),
            "dataset '" + name + "'");
    d.close("dataset '" + name + "'");  // small data waits in a buffer until here
}

std::vector<double> read_doubles(hid_t parent, const std::string& name,
                                 std::vector<hsize_t>* dims) {
    Handle d = open_dataset(parent, name);
    Handle t(H5Dget_type(d.get()), H5Tclose, "dataset type");
    if (H5Tget_class(t.get()) != H5T_FLOAT) throw Hdf5Error("dataset '" + name + "' is not float");
    std::vector<double> values(static_cast<std::size_t>(element_count(d.get(), dims)));
    if (!values.empty())
        check_status(
            H5Dread(d.get(), H5T_NATIVE_DOUBLE, H5S_ALL, H5S_ALL, H5P_DEFAULT, values.data()),
            "dataset '" + name + "'");
    verify_checksum(d.get(), name, hash_of(values));
    return values;
}

void write_ints(hid_t parent, const std::string& name, const std::vector<std::int64_t>& values) {
    Handle space = simple_space({static_cast<hsize_t>(values.size())});
    Handle d(H5Dcreate2(parent, name.c_str(), H5T_STD_I64LE, space.get(), H5P_DEFAULT, H5P_DEFAULT,
                        H5P_DEFAULT),
             H5Dclose, "dataset '" + name + "'");
    write_attribute(d.get(), checksum_attribute, hash_of(values));
    if (!values.empty())
        check_status(
            H5Dwrite(d.get(), H5T_NATIVE_INT64, H5S_ALL, H5S_ALL, H5P_DEFAULT, values.data()),
            "dataset '" + name + "'");
    d.close("dataset '" + name + "'");  // small data waits in a buffer until here
}

std::vector<std::int64_t> read_ints(hid_t parent, const std::string& name) {
    Handle d = open_dataset(parent, name);
    Handle t(H5Dget_type(d.get()), H5Tclose, "dataset type");
    if (H5Tget_class(t.get()) != H5T_INTEGER)
        throw Hdf5Error("dataset '" + name + "' is not integer");
    std::vector<std::int64_t> values(static_cast<std::size_t>(element_count(d.get(), nullptr)));
    if (!values.empty())
        check_status(
            H5Dread(d.get(), H5T_NATIVE_INT64, H5S_ALL, H5S_ALL, H5P_DEFAULT, values.data()),
            "dataset '" + name + "'");
    verify_checksum(d.get(), name, hash_of(values));
    return values;
}

void write_string(hid_t parent, const std::string& name, const std::string& value) {
    write_strings(parent, name, {value});
}

std::string read_string(hid_t parent, const std::string& name) {
    const std::vector<std::string> all = read_strings(parent, name);
    if (all.size() != 1) throw Hdf5Error("dataset '" + name + "' is not a single string");
    return all.front();
}

void write_strings(hid_t parent, const std::string& name, const std::vector<std::string>& values) {
    std::size_t size = 1;
    for (const std::string& s : values) size = std::max(size, s.size());
    Handle t = fixed_string_type(size);
    Handle space = simple_space({static_cast<hsize_t>(values.size())});
    Handle d(H5Dcreate2(parent, name.c_str(), t.get(), space.get(), H5P_DEFAULT, H5P_DEFAULT,
                        H5P_DEFAULT),
             H5Dclose, "dataset '" + name + "'");
    write_attribute(d.get(), checksum_attribute, hash_of(values));
    if (!values.empty()) {
        std::vector<char> bytes(values.size() * size, '\0');
        for (std::size_t k = 0; k < values.size(); ++k)
            std::copy(values[k].begin(), values[k].end(),
                      bytes.begin() + static_cast<long>(k * size));
        check_status(H5Dwrite(d.get(), t.get(), H5S_ALL, H5S_ALL, H5P_DEFAULT, bytes.data()),
                     "dataset '" + name + "'");
    }
    d.close("dataset '" + name + "'");  // small data waits in a buffer until here
}

std::vector<std::string> read_strings(hid_t parent, const std::string& name) {
    Handle d = open_dataset(parent, name);
    Handle file_type(H5Dget_type(d.get()), H5Tclose, "dataset type");
    if (H5Tget_class(file_type.get()) != H5T_STRING)
        throw Hdf5Error("dataset '" + name + "' is not a string");
    if (H5Tis_variable_str(file_type.get()) <= 0) {
        const std::size_t size = H5Tget_size(file_type.get());
        const auto count = static_cast<std::size_t>(element_count(d.get(), nullptr));
        if (size == 0 || (count > 0 && size > (std::size_t{1} << 30) / count))
            throw Hdf5Error("dataset '" + name + "' size");
        std::vector<char> bytes(count * size);
        Handle t = fixed_string_type(size);
        if (count > 0)
            check_status(H5Dread(d.get(), t.get(), H5S_ALL, H5S_ALL, H5P_DEFAULT, bytes.data()),
                         "dataset '" + name + "'");
        std::vector<std::string> out = split_fixed(bytes, count, size);
        verify_checksum(d.get(), name, hash_of(out));
        return out;
    }
    if (checksums_required)  // files with checksums write none: a damaged type, not a format
        throw Hdf5Error("dataset '" + name + "' is a variable-length string");
    std::vector<char*> c(static_cast<std::size_t>(element_count(d.get(), nullptr)), nullptr);
    std::vector<std::string> out;
    if (!c.empty()) {
        Handle t = vl_string_type();
        check_status(H5Dread(d.get(), t.get(), H5S_ALL, H5S_ALL, H5P_DEFAULT, c.data()),
                     "dataset '" + name + "'");
        for (char* s : c) {
            out.emplace_back(s ? s : "");
            H5free_memory(s);
        }
    }
    verify_checksum(d.get(), name, hash_of(out));
    return out;
}

std::vector<std::string> link_names_in_creation_order(hid_t group) {
    H5G_info_t info;
    check_status(H5Gget_info(group, &info), "group info");
    std::vector<std::string> names;
    for (hsize_t k = 0; k < info.nlinks; ++k) {
        const ssize_t len = H5Lget_name_by_idx(group, ".", H5_INDEX_CRT_ORDER, H5_ITER_INC, k,
                                               nullptr, 0, H5P_DEFAULT);
        if (len < 0) throw Hdf5Error("group does not keep its creation order");
        std::string name(static_cast<std::size_t>(len), '\0');
        H5Lget_name_by_idx(group, ".", H5_INDEX_CRT_ORDER, H5_ITER_INC, k, name.data(),
                           static_cast<std::size_t>(len) + 1, H5P_DEFAULT);
        names.push_back(name);
    }
    return names;
}

}  // namespace veer::hdf5
