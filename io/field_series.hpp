#pragma once
/// A time series of flow fields for ParaView: frames DIR/fields_NNNNNN.vts (cell data) and the
/// collection DIR/fields.pvd listing each frame with its time. The .pvd is rewritten whole
/// (temporary file + rename) after every frame, so it always lists complete frames only; a
/// restarted run resumes the list instead of losing the earlier frames.
#include <filesystem>
#include <string>
#include <vector>

#include "io/vtk_grid_writer.hpp"
#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// One listed frame: its time (chord / U_inf) and its file name relative to the series folder.
struct SeriesFrame {
    double time = 0.0;
    std::string file;
};

/// Whether a series starts empty or continues the frames already listed in DIR/fields.pvd.
enum class SeriesStart { fresh, resume };

class FieldSeries {
public:
    /// The series in `dir` (created if missing). `resume` reads the existing fields.pvd (if any)
    /// and throws InputError naming it when it is not a collection file; `fresh` removes the
    /// frames an earlier series in `dir` listed (veer's own frame files only, so a viewer never
    /// mixes two runs) and the old list; a list that is not a collection file is left alone.
    FieldSeries(std::filesystem::path dir, SeriesStart start);

    /// Forgets listed frames later than `time`, e.g. those a crashed run wrote after the
    /// checkpoint it restarts from (their files are overwritten by the next frames).
    void discard_after(double time);

    /// Writes frame fields_NNNNNN.vts (NNNNNN = one more than the highest number listed) with cell
    /// arrays velocity (u, v, 0), pressure (p - p_inf), Cp = 2 (p - p_inf) (rho = U_inf = 1),
    /// vorticity (Green-Gauss, postprocess/vorticity.hpp), eddy_viscosity when `flow` holds it,
    /// the model's fields under their names, then `extra` (ni * nj values each); then rewrites
    /// fields.pvd. Frames
    /// listed at or after `time` are dropped first, so the list stays increasing in time.
    /// Returns the frame's path.
    std::filesystem::path write_frame(double time, const StructuredGrid& grid,
                                      const GridMetrics& metrics, const FlowFields& flow,
                                      const std::vector<CellArray>& extra = {});

    const std::vector<SeriesFrame>& frames() const { return m_frames; }
    std::filesystem::path pvd_path() const { return m_dir / "fields.pvd"; }

private:
    void write_pvd() const;
    int next_number() const;

    std::filesystem::path m_dir;
    std::vector<SeriesFrame> m_frames;
};

/// Parses a .pvd collection file into its frames (in file order). Throws InputError naming the
/// file when it cannot be read or holds no <Collection> element or a bad timestep value.
std::vector<SeriesFrame> read_pvd(const std::filesystem::path& path);

}  // namespace veer
