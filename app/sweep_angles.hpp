#pragma once
/// The angles of attack of a sweep, as the command line gives them: a range START:END:STEP
/// (END included when a whole number of steps reaches it; END < START with a negative STEP runs
/// downwards) or a list a,b,c (run in the order given).
#include <string>
#include <vector>

namespace veer {

/// Parses `text` (degrees). `down` reverses the order of the angles (a down-sweep from the
/// highest, to show hysteresis). Throws InputError naming the option, the value and the forms
/// allowed.
std::vector<double> parse_sweep_angles(const std::string& text, bool down = false);

/// The folder name of a point: "alpha_+04.00", "alpha_-02.50" (two decimals, sign always).
std::string point_folder_name(double alpha_deg);

}  // namespace veer
