// How the points of a sweep are spread over MPI ranks: contiguous blocks that cover every point
// once, lengths differing by at most one. (The MPI run itself is checked end to end by the
// acceptance script, which compares a two-rank polar with a serial one.)
#include <gtest/gtest.h>

#include "app/sweep_ranks.hpp"

namespace veer {
namespace {

TEST(SweepRanks, BlocksCoverEveryPointOnce) {
    for (std::size_t count : {0u, 1u, 4u, 11u, 17u})
        for (int size : {1, 2, 3, 4, 8}) {
            std::size_t next = 0, shortest = count, longest = 0;
            for (int rank = 0; rank < size; ++rank) {
                const auto [first, last] = rank_block(count, rank, size);
                EXPECT_EQ(first, next) << count << " points, rank " << rank << " of " << size;
                next = last;
                shortest = std::min(shortest, last - first);
                longest = std::max(longest, last - first);
            }
            EXPECT_EQ(next, count);
            EXPECT_LE(longest - std::min(shortest, longest), 1u);
        }
}

TEST(SweepRanks, FourPointsOnTwoRanks) {
    EXPECT_EQ(rank_block(4, 0, 2), (std::pair<std::size_t, std::size_t>{0, 2}));
    EXPECT_EQ(rank_block(4, 1, 2), (std::pair<std::size_t, std::size_t>{2, 4}));
    EXPECT_EQ(rank_block(5, 0, 2), (std::pair<std::size_t, std::size_t>{0, 3}));  // longer first
}

TEST(SweepRanks, PlainStartIsOneRank) {
    // The tests run without an MPI launcher: one rank, MPI never initialised.
    if (started_by_mpi_launcher()) GTEST_SKIP() << "started under an MPI launcher";
    SweepRanks ranks;
    EXPECT_EQ(ranks.size(), 1);
    EXPECT_TRUE(ranks.is_root());
    EXPECT_EQ(ranks.gather_on_root("x"), std::vector<std::string>{"x"});
}

}  // namespace
}  // namespace veer
