#include "app/sweep_angles.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <sstream>

#include "mesh/errors.hpp"

namespace veer {
namespace {

constexpr const char* allowed =
    "allowed: START:END:STEP (e.g. 0:12:4, or 12:0:-4 downwards) or a list a,b,c in degrees";
constexpr std::size_t max_points = 1000;  // a typo guard: 0:90:0.001 is not a sweep

[[noreturn]] void refuse(const std::string& text, const std::string& why) {
    throw InputError("--alpha \"" + text + "\": " + why + "; " + allowed);
}

double parse_angle(const std::string& text, const std::string& piece) {
    std::size_t used = 0;
    double value = 0.0;
    try {
        value = std::stod(piece, &used);
    } catch (const std::exception&) {
        refuse(text, "\"" + piece + "\" is not a number");
    }
    if (used != piece.size()) refuse(text, "\"" + piece + "\" is not a number");
    if (!std::isfinite(value) || std::abs(value) > 180.0)
        refuse(text, "\"" + piece + "\" is not an angle between -180 and 180 degrees");
    return value;
}

std::vector<std::string> split(const std::string& text, char sep) {
    std::vector<std::string> pieces;
    std::stringstream in(text);
    std::string piece;
    while (std::getline(in, piece, sep)) {
        piece.erase(0, piece.find_first_not_of(" \t"));
        piece.erase(piece.find_last_not_of(" \t") + 1);
        pieces.push_back(piece);
    }
    if (!text.empty() && text.back() == sep) pieces.emplace_back();
    return pieces;
}

std::vector<double> range_angles(const std::string& text, const std::vector<std::string>& p) {
    if (p.size() != 3) refuse(text, "a range has three parts");
    const double start = parse_angle(text, p[0]);
    const double end = parse_angle(text, p[1]);
    const double step = parse_angle(text, p[2]);
    if (step == 0.0) refuse(text, "STEP is zero");
    if ((end - start) * step < 0.0) refuse(text, "STEP points away from END");
    // Tolerate rounding in the step count (0:1:0.1 has 11 points), never overshoot END.
    const double count = std::floor((end - start) / step + 1e-9);
    if (count + 1 > static_cast<double>(max_points)) refuse(text, "more than 1000 points");
    std::vector<double> angles;
    for (long k = 0; k <= static_cast<long>(count); ++k)
        angles.push_back(start + static_cast<double>(k) * step);
    return angles;
}

}  // namespace

std::vector<double> parse_sweep_angles(const std::string& text, bool down) {
    if (text.find_first_not_of(" \t") == std::string::npos) refuse(text, "no angle given");
    std::vector<double> angles;
    if (text.find(':') != std::string::npos) {
        angles = range_angles(text, split(text, ':'));
    } else {
        for (const std::string& piece : split(text, ',')) {
            if (piece.empty()) refuse(text, "an empty item in the list");
            angles.push_back(parse_angle(text, piece));
        }
    }
    if (angles.size() > max_points) refuse(text, "more than 1000 points");
    for (std::size_t a = 0; a < angles.size(); ++a)
        for (std::size_t b = a + 1; b < angles.size(); ++b)
            if (point_folder_name(angles[a]) == point_folder_name(angles[b]))
                refuse(text, fmt::format("{:g} and {:g} share the folder {} (angles are kept to "
                                         "0.01 degree)",
                                         angles[a], angles[b], point_folder_name(angles[a])));
    if (down) std::sort(angles.begin(), angles.end(), std::greater<>());
    return angles;
}

std::string point_folder_name(double alpha_deg) {
    const double rounded = std::round(alpha_deg * 100.0) / 100.0;
    return fmt::format("alpha_{:+06.2f}", rounded == 0.0 ? 0.0 : rounded);
}

}  // namespace veer
