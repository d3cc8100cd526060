#pragma once
/// Geometry -> surface nodes -> C-grid (O-grid for the circle), as a case file asks for it.
#include <vector>

#include "io/case_spec.hpp"
#include "mesh/grid_quality.hpp"
#include "mesh/section.hpp"
#include "mesh/structured_grid.hpp"

namespace veer {

struct MeshBuild {
    Section section;            ///< normalised outline (unit chord, sharp trailing edge)
    std::vector<Vec2> surface;  ///< around + 1 wall nodes, TE -> lower -> LE -> upper -> TE
    CGridSpec spec;             ///< the spec used (first cell resolved from y_plus if asked)
    StructuredGrid grid;
    GridQuality quality;
};

/// The section of a case: a NACA designation, a coordinate file or the circle, validated and
/// normalised.
Section build_section(const CaseSpec& c);

/// The whole mesh of a case. Throws InputError when the geometry or the grid cannot be made.
MeshBuild build_mesh(const CaseSpec& c);

}  // namespace veer
