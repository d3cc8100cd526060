#pragma once
/// OpenMP threads that spin at barriers lose badly on a shared, loaded machine (steady NACA 0012
/// on 256x64: 62.6 s spinning against 7.0 s passive, 2 cores, load 9). On an idle machine the
/// opposite holds: waking a sleeping thread at every parallel loop costs more than the loop
/// (time-accurate NACA 0012, 352 x 64 cells, 330 steps on 2 cores: 1 thread 6.96 s; 2 threads
/// passive 10.22 s; passive after a spin of 1e4 / 1e5 / 1e6 iterations 6.77 / 6.52 / 5.29 s).
/// So waits are passive, after a spin of `idle_spin_count` when the machine had a core to spare
/// at start. The wait policy is read once, when the OpenMP runtime loads, so the program sets
/// the variables and starts itself again. `veer` and the benchmarks call this first thing in
/// main, so the benchmarks measure what users get.

namespace veer {

/// GOMP_SPINCOUNT on an idle machine (about a millisecond of spinning).
inline constexpr const char* idle_spin_count = "1000000";

/// Unless the user set OMP_WAIT_POLICY, sets it to PASSIVE (and GOMP_SPINCOUNT, unless set,
/// to idle_spin_count when the one-minute load average is below the core count less one half)
/// and re-executes the program with the same arguments. Returns (and the program carries on as it
/// is) only when the variable was already set or the re-execution failed.
void restart_with_passive_waits(char** argv);

}  // namespace veer
