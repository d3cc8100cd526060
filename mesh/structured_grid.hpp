#pragma once
/// Node coordinates of one structured block and the named segments of its boundary.
///
/// Cells are ni x nj, nodes (ni+1) x (nj+1), i contiguous in memory. Cell (i, j) has corner nodes
/// (i, j), (i+1, j), (i+1, j+1), (i, j+1), counter-clockwise for a right-handed grid.
#include <optional>
#include <string>
#include <vector>

#include "mesh/errors.hpp"
#include "mesh/vec2.hpp"

namespace veer {

/// The four sides of a block, in index space.
enum class Side { i_min, i_max, j_min, j_max };

/// What a stretch of boundary is, physically; the solver maps each kind to its conditions.
enum class SegmentKind {
    wall,       ///< solid surface (no-slip)
    wake_cut,   ///< C-grid cut: connectivity to the mirrored cells across j = 0, not a boundary
    far_field,  ///< free stream: inflow where the flow enters, outflow where it leaves
    outflow,    ///< downstream outlet of the wake
    periodic,   ///< connected to the opposite side of the block
};

/// A run of boundary faces [begin, end) along one side (face index along that side).
struct BoundarySegment {
    Side side = Side::j_min;
    int begin = 0;
    int end = 0;
    SegmentKind kind = SegmentKind::wall;
    std::string name;  ///< e.g. "wall", "wake_cut", "far_field", "outflow_lower"
};

/// Where the C-grid's pieces lie along j = 0 (cell counts). ni = 2 * wake + around; the wake cut
/// pairs cell i with ni - 1 - i for i < wake and i >= wake + around. wake = 0 is an O-grid
/// (mesh/ogrid.hpp): the section's block closed on itself, periodic in i, with no wake cut.
struct CGridLayout {
    int wake = 0;
    int around = 0;
    /// An O-grid: the wall runs all the way round and the i sides are joined.
    bool closed() const { return wake == 0; }
};

/// Node coordinates and boundary description of a single structured block.
class StructuredGrid {
public:
    StructuredGrid() = default;
    /// A block of ni x nj cells, nodes at the origin until set.
    StructuredGrid(int ni, int nj)
        : m_ni(ni), m_nj(nj), m_nodes(static_cast<std::size_t>(ni + 1) * (nj + 1)) {
        VEER_VERIFY(ni > 0 && nj > 0, "a grid needs at least one cell each way");
    }

    int ni() const { return m_ni; }  ///< cells along i
    int nj() const { return m_nj; }  ///< cells along j
    int cell_count() const { return m_ni * m_nj; }

    Vec2& node(int i, int j) { return m_nodes[index(i, j)]; }
    const Vec2& node(int i, int j) const { return m_nodes[index(i, j)]; }
    const std::vector<Vec2>& nodes() const { return m_nodes; }

    std::vector<BoundarySegment>& segments() { return m_segments; }
    const std::vector<BoundarySegment>& segments() const { return m_segments; }

    /// Set for C- and O-grids around a section; empty for the verification blocks.
    std::optional<CGridLayout>& c_layout() { return m_c_layout; }
    const std::optional<CGridLayout>& c_layout() const { return m_c_layout; }

private:
    std::size_t index(int i, int j) const {
        VEER_ASSERT(i >= 0 && i <= m_ni && j >= 0 && j <= m_nj, "node index out of range");
        return static_cast<std::size_t>(j) * static_cast<std::size_t>(m_ni + 1) +
               static_cast<std::size_t>(i);
    }

    int m_ni = 0;
    int m_nj = 0;
    std::vector<Vec2> m_nodes;
    std::vector<BoundarySegment> m_segments;
    std::optional<CGridLayout> m_c_layout;
};

}  // namespace veer
