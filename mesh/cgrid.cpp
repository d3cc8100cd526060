#include "mesh/cgrid.hpp"

#include <cmath>
#include <sstream>

#include "mesh/errors.hpp"
#include "mesh/face_order.hpp"
#include "mesh/geometric_stretching.hpp"
#include "mesh/grid_metrics.hpp"
#include "mesh/normal_marching.hpp"
#include "mesh/wake_cut.hpp"
#include "mesh/wake_spacing.hpp"

namespace veer {
namespace {

[[noreturn]] void bad_value(const char* key, double value, const char* allowed) {
    std::ostringstream out;
    out << "mesh: " << key << " = " << value << " is out of range; allowed: " << allowed;
    throw InputError(out.str());
}

void fill_segments(StructuredGrid& grid, int wake, int around) {
    const int ni = grid.ni(), nj = grid.nj();
    grid.segments() = {
        {Side::j_min, 0, wake, SegmentKind::wake_cut, "wake_cut_lower"},
        {Side::j_min, wake, wake + around, SegmentKind::wall, "wall"},
        {Side::j_min, wake + around, ni, SegmentKind::wake_cut, "wake_cut_upper"},
        {Side::i_min, 0, nj, SegmentKind::outflow, "outflow_lower"},
        {Side::i_max, 0, nj, SegmentKind::outflow, "outflow_upper"},
        {Side::j_max, 0, ni, SegmentKind::far_field, "far_field"},
    };
    grid.c_layout() = CGridLayout{wake, around};
}

/// Which part of the C-grid column i belongs to: above the wake cut, or off which surface.
std::string region_of_column(int i, const CGridSpec& spec) {
    const int i_surface = i - spec.wake;
    if (i_surface < 0 || i_surface >= spec.around) return "above the wake cut";
    return std::string("off the ") + (i_surface < spec.around / 2 ? "lower" : "upper") + " surface";
}

/// Where a fold lies, in words a user can act on.
std::string describe_fold(const MarchOutcome& fold, const CGridSpec& spec) {
    std::ostringstream out;
    out << "mesh: the C-grid folds at cell (" << fold.i << ", " << fold.j << ") near ("
        << fold.where.x << ", " << fold.where.y << "), " << region_of_column(fold.i, spec);
    out << "; use more normal cells (normal = " << spec.normal << "), a smaller first_cell ("
        << spec.first_cell << "), a smaller far_field (" << spec.far_field
        << ") or more cells around a sharply curved section";
    return out.str();
}

/// Where a backward face lies (face_order.hpp), in words a user can act on (one short line).
std::string describe_backward_face(const BackwardFace& face, const CGridSpec& spec) {
    std::ostringstream out;
    out.precision(4);
    out << "mesh: cells at (" << face.i << ", " << face.j << ") near (" << face.where.x << ", "
        << face.where.y << "), " << (face.j >= spec.normal * 3 / 4 ? "by the far field " : "")
        << region_of_column(face.i, spec)
        << ", are too sheared: their centres lie on the wrong sides of a face; use more wake cells "
           "(wake = "
        << spec.wake << "), more normal cells (" << spec.normal << ") or fewer around ("
        << spec.around << ")";
    return out.str();
}

}  // namespace

void check_wall_nodes(const std::vector<Vec2>& surface, int around) {
    if (static_cast<int>(surface.size()) != around + 1) {
        std::ostringstream out;
        out << "mesh: around = " << around << " needs " << around + 1 << " surface nodes, got "
            << surface.size();
        throw InputError(out.str());
    }
    if (norm(surface.front() - surface.back()) > 1e-12)
        throw InputError(
            "mesh: the surface nodes must start and end at the same point (the trailing edge, "
            "or the circle's rear point)");
}

void validate_cgrid_spec(const CGridSpec& spec) {
    if (spec.around < 16 || spec.around > 16384 || spec.around % 2 != 0)
        bad_value("around", spec.around, "an even integer in [16, 16384]");
    if (spec.normal < 4 || spec.normal > 4096) bad_value("normal", spec.normal, "[4, 4096]");
    if (spec.wake < 2 || spec.wake > 8192) bad_value("wake", spec.wake, "[2, 8192]");
    if (!(spec.far_field >= 2.0 && spec.far_field <= 1000.0))
        bad_value("far_field", spec.far_field, "[2, 1000] chords");
    if (!(spec.first_cell > 0.0 && spec.first_cell <= 0.05))
        bad_value("first_cell", spec.first_cell, "(0, 0.05] chords");
    if (spec.first_cell * spec.normal >= spec.far_field)
        bad_value("first_cell", spec.first_cell,
                  "first_cell * normal below far_field (the cells must grow away from the wall)");
    if (!(spec.max_growth > 1.0 && spec.max_growth < 10.0))
        bad_value("max_growth", spec.max_growth, "(1, 10)");
}

double normal_growth_ratio(const CGridSpec& spec) {
    return geometric_ratio(spec.first_cell, spec.far_field, spec.normal);
}

int normal_cells_for_growth(double first_cell, double far_field, double max_growth) {
    VEER_VERIFY(first_cell > 0.0 && far_field > first_cell && max_growth > 1.0,
                "normal_cells_for_growth needs growth and a far field beyond the first cell");
    // first_cell * (q^n - 1) / (q - 1) >= far_field  <=>  n >= log(1 + D (q-1) / h) / log q.
    const double n = std::log1p(far_field * (max_growth - 1.0) / first_cell) / std::log(max_growth);
    return static_cast<int>(std::ceil(n - 1e-9));
}

StructuredGrid generate_cgrid(const std::vector<Vec2>& surface, const CGridSpec& spec) {
    validate_cgrid_spec(spec);
    check_wall_nodes(surface, spec.around);
    const std::vector<Vec2> wall = build_wall_line(surface, spec.wake, spec.far_field);
    StructuredGrid grid(2 * spec.wake + spec.around, spec.normal);
    for (int i = 0; i <= grid.ni(); ++i) grid.node(i, 0) = wall[static_cast<std::size_t>(i)];
    MarchPlan plan{spec.wake, spec.around,
                   geometric_steps(spec.first_cell, spec.far_field, spec.normal)};
    const MarchOutcome outcome = march_layers(grid, plan);
    if (outcome.folded) {
        double reached = 0.0;
        for (int j = 0; j <= outcome.j; ++j) reached += plan.steps[static_cast<std::size_t>(j)];
        throw GridFoldError(describe_fold(outcome, spec), outcome, reached);
    }
    open_wake_spacing(grid, spec.wake, spec.first_cell, spec.wake_aspect);
    fill_segments(grid, spec.wake, spec.around);
    if (const auto face = find_backward_face(compute_metrics(grid)))
        throw InputError(describe_backward_face(*face, spec));
    return grid;
}

}  // namespace veer
