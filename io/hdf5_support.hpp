#pragma once
/// Thin RAII and read/write helpers over the HDF5 C API, for veer's checkpoint file only.
/// Failures throw Hdf5Error with a short description (the caller adds the file name).
#include <hdf5.h>

#include <cstdint>
#include <optional>
#include <stdexcept>
#include <string>
#include <vector>

namespace veer::hdf5 {

/// An HDF5 call failed or an expected object is missing; what() says which object.
class Hdf5Error : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

/// Owns an HDF5 identifier and closes it with the matching close function.
class Handle {
public:
    using Closer = herr_t (*)(hid_t);
    Handle(hid_t id, Closer closer, const std::string& what);
    ~Handle();
    Handle(const Handle&) = delete;
    Handle& operator=(const Handle&) = delete;
    Handle(Handle&& other) noexcept : m_id(other.m_id), m_closer(other.m_closer) {
        other.m_id = -1;
    }
    Handle& operator=(Handle&&) = delete;
    hid_t get() const { return m_id; }
    /// Closes now, reporting failure (a file close is where buffered data reaches the disk).
    void close(const std::string& what);

private:
    hid_t m_id;
    Closer m_closer;
};

/// Turns off HDF5's automatic printing of error stacks for its lifetime (libraries never print);
/// restores the previous handler afterwards.
class SilenceErrors {
public:
    SilenceErrors();
    ~SilenceErrors();
    SilenceErrors(const SilenceErrors&) = delete;
    SilenceErrors& operator=(const SilenceErrors&) = delete;

private:
    H5E_auto2_t m_func = nullptr;
    void* m_data = nullptr;
};

/// Every dataset written through these helpers carries an attribute "checksum": the 64-bit FNV-1a
/// hash of its values (doubles and integers as little-endian bytes, strings as their bytes each
/// after its length). The read helpers recompute it and throw Hdf5Error naming the dataset when
/// it differs. FNV-1a maps any change of a single byte to a different hash (each step is a
/// bijection of the running hash), so one flipped bit in the data is always found.
inline constexpr const char* checksum_attribute = "checksum";

/// While one is alive, reading a dataset without a checksum attribute is an error (files of a
/// format that always writes them); otherwise such a dataset is read unchecked (older files).
class RequireChecksums {
public:
    RequireChecksums();
    ~RequireChecksums();
    RequireChecksums(const RequireChecksums&) = delete;
    RequireChecksums& operator=(const RequireChecksums&) = delete;

private:
    bool m_previous;
};

/// File access properties for new files: object headers and the superblock of the 1.8 format and
/// later carry HDF5's own metadata checksums, so a flipped byte in an attribute is found too.
/// Closes strongly, as strict_file_access.
Handle checksummed_file_access();

/// File access properties that close every object of the file with the file ("strong" close):
/// after a failed read or write nothing of the file stays open, which otherwise left HDF5 looping
/// or crashing in its clean-up at exit.
Handle strict_file_access();

Handle create_group(hid_t parent, const std::string& name, bool track_order = false);
/// Opens an existing group; Hdf5Error naming it when missing.
Handle open_group(hid_t parent, const std::string& name);
bool has_link(hid_t parent, const std::string& name);
bool has_attribute(hid_t object, const std::string& name);

void write_attribute(hid_t object, const std::string& name, const std::string& value);
void write_attribute(hid_t object, const std::string& name, std::int64_t value);
void write_attribute(hid_t object, const std::string& name, double value);
std::string read_string_attribute(hid_t object, const std::string& name);
std::int64_t read_int_attribute(hid_t object, const std::string& name);
double read_double_attribute(hid_t object, const std::string& name);
/// Names of every attribute of `object`, in name order.
std::vector<std::string> attribute_names(hid_t object);

/// Doubles with the given shape (row-major, last dimension fastest), stored as IEEE 64-bit LE.
void write_doubles(hid_t parent, const std::string& name, const std::vector<double>& values,
                   const std::vector<hsize_t>& dims);
/// All values of a double dataset (any rank), flattened; `dims` receives the shape if given.
std::vector<double> read_doubles(hid_t parent, const std::string& name,
                                 std::vector<hsize_t>* dims = nullptr);
void write_ints(hid_t parent, const std::string& name, const std::vector<std::int64_t>& values);
std::vector<std::int64_t> read_ints(hid_t parent, const std::string& name);
/// Variable-length UTF-8 strings: one (a scalar dataset) or a 1-D list.
void write_string(hid_t parent, const std::string& name, const std::string& value);
std::string read_string(hid_t parent, const std::string& name);
void write_strings(hid_t parent, const std::string& name, const std::vector<std::string>& values);
std::vector<std::string> read_strings(hid_t parent, const std::string& name);
/// Names of the links of a group in creation order (the group must track it).
std::vector<std::string> link_names_in_creation_order(hid_t group);

}  // namespace veer::hdf5
