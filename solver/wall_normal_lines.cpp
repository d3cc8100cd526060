#include "solver/wall_normal_lines.hpp"

#include <algorithm>

namespace veer {

namespace {

/// Lines relaxed side by side: they walk the grid row by row (one memory stream).
constexpr int chunk_width = 32;

/// Column of the mirror cell across the wake cut, or -1 where column i has none.
std::vector<int> mirror_columns(const Connectivity& c) {
    std::vector<int> mirror(static_cast<std::size_t>(c.ni), -1);
    for (int i : c.wake_cut_i) mirror[static_cast<std::size_t>(i)] = c.ni - 1 - i;
    return mirror;
}

/// Where position k of a line starting in column `col` lies.
struct Place {
    int i = 0;
    int j = 0;
};

inline Place place(bool folded, int col, int k, int ni, int nj) {
    if (!folded) return {col, k};
    return k < nj ? Place{col, nj - 1 - k} : Place{ni - 1 - col, k - nj};
}

}  // namespace

WallNormalLines plan_wall_normal_lines(const Connectivity& c, bool fold_wake_cut) {
    const int ni = c.ni;
    const std::vector<int> mirror = mirror_columns(c);
    // Lines in column order; line_of[i] is the line holding column i.
    std::vector<int> first, line_of(static_cast<std::size_t>(ni), -1);
    std::vector<bool> folded;
    for (int i = 0; i < ni; ++i) {
        const int m = mirror[static_cast<std::size_t>(i)];
        const bool fold = fold_wake_cut && m >= 0;
        if (fold && m < i) continue;  // already in the line of its mirror
        line_of[static_cast<std::size_t>(i)] = static_cast<int>(first.size());
        if (fold) line_of[static_cast<std::size_t>(m)] = static_cast<int>(first.size());
        first.push_back(i);
        folded.push_back(fold);
    }
    // Greedy colouring: lines holding neighbouring columns differ (colour 0 where free).
    const int lines = static_cast<int>(first.size());
    std::vector<int> colour(static_cast<std::size_t>(lines), -1);
    int colours = 0;
    for (int l = 0; l < lines; ++l) {
        std::vector<bool> taken(3, false);
        auto mark_neighbours = [&](int i) {
            for (int n : {i - 1, i + 1}) {
                if (n < 0 || n >= ni) continue;
                const int other =
                    colour[static_cast<std::size_t>(line_of[static_cast<std::size_t>(n)])];
                if (other >= 0 && line_of[static_cast<std::size_t>(n)] != l)
                    taken[static_cast<std::size_t>(other)] = true;
            }
        };
        const int i = first[static_cast<std::size_t>(l)];
        mark_neighbours(i);
        if (folded[static_cast<std::size_t>(l)])
            mark_neighbours(mirror[static_cast<std::size_t>(i)]);
        int pick = 0;
        while (taken[static_cast<std::size_t>(pick)]) ++pick;
        colour[static_cast<std::size_t>(l)] = pick;
        colours = std::max(colours, pick + 1);
    }
    WallNormalLines out;
    out.colours.resize(static_cast<std::size_t>(colours));
    for (int l = 0; l < lines; ++l) {
        std::vector<LineChunk>& chunks =
            out.colours[static_cast<std::size_t>(colour[static_cast<std::size_t>(l)])];
        const bool fold = folded[static_cast<std::size_t>(l)];
        if (chunks.empty() || chunks.back().folded != fold ||
            static_cast<int>(chunks.back().columns.size()) == chunk_width)
            chunks.push_back({{}, fold});
        chunks.back().columns.push_back(first[static_cast<std::size_t>(l)]);
    }
    return out;
}

void relax_line_chunk(const MomentumSystem& s, const Connectivity& con, const LineChunk& chunk,
                      CellView u, CellView v, LineScratch& w) {
    const int ni = con.ni, nj = con.nj;
    const int len = chunk.folded ? 2 * nj : nj;
    auto cell = [ni](Place p) {
        return static_cast<std::size_t>(p.j) * static_cast<std::size_t>(ni) +
               static_cast<std::size_t>(p.i);
    };
    // Plain line: previous position below (south), next above (north). Folded: on the way down
    // the previous is above and the next below, across the cut the next is the mirror cell (its
    // -j neighbour); on the way up as in a plain line.
    const bool fold = chunk.folded;
    for (int k = 0; k < len; ++k) {
        const bool down = fold && k < nj;
        for (int col : chunk.columns) {
            const Place p = place(fold, col, k, ni, nj);
            const std::size_t c = cell(p);
            double eu = s.west[c] * u(p.i - 1, p.j) + s.east[c] * u(p.i + 1, p.j);
            double ev = s.west[c] * v(p.i - 1, p.j) + s.east[c] * v(p.i + 1, p.j);
            double a = 0.0, prev_c = 0.0, prev_u = 0.0, prev_v = 0.0;
            if (k == 0) {
                const double coupling = fold ? s.north[c] : s.south[c];
                const int gj = fold ? nj : -1;
                eu += coupling * u(p.i, gj);
                ev += coupling * v(p.i, gj);
            } else {
                const std::size_t prev = cell(place(fold, col, k - 1, ni, nj));
                a = down ? s.north[c] : s.south[c];
                prev_c = w.c_prime[prev];
                prev_u = w.d_u[prev];
                prev_v = w.d_v[prev];
            }
            if (k == len - 1) {
                eu += s.north[c] * u(p.i, nj);
                ev += s.north[c] * v(p.i, nj);
            }
            const double inv = 1.0 / (s.diag[c] - a * prev_c);
            w.c_prime[c] = (k + 1 < len ? (down ? s.south[c] : s.north[c]) : 0.0) * inv;
            w.d_u[c] = (s.rhs_u[c] + eu + a * prev_u) * inv;
            w.d_v[c] = (s.rhs_v[c] + ev + a * prev_v) * inv;
        }
    }
    for (int col : chunk.columns) {
        const Place p = place(fold, col, len - 1, ni, nj);
        u(p.i, p.j) = w.d_u[cell(p)];
        v(p.i, p.j) = w.d_v[cell(p)];
    }
    for (int k = len - 2; k >= 0; --k)
        for (int col : chunk.columns) {
            const Place p = place(fold, col, k, ni, nj);
            const Place next = place(fold, col, k + 1, ni, nj);
            const std::size_t c = cell(p);
            u(p.i, p.j) = w.d_u[c] + w.c_prime[c] * u(next.i, next.j);
            v(p.i, p.j) = w.d_v[c] + w.c_prime[c] * v(next.i, next.j);
        }
}

}  // namespace veer
