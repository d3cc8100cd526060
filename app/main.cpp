// The veer command line: parses arguments, runs one subcommand, turns errors into one line.
#include "app/cli.hpp"

int main(int argc, char** argv) { return veer::run_cli(argc, argv); }
