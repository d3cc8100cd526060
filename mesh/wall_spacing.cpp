#include "mesh/wall_spacing.hpp"

#include <cmath>
#include <sstream>

#include "mesh/errors.hpp"

namespace veer {

double flat_plate_skin_friction(double re_x) {
    if (!(re_x >= 1e3 && re_x <= 1e10)) {
        std::ostringstream out;
        out << "mesh: reynolds = " << re_x
            << " is outside the turbulent flat-plate correlation; allowed: [1e3, 1e10]";
        throw InputError(out.str());
    }
    // Schlichting's formula (memory): Cf = (2 log10 Re_x - 0.65)^-2.3.
    return std::pow(2.0 * std::log10(re_x) - 0.65, -2.3);
}

double first_cell_for_y_plus(double y_plus, double reynolds) {
    if (!(y_plus > 0.0 && y_plus <= 1000.0)) {
        std::ostringstream out;
        out << "mesh: y_plus = " << y_plus << " is out of range; allowed: (0, 1000]";
        throw InputError(out.str());
    }
    const double cf = flat_plate_skin_friction(reynolds);
    const double u_tau = std::sqrt(0.5 * cf);  // free-stream speed 1
    return y_plus / (reynolds * u_tau);        // nu = 1 / reynolds
}

}  // namespace veer
