#include "solver/cell_field.hpp"

namespace veer {

std::vector<double> CellField::interior() const {
    std::vector<double> out(static_cast<std::size_t>(m_ni) * static_cast<std::size_t>(m_nj));
    for (int j = 0; j < m_nj; ++j)
        for (int i = 0; i < m_ni; ++i)
            out[static_cast<std::size_t>(j) * static_cast<std::size_t>(m_ni) +
                static_cast<std::size_t>(i)] = (*this)(i, j);
    return out;
}

void CellField::set_interior(const std::vector<double>& values) {
    VEER_VERIFY(values.size() == static_cast<std::size_t>(m_ni) * static_cast<std::size_t>(m_nj),
                "interior values do not match the field size");
    for (int j = 0; j < m_nj; ++j)
        for (int i = 0; i < m_ni; ++i)
            (*this)(i, j) = values[static_cast<std::size_t>(j) * static_cast<std::size_t>(m_ni) +
                                   static_cast<std::size_t>(i)];
}

}  // namespace veer
