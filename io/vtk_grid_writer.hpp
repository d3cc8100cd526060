#pragma once
/// VTK XML outputs that ParaView opens directly: the structured grid with cell and point arrays
/// (.vts) and the wall as poly lines with point arrays (.vtp). Appended raw binary,
/// zlib-compressed, 64-bit headers, Float64 throughout (values read back bit for bit). Each file is
/// written to a temporary name and renamed into place, so a reader never sees half a file.
#include <cstddef>
#include <filesystem>
#include <optional>
#include <string>
#include <vector>

#include "mesh/structured_grid.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// A named array to attach to a VTK dataset, by reference (not owned; must outlive the call).
/// `components`: 1 = scalar (n values); 2 = planar vector, interleaved (x0, y0, x1, y1, ...),
/// written as a 3-component vector with z = 0 so ParaView's vector filters (stream tracer, glyphs)
/// accept it; 3 = vector interleaved (x, y, z). n is the number of cells or points.
struct DataArrayView {
    std::string name;
    int components = 1;
    const std::vector<double>* values = nullptr;
};
using CellArray = DataArrayView;   ///< one value (or vector) per cell, i fastest: ni * nj
using PointArray = DataArrayView;  ///< one value (or vector) per node/point

/// Writes `grid` as a VTK XML structured grid: points (ni+1) x (nj+1) x 1 at z = 0, i fastest, so
/// VTK's cell (i, j) is veer's cell (i, j). `time`, if given, is stored as the field-data array
/// "TimeValue" (ParaView shows it as the frame time). Array sizes are checked (VEER_VERIFY).
/// Throws InputError naming `path` if the file cannot be written.
void write_grid_vts(const std::filesystem::path& path, const StructuredGrid& grid,
                    const std::vector<CellArray>& cell_arrays = {},
                    const std::vector<PointArray>& point_arrays = {},
                    std::optional<double> time = std::nullopt);

/// Writes points along the wall (chord units, z = 0) as VTK poly data made of poly lines, with one
/// value (or vector) per point in each array (e.g. Cp, Cf at wall-face centres). `line_starts`
/// holds the first point of each poly line (0 first, increasing; each line >= 2 points); empty
/// means one line through all points. Throws InputError naming `path` if it cannot be written.
void write_surface_vtp(const std::filesystem::path& path, const std::vector<Vec2>& points,
                       const std::vector<PointArray>& point_arrays = {},
                       const std::vector<std::size_t>& line_starts = {});

/// Interleaves two component arrays into the 3-component form (x, y, 0) ready for a
/// DataArrayView with components = 3.
std::vector<double> interleave_xy0(const std::vector<double>& x, const std::vector<double>& y);

}  // namespace veer
