#pragma once
/// The `veer` command line.
namespace veer {

/// Parses the arguments, runs the chosen subcommand and returns the process exit code. Errors are
/// printed as one line on stderr.
int run_cli(int argc, char** argv);

}  // namespace veer
