// The veer command line: parses arguments, runs one subcommand, turns errors into one line.
#include "app/cli.hpp"
#include "app/wait_policy.hpp"

int main(int argc, char** argv) {
    veer::restart_with_passive_waits(argv);
    return veer::run_cli(argc, argv);
}
