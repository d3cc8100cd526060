#pragma once
/// A flow frame read back for pictures: the nodes of the grid and the cell values of velocity
/// and Cp, from a fields_NNNNNN.vts frame (io/field_series.hpp) or the last frame a fields.pvd
/// lists.
#include <filesystem>
#include <vector>

namespace veer {

struct FlowFrame {
    int ni = 0, nj = 0;                  ///< cells
    std::vector<double> node_x, node_y;  ///< (ni+1) x (nj+1), i fastest
    std::vector<double> u, v, cp;        ///< ni x nj cell values, i fastest
    double node_xv(int i, int j) const {
        return node_x[static_cast<std::size_t>(j * (ni + 1) + i)];
    }
    double node_yv(int i, int j) const {
        return node_y[static_cast<std::size_t>(j * (ni + 1) + i)];
    }
};

/// Reads a frame. Throws InputError naming the file when it is missing, not a structured grid,
/// or lacks the cell arrays "velocity" and "Cp".
FlowFrame read_flow_frame(const std::filesystem::path& vts);

/// The file of the last frame a fields.pvd lists. Throws InputError when it lists none.
std::filesystem::path last_frame_file(const std::filesystem::path& pvd);

}  // namespace veer
