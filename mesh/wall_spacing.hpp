#pragma once
/// First-cell height for a wanted y+, from a turbulent flat-plate skin-friction correlation.
namespace veer {

/// Turbulent flat-plate skin friction at Reynolds number re_x (x from the leading edge):
/// Cf = (2 log10(re_x) - 0.65)^-2.3, Schlichting's empirical formula (Schlichting, Boundary-Layer
/// Theory, chapter on the turbulent flat plate; exponent and constants as recalled (memory)).
/// Throws InputError naming `reynolds` unless re_x is in [1e3, 1e10].
double flat_plate_skin_friction(double re_x);

/// Wall-normal height y (chords) of a first cell with y+ = y u_tau / nu = y_plus, with u_tau = U
/// sqrt(Cf / 2) from the flat-plate correlation at re_x = reynolds (chord Reynolds number), U = 1,
/// chord = 1, nu = 1 / reynolds. Throws InputError naming `y_plus` unless it is in (0, 1000], or
/// `reynolds` (see above).
double first_cell_for_y_plus(double y_plus, double reynolds);

}  // namespace veer
