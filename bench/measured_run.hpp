#pragma once
/// What the steady benchmarks share: the Spalart-Allmaras benchmark case (NACA 0012, Re 6e6,
/// 384 x 128 cells: 256 on the surface, 64 along each side of the wake cut, 128 normal, first
/// cell at y+ 1, far field 100 chords) and one run of a case through the Simulation, as
/// `veer run` runs it, with its peak memory.
#include <fmt/format.h>

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <string>
#include <vector>

#include "app/mesh_pipeline.hpp"
#include "app/simulation.hpp"
#include "io/case_file.hpp"

namespace veer::bench {

/// A field of /proc/self/status in kB ("VmRSS", "VmHWM"), or -1.
inline long status_kb(const std::string& key) {
    std::ifstream in("/proc/self/status");
    for (std::string line; std::getline(in, line);)
        if (line.rfind(key + ":", 0) == 0) return std::atol(line.c_str() + key.size() + 1);
    return -1;
}

/// The benchmark case at `alpha` degrees, with `overrides` (as `--set`).
inline CaseSpec naca0012_sa_case(double alpha, const std::vector<std::string>& overrides = {}) {
    return parse_case_text(
        fmt::format("[geometry]\nnaca = \"0012\"\n[mesh]\naround = 256\nnormal = 128\nwake = 64\n"
                    "far_field = 100\ny_plus = 1.0\n[flow]\nreynolds = 6e6\nalpha = {}\n"
                    "model = \"spalart-allmaras\"\n[run]\nmode = \"steady\"\n",
                    alpha),
        "benchmark case", ".", overrides);
}

struct MeasuredRun {
    RunResult result;
    int cells = 0;
    double peak_growth_kb = 0.0;  ///< peak resident memory over the run less that before it
};

/// Meshes and runs `spec` quietly, writing into `dir` (emptied first, removed after).
inline MeasuredRun measured_run(const CaseSpec& spec, const std::filesystem::path& dir) {
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    const long rss_before_kb = status_kb("VmRSS");
    StructuredGrid grid = build_mesh(spec).grid;
    MeasuredRun m;
    m.cells = grid.cell_count();
    SimulationOptions quiet;
    quiet.progress = false;
    Simulation sim(spec, std::move(grid), dir, quiet);
    m.result = sim.run();
    m.peak_growth_kb = static_cast<double>(status_kb("VmHWM") - rss_before_kb);
    std::filesystem::remove_all(dir);
    return m;
}

}  // namespace veer::bench
