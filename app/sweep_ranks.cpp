#include "app/sweep_ranks.hpp"

#include <algorithm>
#include <cstdlib>

#ifdef VEER_HAVE_MPI
// The C interface only: the deprecated C++ bindings need a library veer does not link.
#define OMPI_SKIP_MPICXX 1
#define MPICH_SKIP_MPICXX 1
#include <mpi.h>
#include <omp.h>
#endif

namespace veer {

bool started_by_mpi_launcher() {
    for (const char* v : {"OMPI_COMM_WORLD_SIZE", "PMI_SIZE", "PMIX_RANK", "MPI_LOCALNRANKS"})
        if (std::getenv(v)) return true;
    return false;
}

std::pair<std::size_t, std::size_t> rank_block(std::size_t count, int rank, int size) {
    const std::size_t r = static_cast<std::size_t>(rank), s = static_cast<std::size_t>(size);
    const std::size_t base = count / s, extra = count % s;
    const std::size_t first = r * base + std::min(r, extra);
    return {first, first + base + (r < extra ? 1 : 0)};
}

#ifdef VEER_HAVE_MPI

SweepRanks::SweepRanks() {
    if (!started_by_mpi_launcher()) return;
    int ready = 0;
    MPI_Initialized(&ready);
    if (!ready) MPI_Init(nullptr, nullptr);
    m_mpi = true;
    MPI_Comm_rank(MPI_COMM_WORLD, &m_rank);
    MPI_Comm_size(MPI_COMM_WORLD, &m_size);
    // Ranks on one machine share its cores: without an explicit OMP_NUM_THREADS each takes its
    // share rather than all of them.
    if (!std::getenv("OMP_NUM_THREADS")) {
        MPI_Comm local;
        MPI_Comm_split_type(MPI_COMM_WORLD, MPI_COMM_TYPE_SHARED, 0, MPI_INFO_NULL, &local);
        int on_node = 1;
        MPI_Comm_size(local, &on_node);
        MPI_Comm_free(&local);
        omp_set_num_threads(std::max(1, omp_get_num_procs() / on_node));
    }
}

SweepRanks::~SweepRanks() {
    int done = 0;
    if (m_mpi) MPI_Finalized(&done);
    if (m_mpi && !done) MPI_Finalize();
}

void SweepRanks::barrier() const {
    if (m_mpi) MPI_Barrier(MPI_COMM_WORLD);
}

std::vector<std::string> SweepRanks::gather_on_root(const std::string& mine) const {
    if (!m_mpi) return {mine};
    int length = static_cast<int>(mine.size());
    std::vector<int> lengths(static_cast<std::size_t>(m_size));
    MPI_Gather(&length, 1, MPI_INT, lengths.data(), 1, MPI_INT, 0, MPI_COMM_WORLD);
    std::vector<int> offsets(static_cast<std::size_t>(m_size), 0);
    int total = 0;
    for (std::size_t r = 0; r < lengths.size(); ++r) offsets[r] = total, total += lengths[r];
    std::string all(is_root() ? static_cast<std::size_t>(total) : 0, '\0');
    MPI_Gatherv(mine.data(), length, MPI_CHAR, all.data(), lengths.data(), offsets.data(), MPI_CHAR,
                0, MPI_COMM_WORLD);
    std::vector<std::string> texts;
    if (!is_root()) return texts;
    for (std::size_t r = 0; r < lengths.size(); ++r)
        texts.push_back(
            all.substr(static_cast<std::size_t>(offsets[r]), static_cast<std::size_t>(lengths[r])));
    return texts;
}

std::string SweepRanks::broadcast_from_root(const std::string& text) const {
    if (!m_mpi) return text;
    int length = is_root() ? static_cast<int>(text.size()) : 0;
    MPI_Bcast(&length, 1, MPI_INT, 0, MPI_COMM_WORLD);
    std::string out = is_root() ? text : std::string(static_cast<std::size_t>(length), '\0');
    MPI_Bcast(out.data(), length, MPI_CHAR, 0, MPI_COMM_WORLD);
    return out;
}

bool SweepRanks::any(bool mine) const {
    if (!m_mpi) return mine;
    int in = mine ? 1 : 0, out = 0;
    MPI_Allreduce(&in, &out, 1, MPI_INT, MPI_MAX, MPI_COMM_WORLD);
    return out != 0;
}

void SweepRanks::abort(int code) const {
    if (m_mpi) MPI_Abort(MPI_COMM_WORLD, code);
    std::exit(code);
}

#else

SweepRanks::SweepRanks() = default;
SweepRanks::~SweepRanks() = default;
void SweepRanks::barrier() const {}
std::vector<std::string> SweepRanks::gather_on_root(const std::string& mine) const {
    return {mine};
}
std::string SweepRanks::broadcast_from_root(const std::string& text) const { return text; }
bool SweepRanks::any(bool mine) const { return mine; }
void SweepRanks::abort(int code) const { std::exit(code); }

#endif

}  // namespace veer
