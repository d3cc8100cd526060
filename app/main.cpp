// The veer command line: parses arguments, runs one subcommand, turns errors into one line.
#include <unistd.h>

#include <cstdlib>

#include "app/cli.hpp"

int main(int argc, char** argv) {
    // OpenMP threads that spin at barriers lose badly on a shared, loaded machine (steady
    // NACA 0012 on 256x64: 62.6 s spinning against 7.0 s passive, 2 cores, load 9). The wait
    // policy is read when the OpenMP runtime loads, so set it and start again, once.
    if (std::getenv("OMP_WAIT_POLICY") == nullptr && setenv("OMP_WAIT_POLICY", "PASSIVE", 0) == 0)
        execv("/proc/self/exe", argv);  // returns only on failure: carry on as we are
    return veer::run_cli(argc, argv);
}
