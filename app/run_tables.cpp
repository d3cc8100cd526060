#include "app/run_tables.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>

#include "app/run_report.hpp"
#include "io/atomic_file.hpp"
#include "io/vtk_grid_writer.hpp"

namespace veer {
namespace {

/// Below this |Cl| the disagreement is given without a percentage (a thousandth of the lift of
/// one degree on a thin section, 2 pi per radian: common practice for "no lift").
constexpr double near_zero_lift = 1e-4;

std::string surface_rows(const std::vector<SurfacePoint>& side, const char* name) {
    std::string out;
    for (const SurfacePoint& p : side)
        out += fmt::format("{:.8f},{:.8f},{},{:.8e},{:.8e},{:.6e}\n", p.x, p.y, name, p.cp, p.cf,
                           p.y_plus);
    return out;
}

}  // namespace

void write_surface_csv(const std::filesystem::path& path, const SurfaceDistribution& d) {
    write_text_atomically(path, "x_c,y_c,side,cp,cf,y_plus\n" + surface_rows(d.lower, "lower") +
                                    surface_rows(d.upper, "upper"));
}

void write_wake_csv(const std::filesystem::path& path, const std::vector<WakeProfile>& wake) {
    std::string out = "station,x,y,u,v,flow_angle_deg,cp\n";
    for (const WakeProfile& w : wake)
        for (const WakeSample& s : w.samples)
            out += fmt::format("{:g},{:.8f},{:.8f},{:.8e},{:.8e},{:.6f},{:.8e}\n", w.station, w.x,
                               s.y, s.u, s.v, s.flow_angle_deg, 2.0 * s.pressure);
    write_text_atomically(path, out);
}

void write_surface_vtp_file(const std::filesystem::path& path, const SurfaceDistribution& d) {
    std::vector<Vec2> points;
    std::vector<double> cp, cf, y_plus;
    auto add = [&](const std::vector<SurfacePoint>& side) {
        for (const SurfacePoint& p : side) {
            points.push_back({p.x, p.y});
            cp.push_back(p.cp);
            cf.push_back(p.cf);
            y_plus.push_back(p.y_plus);
        }
    };
    add(d.lower);
    add(d.upper);
    write_surface_vtp(path, points, {{"Cp", 1, &cp}, {"Cf", 1, &cf}, {"y_plus", 1, &y_plus}},
                      {0, d.lower.size()});
}

void print_closing_table(const CaseSpec& spec, const RunAnalysis& a) {
    const double cl = a.forces.cl.total;
    fmt::print("\n  lift two ways ({} at alpha {:g} deg, Re {:g})\n", spec.geometry.name,
               spec.flow.alpha_deg, spec.flow.reynolds);
    fmt::print("  {:<34} {:>10} {:>10} {:>10}\n", "route", "Cl", "Cd", "dCl");
    fmt::print("  {:<34} {:>10.5f} {:>10.5f} {:>10}\n", "surface (pressure + friction)", cl,
               a.forces.cd.total, "-");
    double worst = 0.0;
    for (std::size_t k = 0; k < a.momentum.size(); ++k) {
        const ContourForces& m = a.momentum[k];
        const double diff = m.cl.total - cl;
        worst = std::max(worst, std::abs(diff));
        fmt::print("  {:<34} {:>10.5f} {:>10.5f} {:>+10.5f}\n",
                   fmt::format("control volume at {:.2f} chords", m.contour.distance), m.cl.total,
                   m.cd.total, diff);
    }
    for (const ContourCirculation& c : a.circulation)
        fmt::print("  {:<34} {:>10.5f} {:>10} {:>+10.5f}\n",
                   fmt::format("circulation at {:.2f} chords", c.contour.distance), c.cl, "",
                   c.cl - cl);
    // A percentage of a lift near zero (a symmetric section at zero incidence) says nothing.
    if (std::abs(cl) >= near_zero_lift)
        fmt::print("  largest surface/control-volume disagreement: {:.5f} ({:.2f}% of Cl)\n", worst,
                   100 * worst / std::abs(cl));
    else
        fmt::print("  largest surface/control-volume disagreement: {:.5f} (Cl near zero)\n", worst);
    fmt::print(
        "  Cm (quarter chord) {:.5f}; Kutta check: Cp upper {:.4f}, lower {:.4f} at the "
        "trailing edge\n",
        a.forces.cm.total, a.kutta.cp_upper, a.kutta.cp_lower);
    auto sep = [](const SurfaceSeparation& s) {
        if (s.separations.empty()) return std::string("attached");
        std::string out = fmt::format("separates at x/c {:.3f}", s.separations.front().x);
        if (s.trailing_edge_separation) out += ", reversed to the trailing edge";
        for (const SeparationBubble& b : s.bubbles)
            out += fmt::format(", bubble {:.3f}-{:.3f}", b.start.x, b.end.x);
        return out;
    };
    fmt::print("  upper surface {}; lower surface {}\n", sep(a.separation.upper),
               sep(a.separation.lower));
    for (const WakeProfile& w : a.wake)
        fmt::print(
            "  wake {:.2f} chords behind the TE: downwash {:+.3f} deg, downward momentum "
            "flux {:.5f}\n",
            w.station, w.downwash_deg, w.downward_momentum_flux);
}

}  // namespace veer
