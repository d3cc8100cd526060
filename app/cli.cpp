#include "app/cli.hpp"

#include <CLI/CLI.hpp>
#include <iostream>

#include "mesh/errors.hpp"

namespace veer {

int run_cli(int argc, char** argv) {
    CLI::App app{"veer: 2D incompressible flow about airfoil sections"};
    app.set_version_flag("--version", std::string("veer ") + VEER_VERSION);
    app.require_subcommand(1);
    try {
        app.parse(argc, argv);
    } catch (const CLI::ParseError& e) {
        return app.exit(e);
    }
    return 0;
}

}  // namespace veer
