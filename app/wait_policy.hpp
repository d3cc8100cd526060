#pragma once
/// OpenMP threads that spin at barriers lose badly on a shared, loaded machine (steady NACA 0012
/// on 256x64: 62.6 s spinning against 7.0 s passive, 2 cores, load 9). The wait policy is read
/// once, when the OpenMP runtime loads, so a program that wants passive waits sets the variable
/// and starts itself again. `veer` and the benchmarks call this first thing in main, so the
/// benchmarks measure what users get.

namespace veer {

/// Unless the user set OMP_WAIT_POLICY, sets it to PASSIVE and re-executes the program with
/// the same arguments. Returns (and the program carries on as it is) only when the variable was
/// already set or the re-execution failed.
void restart_with_passive_waits(char** argv);

}  // namespace veer
