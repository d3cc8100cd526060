#pragma once
/// The subcommands of `veer`; each returns the process exit code and throws InputError on bad
/// input (the caller prints it as one line).
#include <filesystem>
#include <string>
#include <vector>

namespace veer {

/// Options shared by the subcommands that read a case file.
struct CaseOptions {
    std::filesystem::path case_file;
    std::vector<std::string> overrides;  ///< --set table.key=value
};

struct MeshOptions {
    CaseOptions input;
    std::filesystem::path out_dir;
    bool force = false;
};

struct RunOptions {
    CaseOptions input;
    std::filesystem::path out_dir;
    std::filesystem::path restart;  ///< checkpoint to continue from; empty for a new run
    bool force = false;
    bool quiet = false;
};

int run_mesh_command(const MeshOptions& options);
int run_check_command(const CaseOptions& options);
int run_run_command(const RunOptions& options);

}  // namespace veer
