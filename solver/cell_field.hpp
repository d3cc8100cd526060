#pragma once
/// Cell-centred scalar fields with ghost cells, and non-owning views of them.
///
/// A CellField of ni x nj interior cells stores (ni + 2g) x (nj + 2g) values, g = ghost_width, i
/// fastest. Interior cells are (0..ni-1, 0..nj-1); ghost cells have i or j in [-g, 0) or
/// [n, n + g). Ghosts are written only by the ghost-filling routines (boundary_ghosts.hpp,
/// connectivity.hpp), so that every stencil reads neighbours the same way everywhere.
#include <cstddef>
#include <vector>

#include "mesh/errors.hpp"

namespace veer {

/// Two ghost layers: the limited upwind-biased face value reads two cells upstream.
inline constexpr int ghost_width = 2;

/// Non-owning view of a field with ghosts (bounds-checked in Debug builds).
class CellView {
public:
    CellView() = default;
    CellView(double* origin, int ni, int nj, int stride)
        : m_origin(origin), m_ni(ni), m_nj(nj), m_stride(stride) {}

    double& operator()(int i, int j) const {
        VEER_ASSERT(i >= -ghost_width && i < m_ni + ghost_width && j >= -ghost_width &&
                        j < m_nj + ghost_width,
                    "cell index out of range");
        return m_origin[static_cast<std::ptrdiff_t>(j) * m_stride + i];
    }
    int ni() const { return m_ni; }
    int nj() const { return m_nj; }

private:
    double* m_origin = nullptr;  ///< address of cell (0, 0)
    int m_ni = 0;
    int m_nj = 0;
    int m_stride = 0;
};

/// Owning cell-centred field with ghost_width ghost layers on every side.
class CellField {
public:
    CellField() = default;
    CellField(int ni, int nj, double value = 0.0)
        : m_ni(ni),
          m_nj(nj),
          m_values(static_cast<std::size_t>(ni + 2 * ghost_width) *
                       static_cast<std::size_t>(nj + 2 * ghost_width),
                   value) {}

    int ni() const { return m_ni; }
    int nj() const { return m_nj; }

    double& operator()(int i, int j) { return m_values[index(i, j)]; }
    double operator()(int i, int j) const { return m_values[index(i, j)]; }

    CellView view() {
        return CellView(m_values.data() + index(0, 0), m_ni, m_nj, m_ni + 2 * ghost_width);
    }

    /// Interior values, ni * nj, i fastest (no ghosts).
    std::vector<double> interior() const;
    /// Sets the interior from ni * nj values, i fastest; ghosts are left as they are.
    void set_interior(const std::vector<double>& values);

private:
    std::size_t index(int i, int j) const {
        VEER_ASSERT(i >= -ghost_width && i < m_ni + ghost_width && j >= -ghost_width &&
                        j < m_nj + ghost_width,
                    "cell index out of range");
        return static_cast<std::size_t>(j + ghost_width) *
                   static_cast<std::size_t>(m_ni + 2 * ghost_width) +
               static_cast<std::size_t>(i + ghost_width);
    }

    int m_ni = 0;
    int m_nj = 0;
    std::vector<double> m_values;
};

/// Velocity: two scalar fields sharing the ghost rules (vectors are copied unchanged across the
/// wake cut and periodic sides).
struct VelocityField {
    CellField u;
    CellField v;
    VelocityField() = default;
    VelocityField(int ni, int nj) : u(ni, nj), v(ni, nj) {}
};

}  // namespace veer
