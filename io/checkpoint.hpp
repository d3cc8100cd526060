#pragma once
/// HDF5 checkpoint of a run: the mesh, the case text, the clock and named scalars, and the solver's
/// state as named double arrays. Read back bit for bit. Layout (format version 2):
///
///   /veer                 attrs: format = "veer checkpoint", format_version, step, time
///   /veer/case_text       the case file text (variable-length UTF-8 string)
///   /veer/mesh            attrs: ni, nj, [c_wake, c_around], segment_count
///     node_x, node_y      (nj+1) x (ni+1) doubles, i fastest (node (i, j) at [j][i])
///     segment_side, segment_kind, segment_name (strings), segment_begin, segment_end (int64)
///   /veer/scalars         one double attribute per named scalar
///   /veer/state/<name>    1-D doubles, in the order given (creation order is kept)
///
/// Version 2 adds integrity checks: every dataset has an int64 attribute "checksum" (FNV-1a of
/// its values, io/hdf5_support.hpp) checked on reading, and the file is written in the HDF5 1.8
/// format or later, whose object headers carry HDF5's own checksums (attributes included).
/// Version 1 files (no checksums) are still read.
#include <cstdint>
#include <filesystem>
#include <map>
#include <string>
#include <vector>

#include "mesh/structured_grid.hpp"
#include "solver/named_array.hpp"

namespace veer {

/// The checkpoint format this build writes and the newest it reads.
inline constexpr std::int64_t checkpoint_format_version = 2;

/// Everything a restart needs.
struct CheckpointData {
    StructuredGrid grid;                    ///< nodes, C-grid layout and boundary segments
    std::string case_text;                  ///< the case file as the run read it
    std::int64_t step = 0;                  ///< time steps (or iterations) taken
    double time = 0.0;                      ///< non-dimensional time, chord / U_inf
    std::map<std::string, double> scalars;  ///< anything else named (e.g. "dt", "cl")
    std::vector<NamedArray> arrays;         ///< solver state; names unique, no '/'
};

/// Writes `data` to `path` + ".tmp", flushes it, then renames it over `path`: a crash mid-write
/// leaves the previous checkpoint in place. Throws InputError naming the file on failure.
void write_checkpoint(const std::filesystem::path& path, const CheckpointData& data);

/// Reads a checkpoint written by write_checkpoint. A missing file, a file that is not HDF5, one
/// without the /veer group, a newer format version or a damaged layout give an InputError naming
/// the file and what was expected.
CheckpointData read_checkpoint(const std::filesystem::path& path);

}  // namespace veer
