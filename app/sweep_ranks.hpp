#pragma once
/// The processes of a sweep. Started under mpirun (or any MPI launcher), the points are spread
/// over the ranks in contiguous blocks and rank 0 gathers their records; started plainly, there
/// is one rank and MPI is never initialised (so a plain run needs no MPI runtime).
#include <memory>
#include <string>
#include <vector>

namespace veer {

class SweepRanks {
public:
    /// Initialises MPI when the process was started by an MPI launcher and this build has MPI.
    SweepRanks();
    ~SweepRanks();
    SweepRanks(const SweepRanks&) = delete;
    SweepRanks& operator=(const SweepRanks&) = delete;

    int rank() const { return m_rank; }
    int size() const { return m_size; }
    bool is_root() const { return m_rank == 0; }
    void barrier() const;
    /// Every rank's text, in rank order, on rank 0 (empty on the others).
    std::vector<std::string> gather_on_root(const std::string& mine) const;
    /// Rank 0's text on every rank (what the others pass is ignored).
    std::string broadcast_from_root(const std::string& text) const;
    /// Whether any rank passed true (all ranks get the answer).
    bool any(bool mine) const;
    /// Ends every rank at once (after an error on one of them).
    [[noreturn]] void abort(int code) const;

private:
    int m_rank = 0;
    int m_size = 1;
    bool m_mpi = false;
};

/// The contiguous block [first, last) of `count` points that `rank` of `size` runs: blocks differ
/// in length by at most one, the longer ones first.
std::pair<std::size_t, std::size_t> rank_block(std::size_t count, int rank, int size);

/// Whether the environment says an MPI launcher started this process.
bool started_by_mpi_launcher();

}  // namespace veer
