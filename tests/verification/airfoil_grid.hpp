#pragma once
/// NACA 0012 C-grids for the verification tests (the library's own generator).
#include "mesh/cgrid.hpp"
#include "mesh/naca.hpp"
#include "mesh/section_builder.hpp"
#include "mesh/surface_sampling.hpp"

namespace veer::test {

inline StructuredGrid naca0012_cgrid(int around, int normal, int wake, double far_field,
                                     double first_cell) {
    const Section section = make_section(naca_outline("0012", TrailingEdge::closed), "naca0012");
    CGridSpec spec;
    spec.around = around;
    spec.normal = normal;
    spec.wake = wake;
    spec.far_field = far_field;
    spec.first_cell = first_cell;
    return generate_cgrid(sample_surface(section, around), spec);
}

}  // namespace veer::test
