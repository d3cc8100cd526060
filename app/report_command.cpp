// `veer report DIR`: the report page of a run folder or a sweep folder.
#include "app/commands.hpp"
#include "mesh/errors.hpp"

namespace veer {

int run_report_command(const ReportOptions& o) {
    throw InputError(o.dir.string() + ": veer report is not ready yet");
}

}  // namespace veer
