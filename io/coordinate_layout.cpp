#include "io/coordinate_layout.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>

#include "mesh/errors.hpp"

namespace veer {
namespace {

using Run = std::vector<FilePoint>;

/// Runs whose ends are this close, relative to the section's size, share that end.
constexpr double k_shared_end = 0.05;
/// A blank line between points closer than this many of their neighbouring steps splits nothing.
constexpr double k_continues = 3.0;

double extent(const std::vector<Run>& runs) {
    double x0 = HUGE_VAL, x1 = -HUGE_VAL, y0 = HUGE_VAL, y1 = -HUGE_VAL;
    for (const Run& r : runs) {
        for (const FilePoint& p : r) {
            x0 = std::min(x0, p.point.x);
            x1 = std::max(x1, p.point.x);
            y0 = std::min(y0, p.point.y);
            y1 = std::max(y1, p.point.y);
        }
    }
    return std::hypot(x1 - x0, y1 - y0);
}

std::string lines_of(const Run& r) {
    return fmt::format("lines {}-{}", r.front().line, r.back().line);
}

bool whole(double v) { return v >= 2.0 && v <= 1e7 && v == std::floor(v); }

/// A leading count line "N1 N2": returns the two counts when the rest of the points number
/// exactly N1 + N2; throws when the line can only be a count line but the numbers disagree.
std::optional<std::pair<std::size_t, std::size_t>> count_line(const FileBlocks& b) {
    const FilePoint& first = b.blocks.front().front();
    if (!whole(first.point.x) || !whole(first.point.y)) return std::nullopt;
    std::size_t rest = 0;
    for (const auto& block : b.blocks) rest += block.size();
    --rest;
    const auto n1 = static_cast<std::size_t>(first.point.x);
    const auto n2 = static_cast<std::size_t>(first.point.y);
    if (n1 + n2 == rest) return std::make_pair(n1, n2);
    // (61, 61) far outside the rest of the points: a count line that does not fit
    std::vector<Run> others = b.blocks;
    others.front().erase(others.front().begin());
    if (others.front().empty()) others.erase(others.begin());
    if (!others.empty() && std::min(first.point.x, first.point.y) > 4.0 * extent(others)) {
        throw InputError(fmt::format(
            "{}:{}: \"{} {}\" reads as the point counts of two surfaces ({} + {} = {}), but {} "
            "points follow; the counts must match the points listed",
            b.source, first.line, first.point.x, first.point.y, n1, n2, n1 + n2, rest));
    }
    return std::nullopt;
}

double widest_step(const Run& r) {
    double widest = 0.0;
    for (std::size_t k = 1; k < r.size(); ++k)
        widest = std::max(widest, norm(r[k].point - r[k - 1].point));
    return widest;
}

/// Joins blocks that continue one another into runs: a blank line where the next point lies no
/// farther than a few of the neighbouring steps separates nothing.
std::vector<Run> runs_of(const std::vector<Run>& blocks) {
    std::vector<Run> runs{blocks.front()};
    for (std::size_t k = 1; k < blocks.size(); ++k) {
        const double jump = norm(blocks[k].front().point - runs.back().back().point);
        const double step = std::max(widest_step(runs.back()), widest_step(blocks[k]));
        if (jump <= k_continues * step) {
            runs.back().insert(runs.back().end(), blocks[k].begin(), blocks[k].end());
        } else {
            runs.push_back(blocks[k]);
        }
    }
    return runs;
}

/// Cosine of the angle between the directions in which runs a and b leave their first points
/// (their last points when `at_back`): near -1 at a round leading edge, near 1 at a trailing edge
/// where both surfaces arrive from the same side.
double leaving_cosine(const Run& a, const Run& b, bool at_back) {
    const auto dir = [at_back](const Run& r) {
        const std::size_t n = r.size();
        return at_back ? r[n - 2].point - r[n - 1].point : r[1].point - r[0].point;
    };
    const Vec2 u = dir(a), v = dir(b);
    return dot(u, v) / (norm(u) * norm(v));
}

/// Two surfaces sharing an end (the leading edge) become one loop from trailing edge to
/// trailing edge; a shared end point listed in both is kept once. When both pairs of ends are
/// close (a thin trailing-edge gap), the leading edge is the end the surfaces leave in the most
/// different directions.
RawOutline join_surfaces(Run a, Run b, const std::string& source, double size, std::string& how) {
    const auto close = [&](Vec2 p, Vec2 q) { return norm(p - q) <= k_shared_end * size; };
    const bool fronts = a.size() > 1 && b.size() > 1 && close(a.front().point, b.front().point);
    const bool backs = a.size() > 1 && b.size() > 1 && close(a.back().point, b.back().point);
    if (!fronts && !backs) {
        throw InputError(
            fmt::format("{}: two separate runs of points ({} and {}) that share no end: {}", source,
                        lines_of(a), lines_of(b), k_layouts_read));
    }
    if (fronts && (!backs || leaving_cosine(a, b, false) <= leaving_cosine(a, b, true))) {
        std::reverse(a.begin(), a.end());
        how = "each from the leading edge to the trailing edge";
    } else {
        std::reverse(b.begin(), b.end());
        how = "each from the trailing edge to the leading edge";
    }
    if (norm(a.back().point - b.front().point) == 0.0) b.erase(b.begin());
    RawOutline raw;
    for (const Run* r : {&a, &b}) {
        for (const FilePoint& p : *r) {
            raw.points.push_back(p.point);
            raw.lines.push_back(p.line);
        }
    }
    return raw;
}

/// Whether the ends of two runs of at least two points each lie together (a shared leading edge).
bool share_an_end(const Run& a, const Run& b) {
    if (a.size() < 2 || b.size() < 2) return false;
    const double size = extent({a, b});
    return norm(a.front().point - b.front().point) <= k_shared_end * size ||
           norm(a.back().point - b.back().point) <= k_shared_end * size;
}

/// Whether a run comes back to where it started (a loop, whatever blank lines it holds).
bool closes(const Run& r) {
    return norm(r.front().point - r.back().point) <= k_shared_end * extent({r});
}

/// One run that starts at its foremost point and does not come back there: two surfaces from
/// the leading edge written one after the other with nothing between them.
void refuse_surfaces_run_together(const Run& r, const std::string& source) {
    const double size = extent({r});
    if (r.size() < 3 || norm(r.front().point - r.back().point) <= k_shared_end * size) return;
    const auto foremost = std::min_element(
        r.begin(), r.end(), [](const auto& p, const auto& q) { return p.point.x < q.point.x; });
    if (norm(foremost->point - r.front().point) > k_shared_end * size) return;
    throw InputError(fmt::format(
        "{}:{}: the points start at the leading edge and do not come back to it; for two "
        "surfaces put a blank line between them; {}",
        source, r.front().line, k_layouts_read));
}

}  // namespace

RawOutline assemble_outline(const FileBlocks& b) {
    VEER_VERIFY(!b.blocks.empty() && !b.blocks.front().empty(), "blocks of points to assemble");
    std::vector<Run> blocks = b.blocks;
    std::string counted;
    if (const auto counts = count_line(b)) {
        Run all;
        for (const Run& block : blocks) all.insert(all.end(), block.begin(), block.end());
        counted = fmt::format(", with a count line ({}, {})", counts->first, counts->second);
        all.erase(all.begin());
        const auto split = all.begin() + static_cast<std::ptrdiff_t>(counts->first);
        blocks = {Run(all.begin(), split), Run(split, all.end())};
    }
    std::vector<Run> runs = counted.empty() ? runs_of(blocks) : blocks;
    if (runs.size() == 2 && (!counted.empty() || share_an_end(runs[0], runs[1]))) {
        std::string how;
        RawOutline raw = join_surfaces(runs[0], runs[1], b.source, extent(runs), how);
        raw.layout = "two surfaces, " + how + counted;
        raw.source = b.source;
        return raw;
    }
    Run all;
    for (const Run& r : runs) all.insert(all.end(), r.begin(), r.end());
    if (runs.size() > 1 && !closes(all)) {
        std::string parts;
        for (const Run& r : runs) parts += (parts.empty() ? "" : ", ") + lines_of(r);
        throw InputError(fmt::format("{}: {} separate runs of points ({}): {}", b.source,
                                     runs.size(), parts, k_layouts_read));
    }
    refuse_surfaces_run_together(all, b.source);
    RawOutline raw;
    for (const FilePoint& p : all) {
        raw.points.push_back(p.point);
        raw.lines.push_back(p.line);
    }
    raw.layout = "one closed loop";
    raw.source = b.source;
    return raw;
}

}  // namespace veer
