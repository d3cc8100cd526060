// A block of sweep points on one process (app/sweep_block.hpp).
#include "app/sweep_block.hpp"

#include <fmt/format.h>

#include <chrono>
#include <cstdio>

#include "app/progress_line.hpp"
#include "app/reader_labels.hpp"
#include "app/sweep_angles.hpp"

namespace veer {
namespace {
namespace fs = std::filesystem;

void say_point(const PointRecord& r, std::size_t k, std::size_t count, bool reused) {
    const std::string steady =
        r.cl_steady ? fmt::format("; converged steady Cl {:.5f}", *r.cl_steady) : std::string();
    const std::string contour = r.cl_momentum && r.contour_distance
                                    ? fmt::format("; Cl {:.5f} by the {}", *r.cl_momentum,
                                                  control_volume_label(*r.contour_distance, false))
                                    : std::string();
    fmt::print(
        "point {}/{} alpha {:+.2f} deg: {}{}, surface Cl {:.5f} Cd {:.5f} Cm {:.5f} ({}{}){}{} ({} "
        "iterations, {:.1f} s)\n",
        k + 1, count, r.alpha, r.regime, reused ? " (done earlier)" : "", r.cl, r.cd, r.cm,
        r.cl_basis, steady, contour,
        r.strouhal ? fmt::format(", St {:.4f}", *r.strouhal) : std::string(), r.iterations,
        r.wall_seconds);
    std::fflush(stdout);
}

}  // namespace

BlockResult run_block(const SweepOptions& o, const SweepCase& sweep,
                      const std::vector<double>& angles, const std::vector<std::size_t>& mine,
                      const StructuredGrid& grid, std::optional<FlowFields> first_start) {
    BlockResult b;
    std::vector<CaseSpec> specs;  // each point's case, derived once from the text read once
    specs.reserve(mine.size());
    for (std::size_t k : mine) specs.push_back(point_case(sweep, angles[k]));
    std::optional<FlowFields> previous = std::move(first_start);  // the next point starts from
    const auto start = std::chrono::steady_clock::now();
    int ran = 0;
    for (std::size_t n = 0; n < mine.size(); ++n) {
        const std::size_t k = mine[n];
        const fs::path dir = o.out_dir / point_folder_name(angles[k]);
        if (std::optional<PointRecord> done = finished_point(dir, specs[n].text)) {
            say_point(*done, k, angles.size(), true);
            previous.reset();
            const bool next_needs_it =
                n + 1 < mine.size() &&
                !finished_point(o.out_dir / point_folder_name(angles[mine[n + 1]]),
                                specs[n + 1].text);
            if (next_needs_it) previous = finished_point_fields(dir, *done, grid);
            b.records.push_back(*done);
            continue;
        }
        const double elapsed =
            std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
        const std::string left =
            ran > 0 ? format_duration(elapsed / ran * static_cast<double>(mine.size() - n)) : "?";
        const std::string label = fmt::format("[point {}/{} alpha {:+.2f}, sweep left {}] ", k + 1,
                                              angles.size(), angles[k], left);
        PointOutcome out = run_sweep_point(sweep, angles[k], specs[n], grid, o.out_dir,
                                           previous ? &*previous : nullptr, label);
        ++ran;
        if (out.interrupted) {
            b.interrupted = true;
            return b;
        }
        say_point(*out.record, k, angles.size(), false);
        b.records.push_back(*out.record);
        previous = std::move(out.fields);  // a failed point leaves none: the next starts afresh
    }
    return b;
}

std::vector<std::size_t> block_indices(std::size_t count, const SweepRanks& ranks) {
    const auto [first, last] = rank_block(count, ranks.rank(), ranks.size());
    std::vector<std::size_t> mine;
    for (std::size_t k = first; k < last; ++k) mine.push_back(k);
    return mine;
}

std::string records_text(const std::vector<PointRecord>& records) {
    nlohmann::json a = nlohmann::json::array();
    for (const PointRecord& r : records) a.push_back(record_to_json(r));
    return a.dump();
}

std::vector<PointRecord> records_from_texts(const std::vector<std::string>& texts) {
    std::vector<PointRecord> records;
    for (const std::string& t : texts)
        for (const nlohmann::json& j : nlohmann::json::parse(t))
            records.push_back(record_from_json(j, "rank record"));
    return records;
}

}  // namespace veer
