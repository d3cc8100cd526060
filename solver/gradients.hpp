#pragma once
/// Cell-centred gradients by the Green-Gauss theorem with face values averaged from the two
/// cells (ghosts included, so boundary conditions enter through the ghosts).
#include "solver/cell_field.hpp"
#include "solver/face_geometry.hpp"

namespace veer {

/// grad q at the interior cells into (gx, gy), per unit length; q's ghosts must be filled.
void green_gauss_gradient(const FaceGeometry& g, CellView q, CellView gx, CellView gy);

}  // namespace veer
