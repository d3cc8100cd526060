/// The j-lines of the line relaxation: which cells form a line, their colours, and a folded line
/// solving the coupling across the wake cut inside its tridiagonal solve.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <iostream>
#include <set>

#include "solver/line_relaxation.hpp"
#include "solver/wall_normal_lines.hpp"

namespace veer {
namespace {

/// A C-grid's connectivity: wake columns [0, wake) and [ni - wake, ni) pair across the cut.
Connectivity c_grid(int wake, int around, int nj) {
    Connectivity c;
    c.ni = 2 * wake + around;
    c.nj = nj;
    for (int i = 0; i < wake; ++i) c.wake_cut_i.push_back(i);
    for (int i = wake + around; i < c.ni; ++i) c.wake_cut_i.push_back(i);
    return c;
}

/// Columns of every line (a folded line holds its first column and the mirror) and colour.
struct LineCells {
    std::vector<std::vector<int>> columns;
    std::vector<int> colour;
};

LineCells lines_of(const WallNormalLines& plan, int ni) {
    LineCells out;
    for (std::size_t c = 0; c < plan.colours.size(); ++c)
        for (const LineChunk& chunk : plan.colours[c]) {
            EXPECT_FALSE(chunk.columns.empty());
            EXPECT_LE(chunk.columns.size(), 32u);
            for (int col : chunk.columns) {
                out.columns.push_back(chunk.folded ? std::vector<int>{col, ni - 1 - col}
                                                   : std::vector<int>{col});
                out.colour.push_back(static_cast<int>(c));
            }
        }
    return out;
}

/// Every column in exactly one line; lines holding neighbouring columns differ in colour.
void expect_valid(const LineCells& lines, int ni) {
    std::vector<int> line_of(static_cast<std::size_t>(ni), -1);
    for (std::size_t l = 0; l < lines.columns.size(); ++l)
        for (int col : lines.columns[l]) {
            ASSERT_EQ(line_of[static_cast<std::size_t>(col)], -1) << "column " << col << " twice";
            line_of[static_cast<std::size_t>(col)] = static_cast<int>(l);
        }
    for (int i = 0; i < ni; ++i) ASSERT_GE(line_of[static_cast<std::size_t>(i)], 0) << i;
    for (int i = 0; i + 1 < ni; ++i) {
        const int a = line_of[static_cast<std::size_t>(i)],
                  b = line_of[static_cast<std::size_t>(i + 1)];
        if (a == b) continue;
        EXPECT_NE(lines.colour[static_cast<std::size_t>(a)],
                  lines.colour[static_cast<std::size_t>(b)])
            << "columns " << i << " and " << i + 1;
    }
}

TEST(WallNormalLines, PlainColumnsTakeTwoColoursByParity) {
    const Connectivity c = c_grid(6, 20, 5);
    const WallNormalLines plan = plan_wall_normal_lines(c, false);
    ASSERT_EQ(plan.colours.size(), 2u);
    const LineCells lines = lines_of(plan, c.ni);
    EXPECT_EQ(lines.columns.size(), static_cast<std::size_t>(c.ni));
    expect_valid(lines, c.ni);
    for (std::size_t l = 0; l < lines.columns.size(); ++l)
        EXPECT_EQ(lines.colour[l], lines.columns[l][0] % 2);
}

TEST(WallNormalLines, FoldedCGridJoinsEachWakeColumnWithItsMirrorInThreeColours) {
    // The section columns and the last folded line form a cycle of around + 1 lines (odd).
    const Connectivity c = c_grid(6, 20, 5);
    const WallNormalLines plan = plan_wall_normal_lines(c, true);
    EXPECT_EQ(plan.colours.size(), 3u);
    const LineCells lines = lines_of(plan, c.ni);
    EXPECT_EQ(lines.columns.size(), static_cast<std::size_t>(6 + 20));
    expect_valid(lines, c.ni);
    std::set<int> folded_firsts;
    for (const auto& cols : lines.columns)
        if (cols.size() == 2) folded_firsts.insert(cols[0]);
    EXPECT_EQ(folded_firsts, (std::set<int>{0, 1, 2, 3, 4, 5}));
}

/// A system coupled only along j, strongly across the wake cut (the thin cells on both sides of
/// a C-grid's cut): diag q_P - south q_S - north q_N = rhs, walls folded (south = 0 on j = 0 of
/// the section columns, north = 0 on the last row).
MomentumSystem cut_coupled_system(const Connectivity& c, int wake) {
    MomentumSystem s;
    s.resize(c.ni, c.nj);
    for (int j = 0; j < c.nj; ++j)
        for (int i = 0; i < c.ni; ++i) {
            const std::size_t k = static_cast<std::size_t>(j * c.ni + i);
            const bool cut = j == 0 && (i < wake || i >= c.ni - wake);
            s.south[k] = j > 0 ? 1.0 : (cut ? 1e4 : 0.0);
            s.north[k] = j + 1 < c.nj ? 1.0 : 0.0;
            s.diag[k] = 0.01 + s.south[k] + s.north[k];
            s.rhs_u[k] = 1.0 + 0.1 * i - 0.3 * j;
            s.rhs_v[k] = std::sin(0.7 * i + j);
        }
    return s;
}

double relative_residual_after_one_sweep(bool fold) {
    const int wake = 4;
    const Connectivity c = c_grid(wake, 8, 6);
    const MomentumSystem s = cut_coupled_system(c, wake);
    CellField u(c.ni, c.nj), v(c.ni, c.nj);
    LineWork work;
    work.prepare(c, fold);
    const double start = momentum_residual(s, c, u.view(), v.view());
    relax_momentum(s, c, u.view(), v.view(), 1, 0.0, work);
    return momentum_residual(s, c, u.view(), v.view()) / start;
}

TEST(WallNormalLines, FoldedLinesSolveTheCouplingAcrossTheCutInOneSweep) {
    // Folded: every line is a tridiagonal system solved exactly (round-off, times the 1e4
    // coupling: 2e-11 measured, 1e-9 allowed). Ending at the cut,
    // the coupling 1e4 times the rest is taken from the mirror's last value, so one sweep
    // leaves most of the residual (Gauss-Seidel across the cut converges by about 1 - 1e-6).
    const double folded = relative_residual_after_one_sweep(true);
    const double plain = relative_residual_after_one_sweep(false);
    EXPECT_LT(folded, 1e-9);
    std::cout << "relative residual after one sweep: folded " << folded << ", plain " << plain
              << "\n";
    EXPECT_GT(plain, 1e-2);
}

}  // namespace
}  // namespace veer
