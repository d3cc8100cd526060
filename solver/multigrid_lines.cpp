#include "solver/multigrid_lines.hpp"

#include <algorithm>
#include <climits>
#include <cstddef>

#include "mesh/errors.hpp"
#include "solver/pressure_loops.hpp"

namespace veer {
namespace {

constexpr int slot_im = 0, slot_ip = 1, slot_jm = 2, slot_jp = 3, no_slot = -1;

struct LineBuild {
    std::vector<int> cells, prev, next;
    void clear() { cells.clear(), prev.clear(), next.clear(); }
    void push(int cell, int prev_slot, int next_slot) {
        cells.push_back(cell), prev.push_back(prev_slot), next.push_back(next_slot);
    }
};

}  // namespace

LineRelaxation::LineRelaxation(const PoissonStencil& s, const PressureOperator& op,
                               Direction direction) {
    VEER_VERIFY(op.ni == s.ni && op.nj == s.nj, "operator and stencil of different levels");
    const int ni = s.ni, nj = s.nj;
    LineBuild line;
    auto column = [&](int i) {  // (i, 0) .. (i, nj-1)
        for (int j = 0; j < nj; ++j)
            line.push(i + ni * j, j > 0 ? slot_jm : no_slot, j < nj - 1 ? slot_jp : no_slot);
    };
    if (direction == Direction::j_lines) {
        const int wake = s.wake_cut ? s.wake_cut->wake : 0;
        for (int i = 0; i < ni - wake; ++i) {
            line.clear();
            if (i < wake) {  // down column i, across the cut, up the mirror column
                for (int j = nj - 1; j >= 0; --j)
                    line.push(i + ni * j, j < nj - 1 ? slot_jp : no_slot, slot_jm);
                const int mirror = ni - 1 - i;
                for (int j = 0; j < nj; ++j)
                    line.push(mirror + ni * j, slot_jm, j < nj - 1 ? slot_jp : no_slot);
            } else {
                column(i);
            }
            add_line(op, line.cells, line.prev);
            (void)line.next;
        }
    } else {
        for (int j = 0; j < nj; ++j) {
            line.clear();
            for (int i = 0; i < ni; ++i)
                line.push(i + ni * j, i > 0 ? slot_im : no_slot, i < ni - 1 ? slot_ip : no_slot);
            add_line(op, line.cells, line.prev);
        }
    }
    m_lines = static_cast<int>(m_line_begin.size()) - 1;
    // Lines relaxed side by side: 32 wall-normal lines walk the grid row by row (one memory
    // stream instead of one page per cell); 4 along-C lines interleave four independent
    // recurrences (the tridiagonal elimination is latency-bound on one line).
    pack(colour_lines(op), direction == Direction::j_lines ? 32 : 4);
    m_work.assign(m_cell.size(), 0.0);
}

// The couplings of a cell that are not on its line, old values on the right-hand side: the two
// across the line (kept per position, read as a stream), and at a line end the one that closes
// a periodic line (lagged). Couplings of 0 (boundaries) are dropped.
void LineRelaxation::add_off_line(const PressureRow& row, int cell, int prev_slot, int next_slot,
                                  bool line_end) {
    double c[3] = {0.0, 0.0, 0.0};
    int nb[3] = {cell, cell, cell};
    int count = 0;
    for (int s = 0; s < 4; ++s) {
        const auto k = static_cast<std::size_t>(s);
        if (s == prev_slot || s == next_slot || row.coupling[k] == 0.0) continue;
        VEER_VERIFY(count < 3, "a line cell with four off-line couplings");
        c[count] = row.coupling[k];
        nb[count] = row.neighbour[k];
        ++count;
    }
    VEER_VERIFY(count < 3 || line_end, "a third off-line coupling away from a line end");
    m_off_coupling0.push_back(c[0]);
    m_off_coupling1.push_back(c[1]);
    m_end_coupling.push_back(c[2]);
    m_off_neighbour0.push_back(nb[0]);
    m_off_neighbour1.push_back(nb[1]);
    m_end_neighbour.push_back(nb[2]);
}

// Each cell's previous-cell slot is given; its next-cell slot is the previous slot of the next
// cell seen from the other side, found as the slot of this cell pointing at the next cell.
void LineRelaxation::add_line(const PressureOperator& op, const std::vector<int>& cells,
                              const std::vector<int>& prev_slot) {
    const int n = static_cast<int>(cells.size());
    double w_prev = 0.0;
    for (int k = 0; k < n; ++k) {
        const PressureRow& row =
            op.rows[static_cast<std::size_t>(cells[static_cast<std::size_t>(k)])];
        const int ps = prev_slot[static_cast<std::size_t>(k)];
        int ns = no_slot;
        if (k + 1 < n) {
            const int next_cell = cells[static_cast<std::size_t>(k + 1)];
            const int next_prev = prev_slot[static_cast<std::size_t>(k + 1)];
            const auto& next_row = op.rows[static_cast<std::size_t>(next_cell)];
            // The slot of this cell whose face is the next cell's previous face: opposite slot
            // (-i <-> +i, -j <-> +j), except across the wake cut where both use -j.
            const bool across_cut =
                next_prev == slot_jm && row.neighbour[slot_jm] == next_cell &&
                next_row.neighbour[slot_jm] == cells[static_cast<std::size_t>(k)];
            ns = across_cut ? slot_jm : (next_prev ^ 1);
            VEER_VERIFY(row.neighbour[static_cast<std::size_t>(ns)] == next_cell,
                        "line cells are not neighbours");
        }
        const double a = ps == no_slot ? 0.0 : row.coupling[static_cast<std::size_t>(ps)];
        const double u = ns == no_slot ? 0.0 : row.coupling[static_cast<std::size_t>(ns)];
        add_off_line(row, cells[static_cast<std::size_t>(k)], ps, ns, k == 0 || k + 1 == n);
        const double pivot = row.diagonal - a * w_prev;
        VEER_VERIFY(pivot > 0.0, "line relaxation met a singular line (no coupling off it)");
        m_cell.push_back(cells[static_cast<std::size_t>(k)]);
        m_lower.push_back(a);
        m_inv_pivot.push_back(1.0 / pivot);
        w_prev = u / pivot;
        m_upper_over.push_back(w_prev);
    }
    m_line_begin.push_back(static_cast<int>(m_cell.size()));
}

std::vector<int> LineRelaxation::colour_lines(const PressureOperator& op) const {
    const int lines = static_cast<int>(m_line_begin.size()) - 1;
    std::vector<int> line_of(op.rows.size(), -1), colour(static_cast<std::size_t>(lines), -1);
    for (int l = 0; l < lines; ++l)
        for (int p = m_line_begin[static_cast<std::size_t>(l)]; p < m_line_begin[l + 1u]; ++p)
            line_of[static_cast<std::size_t>(m_cell[static_cast<std::size_t>(p)])] = l;
    int colours = 0;
    for (int l = 0; l < lines; ++l) {  // greedy, in line order: deterministic
        std::vector<bool> taken(static_cast<std::size_t>(colours) + 1, false);
        for (int p = m_line_begin[static_cast<std::size_t>(l)]; p < m_line_begin[l + 1u]; ++p) {
            const PressureRow& row =
                op.rows[static_cast<std::size_t>(m_cell[static_cast<std::size_t>(p)])];
            for (std::size_t s = 0; s < 4; ++s) {
                const int other = line_of[static_cast<std::size_t>(row.neighbour[s])];
                if (row.coupling[s] != 0.0 && other != l && other >= 0 &&
                    colour[static_cast<std::size_t>(other)] >= 0)
                    taken[static_cast<std::size_t>(colour[static_cast<std::size_t>(other)])] = true;
            }
        }
        const auto free = std::find(taken.begin(), taken.end(), false) - taken.begin();
        colour[static_cast<std::size_t>(l)] = static_cast<int>(free);
        colours = std::max(colours, static_cast<int>(free) + 1);
    }
    return colour;
}

namespace {
template <class T>
void reorder(std::vector<T>& v, const std::vector<int>& from) {
    std::vector<T> out(from.size());
    for (std::size_t k = 0; k < from.size(); ++k) out[k] = v[static_cast<std::size_t>(from[k])];
    v.swap(out);
}
}  // namespace

void LineRelaxation::pack(const std::vector<int>& colour, int chunk_width) {
    const int colours = colour.empty() ? 0 : *std::max_element(colour.begin(), colour.end()) + 1;
    std::vector<int> from;  // packed position -> line-by-line position
    from.reserve(m_cell.size());
    m_colour_begin.assign(1, 0);
    for (int c = 0; c < colours; ++c) {
        std::vector<int> group;  // lines of this colour, in line order, cut into chunks
        auto flush = [&] {
            if (group.empty()) return;
            const int length = m_line_begin[group[0] + 1u] - m_line_begin[group[0] + 0u];
            m_chunks.push_back(
                {static_cast<int>(from.size()), static_cast<int>(group.size()), length});
            for (int k = 0; k < length; ++k)
                for (int l : group) from.push_back(m_line_begin[static_cast<std::size_t>(l)] + k);
            group.clear();
        };
        for (int l = 0; l < m_lines; ++l) {
            if (colour[static_cast<std::size_t>(l)] != c) continue;
            const int length = m_line_begin[l + 1u] - m_line_begin[static_cast<std::size_t>(l)];
            if (!group.empty() &&
                (static_cast<int>(group.size()) == chunk_width ||
                 length != m_line_begin[group[0] + 1u] - m_line_begin[group[0] + 0u]))
                flush();
            group.push_back(l);
        }
        flush();
        m_colour_begin.push_back(static_cast<int>(m_chunks.size()));
    }
    reorder(m_cell, from);
    for (auto* v : {&m_off_coupling0, &m_off_coupling1, &m_end_coupling}) reorder(*v, from);
    for (auto* v : {&m_off_neighbour0, &m_off_neighbour1, &m_end_neighbour}) reorder(*v, from);
    reorder(m_lower, from);
    reorder(m_upper_over, from);
    reorder(m_inv_pivot, from);
    m_line_begin.assign(1, 0);  // no longer meaningful after packing
}

void LineRelaxation::relax_chunk(const double* b, double* x, const Chunk& ch) const {
    const std::size_t n = static_cast<std::size_t>(ch.lines);
    const std::size_t p0 = static_cast<std::size_t>(ch.base);
    const std::size_t p1 = p0 + n * static_cast<std::size_t>(ch.length);
    double* y = m_work.data();
    const auto length = static_cast<std::size_t>(ch.length);
    // Forward elimination, off-line couplings (old values) moved to the right-hand side. Every
    // right-hand side is formed before any x of this chunk is written.
    for (std::size_t k = 0; k < length; ++k) {
        const bool end = k == 0 || k + 1 == length;
        for (std::size_t p = p0 + k * n; p < p0 + (k + 1) * n; ++p) {
            const int c = m_cell[p];
            double r = b[c] + m_off_coupling0[p] * x[m_off_neighbour0[p]] +
                       m_off_coupling1[p] * x[m_off_neighbour1[p]];
            if (end) r += m_end_coupling[p] * x[m_end_neighbour[p]];
            const double y_prev = k > 0 ? y[p - n] : 0.0;
            y[p] = (r + m_lower[p] * y_prev) * m_inv_pivot[p];
        }
    }
    // Back substitution, last position of every line first.
    for (std::size_t p = p1; p-- > p0;) {
        if (p + n < p1) y[p] += m_upper_over[p] * y[p + n];
        x[m_cell[p]] = y[p];
    }
}

void LineRelaxation::sweep(const PressureOperator& op, const std::vector<double>& b,
                           std::vector<double>& x, bool forward) const {
    const int colours = colour_count();
    const int min_parallel = op.size() >= parallel_cell_threshold ? 2 : INT_MAX;
    for (int k = 0; k < colours; ++k) {
        const int c = forward ? k : colours - 1 - k;
        const int first = m_colour_begin[static_cast<std::size_t>(c)];
        const int count = m_colour_begin[static_cast<std::size_t>(c) + 1] - first;
        const Chunk* chunks = m_chunks.data() + first;
        parallel_for(count, min_parallel,
                     [&](int l) { relax_chunk(b.data(), x.data(), chunks[l]); });
    }
}

}  // namespace veer
