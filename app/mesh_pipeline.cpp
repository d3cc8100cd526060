#include "app/mesh_pipeline.hpp"

#include "io/coordinate_file.hpp"
#include "mesh/cgrid.hpp"
#include "mesh/circle.hpp"
#include "mesh/fold_diagnosis.hpp"
#include "mesh/naca.hpp"
#include "mesh/ogrid.hpp"
#include "mesh/section_builder.hpp"
#include "mesh/surface_sampling.hpp"
#include "mesh/wall_spacing.hpp"

namespace veer {

Section build_section(const CaseSpec& c) {
    if (c.geometry.circle) return circle_section(c.mesh.around, c.geometry.name);
    if (!c.geometry.naca.empty()) {
        return make_section(naca_outline(c.geometry.naca, c.geometry.trailing_edge),
                            c.geometry.name);
    }
    return make_section(read_coordinate_file(c.geometry.coordinates), c.geometry.name,
                        c.geometry.chord_line);
}

MeshBuild build_mesh(const CaseSpec& c) {
    MeshBuild b;
    b.section = build_section(c);
    b.spec = c.mesh;
    if (c.y_plus) b.spec.first_cell = first_cell_for_y_plus(*c.y_plus, c.flow.reynolds);
    if (c.geometry.circle) {
        b.surface = b.section.points;
        b.grid = generate_ogrid(b.surface, b.spec);
    } else {
        b.surface = sample_surface(b.section, b.spec.around, b.spec.surface_slope);
        try {
            b.grid = generate_cgrid(b.surface, b.spec);
        } catch (const GridFoldError& fold) {
            throw InputError(explain_fold(fold, b.section, b.surface, b.spec));
        }
    }
    b.quality = assess_quality(b.grid, b.spec.max_growth);
    return b;
}

}  // namespace veer
