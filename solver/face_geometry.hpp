#pragma once
/// Per-face geometry of the finite-volume operators, from the grid metrics and connectivity.
///
/// For a face with area vector A (towards +i or +j) between the cells L (on the -i/-j side) and R,
/// delta = x_R - x_L joins their centroids; across a physical boundary the ghost centroid is the
/// interior centroid mirrored through the face midpoint, so delta = 2 (x_face - x_P) there. The
/// normal gradient splits as (Jasak 1996, PhD thesis, Imperial College, "over-relaxed"
/// decomposition):
///
///   grad(q) . A = ortho (q_R - q_L) + skew . grad(q)_face,  ortho = |A|^2 / (A . delta),
///   skew = A - ortho delta,
///
/// the first term implicit (compact), the second explicit (non-orthogonal correction).
#include <cstdint>
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "solver/boundary_faces.hpp"
#include "solver/connectivity.hpp"

namespace veer {

/// One family of faces (all i-faces or all j-faces), metrics layout.
struct FaceFamily {
    std::vector<Vec2> area;     ///< area vector towards +i / +j (chords)
    std::vector<Vec2> delta;    ///< x_R - x_L (chords)
    std::vector<double> ortho;  ///< |A|^2 / (A . delta) (dimensionless)
    std::vector<Vec2> skew;     ///< A - ortho delta (chords)
    std::vector<Vec2> center;   ///< face midpoint (chords)
    /// Interpolation weight of the -i/-j cell, q_f = w q_L + (1 - w) q_R, from the projections
    /// of the centroids on delta (exact for linear q along delta on stretched grids).
    std::vector<double> weight;
    std::vector<std::uint8_t> physical;            ///< 1 on physical boundary faces
    std::vector<std::uint8_t> velocity_dirichlet;  ///< 1 where the velocity is prescribed
};

/// Geometry of all faces and cells of a block.
struct FaceGeometry {
    int ni = 0;
    int nj = 0;
    std::vector<double> volume;  ///< cell areas (chords^2), ni * nj
    std::vector<Vec2> centroid;  ///< cell centroids (chords), ni * nj
    FaceFamily i_faces;          ///< (ni + 1) * nj
    FaceFamily j_faces;          ///< ni * (nj + 1)

    std::size_t cell(int i, int j) const {
        return static_cast<std::size_t>(j) * static_cast<std::size_t>(ni) +
               static_cast<std::size_t>(i);
    }
    std::size_t face_i(int fi, int j) const {
        return static_cast<std::size_t>(j) * static_cast<std::size_t>(ni + 1) +
               static_cast<std::size_t>(fi);
    }
    std::size_t face_j(int i, int fj) const {
        return static_cast<std::size_t>(fj) * static_cast<std::size_t>(ni) +
               static_cast<std::size_t>(i);
    }
};

/// Face geometry of a block; `faces` are its physical boundary faces.
FaceGeometry make_face_geometry(const GridMetrics& metrics, const Connectivity& connectivity,
                                const std::vector<BoundaryFace>& faces);

}  // namespace veer
