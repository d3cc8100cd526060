#include "app/wait_policy.hpp"

#include <unistd.h>

#include <cstdio>
#include <cstdlib>
#include <thread>

namespace veer {
namespace {

/// Whether the machine has a core to spare now: its one-minute load average below the number
/// of cores less one half. False when the load cannot be read.
bool machine_idle() {
    std::FILE* f = std::fopen("/proc/loadavg", "r");
    if (!f) return false;
    double load = 0.0;
    const bool read = std::fscanf(f, "%lf", &load) == 1;
    std::fclose(f);
    const unsigned cores = std::thread::hardware_concurrency();
    return read && cores > 0 && load < static_cast<double>(cores) - 0.5;
}

}  // namespace

void restart_with_passive_waits(char** argv) {
    if (std::getenv("OMP_WAIT_POLICY") != nullptr) return;
    if (setenv("OMP_WAIT_POLICY", "PASSIVE", 0) != 0) return;
    // On an idle machine a short spin before sleeping saves the wake-up of a sleeping thread at
    // every parallel loop (GNU OpenMP's GOMP_SPINCOUNT; others ignore it).
    if (std::getenv("GOMP_SPINCOUNT") == nullptr && machine_idle())
        setenv("GOMP_SPINCOUNT", idle_spin_count, 0);
    execv("/proc/self/exe", argv);  // returns only on failure: carry on as we are
}

}  // namespace veer
