#include "postprocess/wake_profiles.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>
#include <sstream>

#include "mesh/errors.hpp"
#include "postprocess/free_stream.hpp"

namespace veer {

namespace {

double degrees(double radians) { return radians * 180.0 / std::numbers::pi; }

WakeSample make_sample(double y, double u, double v, double p) {
    return {y, u, v, p, degrees(std::atan2(v, u))};
}

WakeSample blend(const WakeSample& a, const WakeSample& b, double t) {
    auto mix = [t](double qa, double qb) { return qa + t * (qb - qa); };
    return make_sample(mix(a.y, b.y), mix(a.u, b.u), mix(a.v, b.v), mix(a.pressure, b.pressure));
}

/// The crossing of x = x_line by row j, walking from cell `from` towards cell `to` (exclusive
/// end, step +-1); false when the row does not cross.
bool row_crossing(const GridMetrics& m, const FlowFields& f, int j, int from, int to, double x_line,
                  WakeSample& out) {
    const int step = to > from ? 1 : -1;
    for (int i = from; i + step != to; i += step) {
        const std::size_t a = m.cell(i, j), b = m.cell(i + step, j);
        const double da = m.centroid[a].x - x_line, db = m.centroid[b].x - x_line;
        if ((da > 0.0) == (db > 0.0)) continue;
        const double t = da / (da - db);
        auto mix = [t](double qa, double qb) { return qa + t * (qb - qa); };
        out = make_sample(mix(m.centroid[a].y, m.centroid[b].y), mix(f.u[a], f.u[b]),
                          mix(f.v[a], f.v[b]), mix(f.pressure[a], f.pressure[b]));
        return true;
    }
    return false;
}

/// Samples of the band [lo, hi], ends interpolated from their neighbours.
std::vector<WakeSample> clip(std::vector<WakeSample> all, double lo, double hi) {
    std::sort(all.begin(), all.end(),
              [](const WakeSample& a, const WakeSample& b) { return a.y < b.y; });
    std::vector<WakeSample> band;
    for (std::size_t k = 0; k < all.size(); ++k) {
        const WakeSample& s = all[k];
        if (k > 0 && all[k - 1].y < lo && s.y > lo)
            band.push_back(blend(all[k - 1], s, (lo - all[k - 1].y) / (s.y - all[k - 1].y)));
        if (s.y >= lo && s.y <= hi) band.push_back(s);
        if (k > 0 && all[k - 1].y < hi && s.y > hi)
            band.push_back(blend(all[k - 1], s, (hi - all[k - 1].y) / (s.y - all[k - 1].y)));
    }
    return band;
}

void integrate(WakeProfile& p, double alpha_deg) {
    const Vec2 e_lift = lift_direction(alpha_deg);
    double uv = 0.0, uu = 0.0, u = 0.0, ul = 0.0;
    for (std::size_t k = 1; k < p.samples.size(); ++k) {
        const WakeSample &a = p.samples[k - 1], &b = p.samples[k];
        const double h = 0.5 * (b.y - a.y);
        uv += h * (a.u * a.v + b.u * b.v);
        uu += h * (a.u * a.u + b.u * b.u);
        u += h * (a.u + b.u);
        ul += h * (a.u * dot({a.u, a.v}, e_lift) + b.u * dot({b.u, b.v}, e_lift));
    }
    p.vertical_momentum_flux = uv;
    p.downward_momentum_flux = -ul;
    p.mass_flux = u;
    p.mean_flow_angle_deg = degrees(std::atan2(uv, uu));
    p.turning_deg = p.mean_flow_angle_deg - alpha_deg;
    p.downwash_deg = -p.turning_deg;
}

void check_options(const WakeProfileOptions& o) {
    for (double s : o.stations)
        if (!(s > 0.0) || !std::isfinite(s)) {
            std::ostringstream msg;
            msg << "wake station " << s << " chords: must be a positive distance behind the "
                << "trailing edge";
            throw InputError(msg.str());
        }
    if (!(o.half_height > 0.0) || !std::isfinite(o.half_height)) {
        std::ostringstream msg;
        msg << "wake profile half-height " << o.half_height << " chords: must be positive";
        throw InputError(msg.str());
    }
}

}  // namespace

std::vector<WakeProfile> wake_profiles(const StructuredGrid& grid, const GridMetrics& metrics,
                                       const FlowFields& fields, const FlowConditions& conditions,
                                       const WakeProfileOptions& options) {
    check_options(options);
    VEER_VERIFY(grid.c_layout().has_value(), "wake profiles need a C-grid layout");
    const CGridLayout& c = *grid.c_layout();
    const Vec2 te = grid.node(c.wake, 0);
    const int le_cell = c.wake + c.around / 2;
    std::vector<WakeProfile> out;
    for (double station : options.stations) {
        WakeProfile p;
        p.station = station;
        p.x = te.x + station;
        std::vector<WakeSample> all;
        for (int j = 0; j < grid.nj(); ++j) {
            WakeSample s;
            if (row_crossing(metrics, fields, j, 0, le_cell, p.x, s)) all.push_back(s);
            if (row_crossing(metrics, fields, j, grid.ni() - 1, le_cell - 1, p.x, s))
                all.push_back(s);
        }
        p.samples = clip(all, te.y - options.half_height, te.y + options.half_height);
        if (p.samples.size() < 2) {
            std::ostringstream msg;
            msg << "wake station " << station << " chords behind the trailing edge (x = " << p.x
                << "): the line does not cross the grid's wake";
            throw InputError(msg.str());
        }
        integrate(p, conditions.alpha_deg);
        out.push_back(p);
    }
    return out;
}

}  // namespace veer
