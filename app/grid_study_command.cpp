// `veer grid-study`: a case on three systematically refined grids, each figure's observed order,
// extrapolated value and GCI (postprocess/grid_convergence.hpp), and, if asked, the finest grid
// again with the far field twice as far.
#include <fmt/format.h>

#include "app/commands.hpp"
#include "app/grid_study_figures.hpp"
#include "app/grid_study_pictures.hpp"
#include "app/reader_labels.hpp"
#include "io/case_file.hpp"
#include "io/json_writer.hpp"
#include "io/output_dir.hpp"
#include "mesh/errors.hpp"

namespace veer {

int run_grid_study_command(const GridStudyOptions& o) {
    if (o.case_grid != "finest" && o.case_grid != "middle")
        throw InputError("--case-grid " + o.case_grid +
                         ": give finest (the case's grid is the finest of the three) or middle");
    const CaseSpec spec = read_case_file(o.input.case_file, o.input.overrides);
    GridStudyResult r;
    r.plan = plan_grid_study(spec, o.ratio,
                             o.case_grid == "finest" ? CaseGridRole::finest : CaseGridRole::middle,
                             o.far_boundary, o.scale_surface_slope);
    const FolderLock lock = prepare_output_dir(o.out_dir, spec.text, o.force);
    for (const StudyGrid& g : r.plan.grids)
        r.runs.push_back(run_study_grid(o.input, g, o.out_dir / g.name, o.force, o.quiet));
    if (r.plan.far_boundary)
        r.far_boundary = run_study_grid(o.input, *r.plan.far_boundary,
                                        o.out_dir / r.plan.far_boundary->name, o.force, o.quiet);
    r.figures = study_figures(r.runs, r.far_boundary);
    const nlohmann::json study = grid_study_json(r);
    write_json_file(o.out_dir / "grid_study.json", study);
    const PictureSet pictures = draw_grid_study_pictures(o.out_dir, study);
    print_grid_study_table(r);
    fmt::print("written: {} and {} pictures in {}\n", (o.out_dir / "grid_study.json").string(),
               pictures.pictures.size(), (o.out_dir / "pictures").string());
    for (const StudyRun& run : r.runs)
        if (!run.converged()) {
            fmt::print(stderr,
                       "veer: the {} grid's run in {} did not converge; its figures make the "
                       "estimate unreliable (raise [run] steps and run the same command again)\n",
                       run.grid.name, run.dir.string());
            return 1;
        }
    return 0;
}

}  // namespace veer
