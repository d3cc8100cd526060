#include "app/wait_policy.hpp"

#include <unistd.h>

#include <cstdlib>

namespace veer {

void restart_with_passive_waits(char** argv) {
    if (std::getenv("OMP_WAIT_POLICY") != nullptr) return;
    if (setenv("OMP_WAIT_POLICY", "PASSIVE", 0) != 0) return;
    execv("/proc/self/exe", argv);  // returns only on failure: carry on as we are
}

}  // namespace veer
