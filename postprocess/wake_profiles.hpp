#pragma once
/// Flow turning and downwash behind the section: profiles across the wake on vertical lines
/// x = x_te + station (chord frame), and the momentum they carry.
///
/// Samples: where the line crosses each row of cell centroids (fixed j, one crossing on each half
/// of the C), interpolated linearly along the row, so there is one sample per row and the grid's
/// own resolution sets the profile's. The band |y - y_te| <= half_height is kept, its ends
/// interpolated. Integrals are trapezoidal in y over the band (rho = 1):
///
///   vertical momentum flux  M_y = int u v dy   (chord frame)
///   downward momentum flux  D   = - int u (u . e_lift) dy, e_lift = (-sin a, cos a): the flux
///                                 of momentum normal to the free stream, zero for the undisturbed
///                                 stream and positive when the flow is turned down, as behind a
///                                 lifting section (equal to -M_y at a = 0)
///   mass flux               Q   = int u dy
///   mean flow angle         theta = atan2(int u v dy, int u u dy): direction of the net momentum
///                                   flux through the band
///   turning                 theta - alpha (negative when turned down); downwash = alpha - theta
#include <vector>

#include "mesh/grid_metrics.hpp"
#include "mesh/structured_grid.hpp"
#include "solver/flow_fields.hpp"

namespace veer {

/// The flow at one point of a wake profile.
struct WakeSample {
    double y = 0.0;  ///< chords
    double u = 0.0;
    double v = 0.0;
    double pressure = 0.0;        ///< p - p_inf
    double flow_angle_deg = 0.0;  ///< atan2(v, u)
};

/// One station behind the trailing edge.
struct WakeProfile {
    double station = 0.0;                 ///< distance behind the trailing edge, chords
    double x = 0.0;                       ///< x of the line
    std::vector<WakeSample> samples;      ///< ordered by y, band ends included
    double vertical_momentum_flux = 0.0;  ///< int u v dy
    double downward_momentum_flux = 0.0;  ///< - int u (u . e_lift) dy
    double mass_flux = 0.0;               ///< int u dy
    double mean_flow_angle_deg = 0.0;
    double turning_deg = 0.0;   ///< mean flow angle - alpha
    double downwash_deg = 0.0;  ///< alpha - mean flow angle
};

/// Where to sample.
struct WakeProfileOptions {
    std::vector<double> stations{0.25, 1.0, 3.0};  ///< chords behind the trailing edge
    double half_height = 1.0;                      ///< band half-height about y_te, chords
};

/// Profiles at every station; throws InputError for a station that is not positive or lies
/// beyond the grid, or a half-height that is not positive.
std::vector<WakeProfile> wake_profiles(const StructuredGrid& grid, const GridMetrics& metrics,
                                       const FlowFields& fields, const FlowConditions& conditions,
                                       const WakeProfileOptions& options = {});

}  // namespace veer
