// `veer mesh CASE -o DIR`: the C-grid (O-grid for the circle) of a case as VTK files, its quality
// figures as JSON and a short table.
#include <fmt/format.h>

#include <nlohmann/json.hpp>

#include "app/commands.hpp"
#include "app/mesh_pipeline.hpp"
#include "app/reader_labels.hpp"
#include "app/section_notes.hpp"
#include "io/case_file.hpp"
#include "io/json_writer.hpp"
#include "io/output_dir.hpp"
#include "io/vtk_grid_writer.hpp"
#include "mesh/grid_metrics.hpp"

namespace veer {

namespace {

bool o_grid(const MeshBuild& m) { return m.grid.c_layout() && m.grid.c_layout()->closed(); }

}  // namespace

nlohmann::json mesh_report_json(const MeshBuild& m) {
    const GridQuality& q = m.quality;
    nlohmann::json j = {
        {"grid", o_grid(m) ? "O-grid" : "C-grid"},
        {"reference_length", o_grid(m) ? "diameter" : "chord"},
        {"section", m.section.name},
        {"source_trailing_edge_gap", m.section.closure.gap},
        {"around", m.spec.around},
        {"normal", m.spec.normal},
        {"wake", m.spec.wake},
        {"far_field_requested", m.spec.far_field},
        {"first_cell_requested", m.spec.first_cell},
        {"max_growth_allowed", m.spec.max_growth},
        {"ni", q.ni},
        {"nj", q.nj},
        {"cells", q.cell_count},
        {"nodes", (q.ni + 1) * (q.nj + 1)},
        {"min_cell_area", q.min_cell_area},
        {"wall_non_orthogonality_deg", q.wall_non_orthogonality},
        {"trailing_edge_non_orthogonality_deg", q.trailing_edge_non_orthogonality},
        {"max_aspect_ratio", q.max_aspect_ratio},
        {"max_growth_ratio", q.max_growth_ratio},
        {"first_cell_min", q.first_cell_min},
        {"first_cell_median", q.first_cell_median},
        {"first_cell_max", q.first_cell_max},
        {"far_field_distance", q.far_field_distance},
        {"warnings", q.warnings},
        {"section_placement", section_placement_json(m.section)},
    };
    if (o_grid(m)) {  // no wake cut, no trailing edge
        j.erase("wake");
        j.erase("trailing_edge_non_orthogonality_deg");
        j.erase("source_trailing_edge_gap");
        j.erase("section_placement");
    }
    return j;
}

void print_mesh_table(const MeshBuild& m) {
    const GridQuality& q = m.quality;
    const bool o = o_grid(m);
    const char* unit = o ? "diameters" : "chords";
    fmt::print("{} of {}\n", o ? "O-grid" : "C-grid", m.section.name);
    if (!o) print_section_notes(m.section, 25);
    if (o)
        fmt::print(
            "  cells                    {} x {} = {} (around {}, periodic behind the rear "
            "point)\n",
            q.ni, q.nj, q.cell_count, m.spec.around);
    else
        fmt::print("  cells                    {}: {} in all\n",
                   grid_words(m.spec, false, q.ni, q.nj), q.cell_count);
    fmt::print("  smallest cell area       {:.3e} {}^2 (positive everywhere)\n", q.min_cell_area,
               unit);
    if (o)
        fmt::print("  wall non-orthogonality   {:.2f} deg\n", q.wall_non_orthogonality);
    else
        fmt::print("  wall non-orthogonality   {:.2f} deg (trailing edge {:.2f} deg)\n",
                   q.wall_non_orthogonality, q.trailing_edge_non_orthogonality);
    fmt::print("  first cell height        {:.4e} {} (requested {:.4e}; min {:.4e}, max {:.4e})\n",
               q.first_cell_median, unit, m.spec.first_cell, q.first_cell_min, q.first_cell_max);
    fmt::print("  growth ratio             {:.4f} (cap {:.2f})\n", q.max_growth_ratio,
               m.spec.max_growth);
    fmt::print("  aspect ratio             {:.3g} (largest)\n", q.max_aspect_ratio);
    fmt::print("  far field                {:.2f} {} (requested {:g})\n", q.far_field_distance,
               unit, m.spec.far_field);
    for (const std::string& w : q.warnings) fmt::print("  warning: {}\n", w);
}

void write_mesh_files(const std::filesystem::path& dir, const MeshBuild& m) {
    const GridMetrics metrics = compute_metrics(m.grid);
    write_grid_vts(dir / "mesh.vts", m.grid, {{"cell_area", 1, &metrics.volume}});
    write_surface_vtp(dir / "surface.vtp", m.surface);
    write_json_file(dir / "mesh.json", mesh_report_json(m));
}

int run_mesh_command(const MeshOptions& o) {
    const CaseSpec spec = read_case_file(o.input.case_file, o.input.overrides);
    const MeshBuild mesh = build_mesh(spec);
    const FolderLock lock = prepare_output_dir(o.out_dir, spec.text, o.force);
    write_mesh_files(o.out_dir, mesh);
    print_mesh_table(mesh);
    fmt::print("wrote {}/mesh.vts, surface.vtp, mesh.json\n", o.out_dir.string());
    return 0;
}

}  // namespace veer
