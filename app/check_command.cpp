// `veer check CASE`: validate a case (keys, values, geometry, grid spec) without running it.
#include <fmt/format.h>

#include "app/commands.hpp"
#include "app/mesh_pipeline.hpp"
#include "app/reader_labels.hpp"
#include "app/section_notes.hpp"
#include "app/simulation.hpp"
#include "io/case_choices.hpp"
#include "io/case_file.hpp"
#include "mesh/cgrid.hpp"

namespace veer {

int run_check_command(const CaseOptions& options) {
    const CaseSpec c = read_case_file(options.case_file, options.overrides);
    const MeshBuild mesh = build_mesh(c);  // geometry and grid are checked by building them
    // What `veer run` sets up before its first step (solver settings, the model, the places of
    // the analysis), with its checks: a case passes here only if a run of it would start.
    SimulationOptions quiet;
    quiet.progress = false;
    const Simulation setup(c, mesh.grid, {}, quiet);
    fmt::print("{}: valid case\n", c.path.string());
    fmt::print("  section        {} ({} outline points)\n", mesh.section.name,
               mesh.section.points.size());
    if (c.geometry.circle)
        fmt::print(
            "  grid           {}, far field {} diameters, first cell {:.3g} diameters; lengths, "
            "Re and coefficients on the diameter\n",
            grid_words(mesh.spec, true, mesh.grid.ni(), mesh.grid.nj()), mesh.spec.far_field,
            mesh.spec.first_cell);
    else {
        print_section_notes(mesh.section, 15);
        fmt::print("  grid           {}, far field {} chords, first cell {:.3g} chords\n",
                   grid_words(mesh.spec, false, mesh.grid.ni(), mesh.grid.nj()),
                   mesh.spec.far_field, mesh.spec.first_cell);
    }
    fmt::print("  flow           Re {:g}, alpha {:g} deg, {}\n", c.flow.reynolds, c.flow.alpha_deg,
               c.model.name);
    fmt::print(
        "  run            {} (cap {} steps{}{})\n", mode_word(c.run.mode), c.run.steps,
        c.run.mode == TimeMode::time_accurate ? fmt::format(", end time {:g}", c.run.end_time) : "",
        c.run.start_spin > 0 ? fmt::format(", start spin {:g}", c.run.start_spin) : "");
    for (const std::string& w : mesh.quality.warnings) fmt::print("  warning        {}\n", w);
    return 0;
}

}  // namespace veer
